/**
 * Cases saved before the practical inputs (riser shielding, effective tension, growth and top mass; pile scour,
 * head, soil-type fixity and axial load; stem water temperature, nozzle length, flow rate) existed lack their
 * keys. They must open unchanged, through a share link as well, and give the same numbers as before: the new
 * keys' defaults leave the member model as the earlier builders made it.
 */
import { describe, expect, it } from 'vitest';
import { readCase, requestOf, solveCase } from '../../src/app';
import { caseFromDemo } from '../../src/app/create-case';
import type { Case } from '../../src/case';
import { decodeCaseLink, encodeCaseLink } from '../../src/share';
import { DEMO_CASES } from '../../src/kinds/registry';

/** The new keys and their defaults, by kind: member inputs and resonance inputs. */
const NEW_KEYS: Record<string, { inputs: Record<string, string>; excitation: Record<string, string> }> = {
  riser: { inputs: { caissonInnerFlow: '', tensionBasis: 'effective', internalPressure: '0', topMass: '0', growthThickness: '0', growthDensity: '1325' }, excitation: {} },
  pile: { inputs: { headRestraint: 'free', headRotationalStiffness: '100', soilType: 'medium-sand', scourDepth: '0', axialLoad: '0' }, excitation: {} },
  stem: { inputs: { waterTemperature: '', shieldedLength: '0' }, excitation: { flowRate: '', pipeBore: '' } },
  baffle: { inputs: {}, excitation: {} },
};

/** A case as an older version saved it: the demo without any of the new keys. */
function oldCase(kind: string): Case {
  const demo = DEMO_CASES.find((d) => d.kind === kind)!;
  const c = caseFromDemo(demo);
  const strip = (values: Record<string, string>, keys: Record<string, string>) => Object.fromEntries(Object.entries(values).filter(([k]) => !(k in keys)));
  return { ...c, inputs: strip(c.inputs, NEW_KEYS[kind].inputs), excitation: strip(c.excitation, NEW_KEYS[kind].excitation) };
}

function solved(c: Pick<Case, 'kind' | 'inputs' | 'excitation' | 'unitSystem'>) {
  const r = readCase(c);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  if (r.engine !== 'beam') throw new Error('these kinds are beam members');
  const a = solveCase(requestOf(r), () => 0);
  if (!a.ok) throw new Error(a.message);
  if (a.engine === 'plate') throw new Error('a beam member is answered by the beam engine');
  return { build: r.build, answer: a };
}

describe('old saved cases and links open unchanged', () => {
  for (const kind of ['pile', 'riser', 'stem', 'baffle']) {
    it(`an old ${kind} case reads to the same model and numbers as with the new keys at their defaults`, () => {
      const old = oldCase(kind);
      for (const key of Object.keys(NEW_KEYS[kind].inputs)) expect(old.inputs).not.toHaveProperty(key);
      const withDefaults = { ...old, inputs: { ...old.inputs, ...NEW_KEYS[kind].inputs }, excitation: { ...old.excitation, ...NEW_KEYS[kind].excitation } };
      const a = solved(old);
      const b = solved(withDefaults);
      expect(a.build.model).toEqual(b.build.model);
      expect(a.answer.member.wet?.frequenciesHz ?? a.answer.member.dry.frequenciesHz).toEqual(b.answer.member.wet?.frequenciesHz ?? b.answer.member.dry.frequenciesHz);
      expect(a.answer.screening?.verdict).toBe(b.answer.screening?.verdict);
    });

    it(`an old ${kind} case comes through a share link with its inputs as typed`, async () => {
      const old = oldCase(kind);
      const back = await decodeCaseLink(await encodeCaseLink(old, 'https://wetmode.example/'));
      if (!back.ok) throw new Error(back.message);
      expect(back.value.inputs).toEqual(old.inputs);
      expect(solved(back.value).build.model).toEqual(solved(old).build.model);
    });
  }

  it('the earlier models come back: none of the new parts appear unless asked for', () => {
    const pile = solved(oldCase('pile')).build.model;
    expect(pile.tensionN).toBeUndefined();
    expect(pile.supports).toEqual([{ atM: 0, kind: 'clamped' }]);
    const riser = solved(oldCase('riser')).build;
    // The riser demo types 0 kip top tension; it reaches the model as typed (effective), with no top mass or growth.
    expect(riser.model.tensionN).toBe(0);
    expect(riser.model.masses).toBeUndefined();
    expect(riser.model.segments).toHaveLength(1);
    expect(riser.bands.some((b) => b.id === 'marine-growth')).toBe(false);
    const stem = solved(oldCase('stem')).build.model;
    expect(stem.liquid!.kinematicViscosityM2PerS).toBeUndefined();
    expect(stem.liquid!.flowShielding).toBeUndefined();
    expect(stem.liquid!.densityKgPerM3).toBe(1025);
  });
});
