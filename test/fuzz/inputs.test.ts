/**
 * Seeded fuzz of the public entries that take numbers: the guided forms as a case holds them (readCase, then the
 * solver), the command line's member, section and case commands run in-process, with the hostile shapes a
 * reliability probe found (1e308 m, 100,000 soil springs, a 1,000-point polygon, 24 touching bodies, 50 modes on
 * a fine mesh). Each input must end in an answer or a refusal that names its field, never a stray throw, and
 * within a bounded time. Bounds are generous (2 shared cores); they catch a hang, not a slow path.
 */
import { describe, expect, it } from 'vitest';
import { readCase, requestOf } from '../../src/app/read-case';
import { solveCase } from '../../src/app/solve-case';
import { runCaseCommand } from '../../src/cli/case-command';
import { runMemberCommand } from '../../src/cli/member-command';
import { runSectionCommand } from '../../src/cli/section-command';
import { FORM_ERROR_KEY } from '../../src/forms';
import { FORMS, KIND_IDS, KINDS } from '../../src/kinds/registry';
import { caseToFileText } from '../../src/share/file';
import { demoCase } from '../case/fixtures';
import { int, pick, seeded } from '../case/fuzz-gen';

/** Per-input time bound: a hang shows as seconds to minutes (common practice, no source). */
const BOUND_MS = 8000;

/** Texts typed into a quantity field: unit slips, stray exponents, junk. */
const TEXTS = ['1e308 m', '1e308', '-1e308', '1e-308', '5e-324', '1.025', '0', '-0', '-1', 'NaN', 'Infinity', '1e3 km', '2 ft + 6 in', '24 in', '3 m/s', '30 kn',
  '', ' ', '1,5', '1;2;3', 'abc', '10 kg', '1e9', '0.0001', '999999', '2 m, 3 m', '%', '1/0', '(', '5 mm * 1e300'];

function timed<T>(f: () => T): { value: T | undefined; error: unknown; ms: number } {
  const t0 = performance.now();
  try {
    return { value: f(), error: undefined, ms: performance.now() - t0 };
  } catch (e) {
    return { value: undefined, error: e, ms: performance.now() - t0 };
  }
}

describe('fuzz: form values of every kind through readCase and the solver', () => {
  for (const kind of KIND_IDS) {
    it(`${kind}: 16 seeded mutations each read to an answer or to refusals keyed by field, in bounded time`, () => {
      const rnd = seeded(4100 + KIND_IDS.indexOf(kind));
      const form = FORMS[kind];
      const quantities = form.fields.filter((f) => f.type !== 'choice');
      const keys = new Set([...form.fields.map((f) => f.key), FORM_ERROR_KEY]);
      const resonanceKeys = new Set([...KINDS[kind].resonance.fields.map((f) => f.key), FORM_ERROR_KEY]);
      for (let n = 0; n < 16; n++) {
        const inputs = { ...form.defaults('si') };
        for (let k = 1 + int(rnd, 3); k > 0; k--) inputs[pick(rnd, quantities).key] = pick(rnd, TEXTS);
        const label = `${kind} ${JSON.stringify(inputs)}`;
        const read = timed(() => readCase({ kind, unitSystem: pick(rnd, ['si', 'us'] as const), inputs, excitation: {} }));
        expect(read.error, label).toBeUndefined();
        const reading = read.value!;
        if (!reading.ok) {
          expect(Object.keys(reading.errors).length, label).toBeGreaterThan(0);
          for (const [key, message] of Object.entries(reading.errors)) {
            expect(keys.has(key), `${label}: key ${key}`).toBe(true);
            expect(message.length, label).toBeGreaterThan(5);
          }
          continue;
        }
        for (const key of Object.keys(reading.excitationErrors)) expect(resonanceKeys.has(key), label).toBe(true);
        const solved = timed(() => solveCase(requestOf(reading), () => 0));
        expect(solved.error, label).toBeUndefined();
        expect(solved.ms, label).toBeLessThan(BOUND_MS);
        if (solved.value && !solved.value.ok) expect(solved.value.message.length, label).toBeGreaterThan(5);
      }
    });
  }
});

/** A CLI command's outcome: printed JSON, or an Error whose message must name `field`. */
function expectAnswerOrNamedRefusal(run: () => string, field: RegExp, label: string): string | undefined {
  const r = timed(run);
  expect(r.ms, label).toBeLessThan(BOUND_MS);
  if (r.error !== undefined) {
    expect(r.error, label).toBeInstanceOf(Error);
    expect((r.error as Error).message, label).toMatch(field);
    return undefined;
  }
  return r.value;
}

function tubeMember(extra: Record<string, unknown> = {}, d = 0.61): Record<string, unknown> {
  return {
    lengthM: 20,
    segments: [{ fromM: 0, toM: 20, section: { shape: 'tube', outerDiameterM: d, wallThicknessM: 0.012 }, youngsModulusPa: 210e9, densityKgPerM3: 7850 }],
    supports: [{ atM: 0, kind: 'clamped' }],
    ...extra,
  };
}

