/** `wetmode section`: JSON text in, pretty JSON text out, clear errors for bad input. */
import { describe, expect, test } from 'vitest';
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { runSectionCommand } from '../../../src/cli/section-command';

const examplesDir = join(__dirname, '../../../examples');
const examples = readdirSync(examplesDir).filter((f) => f.startsWith('section-') && f.endsWith('.json'));

describe('section command', () => {
  test('there are example section files to run', () => {
    expect(examples.length).toBeGreaterThanOrEqual(3);
  });

  test.each(examples)('example %s runs and reports every part', (file) => {
    const input = JSON.parse(readFileSync(join(examplesDir, file), 'utf8'));
    const out = JSON.parse(runSectionCommand(readFileSync(join(examplesDir, file), 'utf8')));
    const K = input.bodies.length;
    expect(out.addedMass).toHaveLength(3 * K);
    for (const row of out.addedMass) expect(row).toHaveLength(3 * K);
    expect(out.bodies).toHaveLength(K);
    for (const b of out.bodies) {
      expect(b.caX).toBeGreaterThan(0);
      expect(b.displacedMassKgPerM).toBeGreaterThan(0);
      expect(b.caReference).toMatch(/half the wetted extent across the motion/);
    }
    expect(out.errorEstimate).toHaveLength(3 * K);
    expect(out.energyCheck.length).toBeGreaterThan(0);
    expect(out.panels.fine).toBeGreaterThan(out.panels.coarse);
    expect(out.method.length).toBeGreaterThan(0);
  }, 20000);

  test('the report carries the cautions', () => {
    const out = JSON.parse(runSectionCommand('{"liquidDensityKgPerM3": 1025, "bodies": [{"shape": "circle", "diameterM": 0.6}]}'));
    const text = out.cautions.join(' ');
    expect(text).toMatch(/screening estimate, not a design approval/i);
    expect(text).toMatch(/qualified, licensed engineer under the codes and licensed practice/);
    expect(text).toMatch(/scour, marine growth, corrosion, coating, contents/);
    expect(out.modelLimits.join(' ')).toMatch(/high-frequency limit/);
    expect(text).toMatch(/Never approach, climb, enter or lean over a structure/);
    // Ca of a circle at the default resolution (Lamb: 1), rounded to 6 digits in the report.
    expect(out.bodies[0].caX).toBeCloseTo(1, 5);
  });

  test('invalid JSON is reported as such', () => {
    expect(() => runSectionCommand('{"liquidDensityKgPerM3": 1025,')).toThrow(/^section input is not valid JSON: /);
  });

  test('invalid input is reported with the field that is wrong', () => {
    expect(() => runSectionCommand('{"liquidDensityKgPerM3": 1025, "bodies": [{"shape": "circle", "diameterM": -1}]}')).toThrow(
      'invalid section input: bodies[0].diameterM must be a finite number > 0, got -1',
    );
  });
});
