import { describe, it, expect } from 'vitest';
import { readFileSync } from 'node:fs';
import { runPlateCommand } from '../../src/cli/plate-command';
import { main } from '../../src/cli/main';
import { parsePlateInput, solvePlate } from '../../src/physics/plate';

const EXAMPLE = 'examples/plate-marrow-creek-baffle.json';

async function run(args: string[]) {
  const out: string[] = [];
  const err: string[] = [];
  const code = await main(args, (s) => out.push(s), (s) => err.push(s));
  return { code, out: out.join('\n'), err: err.join('\n') };
}

describe('wetmode plate', () => {
  it('prints the dry and wet frequencies the solver gives, with method, validity, error estimate, sloshing and cautions', async () => {
    const text = readFileSync(EXAMPLE, 'utf8');
    const out = JSON.parse(runPlateCommand(text));
    const solved = solvePlate(parsePlateInput(JSON.parse(text)));
    if (!solved.ok) throw new Error(solved.message);
    const six = (xs: number[]) => xs.map((x) => Number(x.toPrecision(6))); // the command's rounding
    expect(out.ok).toBe(true);
    expect(out.dry.frequenciesHz).toEqual(six(solved.result.dry.frequenciesHz));
    expect(out.wet.frequenciesHz).toEqual(six(solved.result.wet!.frequenciesHz));
    expect(out.method.join(' ')).toContain('Rayleigh–Ritz');
    expect(out.validity.join(' ')).toContain('incompressible');
    expect(out.errorEstimate.wetRelative).toHaveLength(6);
    expect(out.sloshingHz.length).toBeGreaterThan(0);
    expect(out.cautions.join(' ')).toContain('qualified engineer');
  });

  it('is listed in the help and runs through the command line', async () => {
    expect((await run(['--help'])).out).toContain('plate INPUT...');
    const r = await run(['plate', EXAMPLE]);
    expect(r.code).toBe(0);
    expect(JSON.parse(r.out).wet.frequenciesHz).toHaveLength(6);
  });

  it('a wrong edge condition names the field and exits 1', async () => {
    const bad = JSON.parse(readFileSync(EXAMPLE, 'utf8'));
    bad.edges.top = 'welded';
    expect(() => runPlateCommand(JSON.stringify(bad))).toThrow('edges.top must be one of "clamped", "simply-supported", "free" or { "rotationalSpringNmPerRadPerM": k }, got "welded"');
    expect(() => runPlateCommand('{ nope')).toThrow(/plate file is not valid JSON/);
  });

  it('a dry plate (no liquid) prints dry frequencies and wet as null', async () => {
    const dry = JSON.parse(readFileSync(EXAMPLE, 'utf8'));
    delete dry.liquid;
    const out = JSON.parse(runPlateCommand(JSON.stringify(dry)));
    expect(out.wet).toBeNull();
    expect(out.dry.frequenciesHz).toHaveLength(6);
    expect(out.sloshingHz).toBeUndefined();
  });
});