describe('fuzz: the command line member and section commands with the shapes that once wedged them', () => {
  it('an outer diameter of 1e308 m is refused naming the diameter', () => {
    expectAnswerOrNamedRefusal(() => runMemberCommand(JSON.stringify(tubeMember({}, 1e308))), /outerDiameterM|diameter/, '1e308 m');
  });

  it('100,000 soil springs are refused naming soilSprings, in bounded time', () => {
    const springs = Array.from({ length: 100000 }, (_, i) => ({ fromM: 0, toM: 1 + (i % 5), modulusNPerM2: 1e6 }));
    const out = expectAnswerOrNamedRefusal(() => runMemberCommand(JSON.stringify(tubeMember({ soilSprings: springs }))), /soilSprings/, 'springs');
    expect(out).toBeUndefined();
  });

  it('50 modes on a fine first mesh give an answer of bounded size or a refusal naming modes or mesh', () => {
    const out = expectAnswerOrNamedRefusal(() => runMemberCommand(JSON.stringify(tubeMember({ modes: 50, mesh: { initialElements: 5000 } }))), /modes|mesh|initialElements/, 'modes 50');
    if (out !== undefined) expect(out.length).toBeLessThan(20_000_000);
  });

  it('a 1,000-point polygon is refused naming pointsM', () => {
    const pts = Array.from({ length: 1000 }, (_, k) => [Math.cos((2 * Math.PI * k) / 1000), Math.sin((2 * Math.PI * k) / 1000)]);
    const out = expectAnswerOrNamedRefusal(() => runSectionCommand(JSON.stringify({ liquidDensityKgPerM3: 1000, bodies: [{ shape: 'polygon', pointsM: pts }] })), /pointsM/, 'polygon');
    expect(out).toBeUndefined();
  });

  it('24 touching circles give an answer or a refusal naming the bodies, in bounded time', () => {
    const bodies = Array.from({ length: 24 }, (_, k) => ({ shape: 'circle', diameterM: 1, centerM: [k, 0] }));
    expectAnswerOrNamedRefusal(() => runSectionCommand(JSON.stringify({ liquidDensityKgPerM3: 1000, bodies })), /bodies|touch|overlap|gap/, '24 touching');
  });

  it('30 seeded member inputs with hostile numbers in the section, supports and liquid end in an answer or a named refusal', () => {
    const rnd = seeded(4200);
    const nums = [1e308, -1e308, 5e-324, 0, -0, -1, 1e-300, 1e30, 2 ** 53, 0.5, 1e6];
    const paths: [string, (m: any, v: number) => void][] = [
      ['lengthM', (m, v) => (m.lengthM = v)],
      ['outerDiameterM', (m, v) => (m.segments[0].section.outerDiameterM = v)],
      ['wallThicknessM', (m, v) => (m.segments[0].section.wallThicknessM = v)],
      ['youngsModulusPa', (m, v) => (m.segments[0].youngsModulusPa = v)],
      ['densityKgPerM3', (m, v) => (m.segments[0].densityKgPerM3 = v)],
      ['atM', (m, v) => (m.supports[0].atM = v)],
      ['modes', (m, v) => (m.modes = v)],
    ];
    for (let n = 0; n < 30; n++) {
      const m = tubeMember() as any;
      const [name, set] = pick(rnd, paths);
      const v = pick(rnd, nums);
      set(m, v);
      const label = `${name} = ${v}`;
      const r = timed(() => runMemberCommand(JSON.stringify(m)));
      expect(r.ms, label).toBeLessThan(BOUND_MS);
      if (r.error !== undefined) {
        expect(r.error, label).toBeInstanceOf(Error);
        // JSON turns 1e308 * 10 into null: the refusal then names the field or the segment holding it.
        expect((r.error as Error).message, label).toMatch(new RegExp(`${name}|segments|supports|mechanism|free to move`));
      }
    }
  });
});

describe('fuzz: case files through the case command', () => {
  it('20 seeded case files with hostile member values print an answer or refuse naming a field', () => {
    const rnd = seeded(4300);
    const base = demoCase();
    const form = FORMS[base.kind];
    const quantities = form.fields.filter((f) => f.type !== 'choice');
    for (let n = 0; n < 20; n++) {
      const c = { ...base, inputs: { ...base.inputs } };
      const field = pick(rnd, quantities);
      c.inputs[field.key] = pick(rnd, TEXTS);
      const label = `${field.key} = ${JSON.stringify(c.inputs[field.key])}`;
      const r = timed(() => runCaseCommand(caseToFileText(c)));
      expect(r.ms, label).toBeLessThan(BOUND_MS);
      if (r.error !== undefined) {
        expect(r.error, label).toBeInstanceOf(Error);
        expect((r.error as Error).message, label).toMatch(/inputs that do not read: \w+: .+/);
      }
    }
  });
});
