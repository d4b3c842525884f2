import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { runMemberCommand } from '../../../src/cli/member-command';

const examples = readdirSync('examples').filter((f) => /^member-.*\.json$/.test(f));

describe('member command adapter', () => {
  it('has member examples to run', () => {
    expect(examples.length).toBeGreaterThanOrEqual(4);
  });

  for (const file of examples) {
    it(`solves ${file}: dry and wet frequencies in mode order, with cautions`, () => {
      const out = JSON.parse(runMemberCommand(readFileSync(`examples/${file}`, 'utf8')));
      expect(out.ok).toBe(true);
      const dry: number[] = out.dry.frequenciesHz;
      const wet: number[] = out.wet.frequenciesHz;
      expect(dry.length).toBe(out.modesRequested);
      for (let i = 1; i < dry.length; i++) expect(dry[i]).toBeGreaterThanOrEqual(dry[i - 1]);
      // Added mass lowers every Rayleigh quotient (minimax), so each wet mode is below its dry one.
      wet.forEach((f, i) => expect(f).toBeLessThan(dry[i]));
      expect(out.cautions.join(' ')).toMatch(/not a design approval/);
      expect(out.cautions.join(' ')).toMatch(/qualified/);
      expect(out.cautions.join(' ')).toMatch(/safety procedures/);
      expect(out.mesh.converged).toBe(true);
    });
  }

  it('says when the file is not valid JSON', () => {
    expect(() => runMemberCommand('{ "lengthM": 20, ')).toThrow(/^the member file is not valid JSON/);
  });

  it('passes field messages through', () => {
    expect(() => runMemberCommand(JSON.stringify({ lengthM: 0 }))).toThrow('lengthM must be a finite number > 0, got 0');
  });

  it('throws the mechanism message for a member without enough supports', () => {
    const text = readFileSync('examples/member-temperature-stem-tern-haven.json', 'utf8').replace('"kind": "clamped"', '"kind": "pinned"');
    expect(() => runMemberCommand(text)).toThrow('member can move as a rigid body: add a support');
  });

  it('prints a buckled member as a result with ok: false', () => {
    const model = {
      lengthM: 10,
      segments: [{ fromM: 0, toM: 10, section: { shape: 'rod', diameterM: 0.05 }, youngsModulusPa: 210e9, densityKgPerM3: 7850 }],
      supports: [{ atM: 0, kind: 'pinned' }, { atM: 10, kind: 'pinned' }],
      tensionN: -1e6,
    };
    const out = JSON.parse(runMemberCommand(JSON.stringify(model)));
    expect(out.ok).toBe(false);
    expect(out.reason).toBe('buckles');
    expect(out.message).toMatch(/^buckles under this load/);
    expect(out.cautions.length).toBeGreaterThan(0);
  });

  it('dry-only input reports wet as null and says why', () => {
    const model = {
      lengthM: 10,
      segments: [{ fromM: 0, toM: 10, section: { shape: 'rod', diameterM: 0.05 }, youngsModulusPa: 210e9, densityKgPerM3: 7850 }],
      supports: [{ atM: 0, kind: 'clamped' }],
    };
    const out = JSON.parse(runMemberCommand(JSON.stringify(model)));
    expect(out.wet).toBeNull();
    expect(out.wetOmittedBecause).toMatch(/no liquid/);
  });
});
