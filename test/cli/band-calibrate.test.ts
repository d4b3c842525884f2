import { describe, expect, it } from 'vitest';
import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { main } from '../../src/cli/main';
import { runMemberCommand } from '../../src/cli/member-command';
import { expectClose } from '../helpers/expect-close';

async function run(args: string[]) {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(args, (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}

const pileText = readFileSync('examples/member-fender-pile-port-halloran.json', 'utf8');
const withRanges = (ranges: unknown) => JSON.stringify({ ...JSON.parse(pileText), ranges });

describe('wetmode member with ranges', () => {
  it('adds a band mode by mode, lowest first, that holds the likely answer, and leaves the rest unchanged', async () => {
    const plain = JSON.parse(runMemberCommand(pileText));
    const ranged = JSON.parse(
      runMemberCommand(withRanges([
        { path: 'masses.0.massKg', low: 1500, high: 4000 },
        { path: 'liquid.toM', low: 14, high: 18 },
      ])),
    );
    expect(plain.band).toBeUndefined();
    const { band, ...rest } = ranged;
    expect(rest).toEqual(plain);
    expect(band.ok).toBe(true);
    for (const s of ['dry', 'wet'] as const) {
      expect(band[s].lowHz).toHaveLength(5);
      band[s].lowHz.forEach((lo: number, j: number) => {
        expect(lo).toBeLessThanOrEqual(plain[s].frequenciesHz[j]);
        expect(band[s].highHz[j]).toBeGreaterThanOrEqual(plain[s].frequenciesHz[j]);
        if (j > 0) expect(lo).toBeGreaterThanOrEqual(band[s].lowHz[j - 1]);
      });
    }
    expect(typeof band.method).toBe('string');
    expect(band.sensitivity.map((e: { path: string }) => e.path).sort()).toEqual(['liquid.toM', 'masses.0.massKg']);
    expect(band.sensitivity[0].swingHz).toBeGreaterThanOrEqual(band.sensitivity[1].swingHz);
    // A heavier fender panel lowers the wet f1 (adding mass lowers Rayleigh quotients, classical).
    const mass = band.sensitivity.find((e: { path: string }) => e.path === 'masses.0.massKg');
    expect(mass.atHighHz).toBeLessThan(mass.atLowHz);
  });

  it('refuses a bad path or a low above high with a message naming it (exit 1)', async () => {
    const dir = '/tmp/wetmode-band-test';
    mkdirSync(dir, { recursive: true });
    writeFileSync(`${dir}/bad-path.json`, withRanges([{ path: 'masses.4.massKg', low: 0, high: 1 }]));
    writeFileSync(`${dir}/low-high.json`, withRanges([{ path: 'liquid.toM', low: 18, high: 14 }]));
    const a = await run(['member', `${dir}/bad-path.json`]);
    expect(a.code).toBe(1);
    expect(a.err).toContain('masses.4.massKg');
    const b = await run(['member', `${dir}/low-high.json`]);
    expect(b.code).toBe(1);
    expect(b.err).toContain('ranges[0] (liquid.toM): low 18 is above high 14');
  });
});

describe('wetmode calibrate', () => {
  it('back-calculates the scoured soil top of the example pile and prints the value, interval and frequencies', async () => {
    const r = await run(['calibrate', 'examples/calibrate-fender-pile-port-halloran.json']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.out);
    expect(out.ok).toBe(true);
    expect(out.value).toBeGreaterThan(2);
    expect(out.value).toBeLessThan(6);
    expect(out.interval[0]).toBeLessThan(out.value);
    expect(out.interval[1]).toBeGreaterThan(out.value);
    // The re-solved member reproduces the measured 0.62 Hz (6 significant figures printed; 1e-5: mesh).
    expectClose(out.frequenciesHz[0], 0.62, { rtol: 1e-5, label: 'calibrated wet f1' });
    expect(out.cautions.length).toBeGreaterThan(0);
  });

  it('prints ok false with the reachable range when nothing in the range fits', async () => {
    const doc = JSON.parse(readFileSync('examples/calibrate-fender-pile-port-halloran.json', 'utf8'));
    doc.measured.frequencyHz = 3;
    mkdirSync('/tmp/wetmode-band-test', { recursive: true });
    writeFileSync('/tmp/wetmode-band-test/nofit.json', JSON.stringify(doc));
    const r = await run(['calibrate', '/tmp/wetmode-band-test/nofit.json']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.out);
    expect(out.ok).toBe(false);
    expect(out.reason).toBe('no-fit');
    expect(out.message).toContain('no value of soilSprings.0.toM in [2, 6] fits');
    expect(out.reachableHz[1]).toBeLessThan(3);
  });
});
