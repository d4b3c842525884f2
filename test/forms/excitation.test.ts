import { describe, it, expect } from 'vitest';

import { excitationDefaults, readExcitation, convertExcitationValues } from '../../src/forms/excitation';
import { solveMember } from '../../src/physics/beam';
import { screenResonance } from '../../src/physics/excitation';
import { screeningInputFor } from '../../src/physics/excitation/from-member';
import { FORMS, KINDS, kindOf } from '../../src/kinds/registry';

function solvedPile() {
  const out = solveMember(pileBuild().model);
  if (!out.ok) throw new Error(out.message);
  return out.result;
}

function pileBuild() {
  const r = FORMS.pile.build(FORMS.pile.defaults('si'), 'si');
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.build;
}

describe('resonance inputs form', () => {
  it('defaults read for every member kind', () => {
    for (const kind of ['pile', 'riser', 'baffle', 'stem'] as const) {
      const b = FORMS[kind].build(FORMS[kind].defaults('si'), 'si');
      if (!b.ok) throw new Error(kind);
      const r = readExcitation(kindOf(kind).resonance, excitationDefaults(kindOf(kind).resonance, 'si'), 'si', b.build);
      expect(r.ok, kind).toBe(true);
    }
  });

  it('a current profile runs from the bed at the bottom of the liquid to the surface at its top', () => {
    const build = pileBuild();
    const r = readExcitation(KINDS.pile.resonance, { currentSurface: '1.2', currentMid: '0.9', currentBed: '0.3' }, 'si', build);
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    const liquid = build.model.liquid!;
    expect(r.excitation.flowSpeedMPerS).toEqual([
      { zM: liquid.fromM, speedMPerS: 0.3 },
      { zM: 0.5 * (liquid.fromM + liquid.toM), speedMPerS: 0.9 },
      { zM: liquid.toM, speedMPerS: 1.2 },
    ]);
  });

  it('a shaft speed typed in rpm reaches the screening in Hz (rpm / 60), with blades for blade pass', () => {
    const r = readExcitation(KINDS.pile.resonance, { currentSurface: '0', machineSpeed: '1450', bladeCount: '5' }, 'si', pileBuild());
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.excitation.machinery?.[0].shaftSpeedHz).toBeCloseTo(1450 / 60, 9);
    expect(r.excitation.machinery?.[0].bladeCount).toBe(5);
  });

  it('one wave period without the other says what is missing', () => {
    const r = readExcitation(KINDS.pile.resonance, { currentSurface: '0.5', wavePeriodMin: '4' }, 'si', pileBuild());
    expect(r).toEqual({ ok: false, errors: { wavePeriodMax: 'give both wave periods, or neither for no wave check' } });
  });

  it('wave periods in the wrong order are refused in the user’s words', () => {
    const r = readExcitation(KINDS.pile.resonance, { currentSurface: '0.5', wavePeriodMin: '12', wavePeriodMax: '4' }, 'si', pileBuild());
    expect(r).toEqual({ ok: false, errors: { wavePeriodMax: 'longest wave period must be at least the shortest (12 s)' } });
  });

  it('a fractional blade count and a wrong unit are refused', () => {
    const r = readExcitation(KINDS.pile.resonance, { currentSurface: '0.5', machineSpeed: '900', bladeCount: '4.5' }, 'si', pileBuild());
    expect(r.ok).toBe(false);
    const u = readExcitation(KINDS.pile.resonance, { currentSurface: '5 kg' }, 'si', pileBuild());
    expect(u.ok ? '' : u.errors.currentSurface).toMatch(/expected a speed/);
  });

  it('toggling to US units re-expresses speeds in ft/s (1 m/s = 3.28084 ft/s, exact definition of the foot)', () => {
    const us = convertExcitationValues(KINDS.pile.resonance, { currentSurface: '1' }, 'si', 'us');
    expect(Number(us.currentSurface)).toBeCloseTo(3.28084, 5);
  });

  it('published limits are used as they are unless edited; an edited limit is labelled as entered by the user', () => {
    const plain = readExcitation(KINDS.pile.resonance, { currentSurface: '1' }, 'si', pileBuild());
    if (!plain.ok) throw new Error(JSON.stringify(plain.errors));
    expect(plain.excitation.limits).toBeUndefined();
    const edited = readExcitation(KINDS.pile.resonance, { currentSurface: '1', crossFlowVrMin: '4', crossFlowVrMax: '12' }, 'si', pileBuild());
    if (!edited.ok) throw new Error(JSON.stringify(edited.errors));
    expect(edited.excitation.limits?.crossFlowReducedVelocity).toEqual({ min: 4, max: 12 });
    const screened = screenResonance(screeningInputFor(pileBuild().model, solvedPile(), edited.excitation));
    expect(screened.limits.crossFlowReducedVelocity.source).toMatch(/entered by user/);
  });

  it('a range that ends below its start is refused', () => {
    const r = readExcitation(KINDS.pile.resonance, { currentSurface: '1', inLineVrMin: '4', inLineVrMax: '2' }, 'si', pileBuild());
    expect(r).toEqual({ ok: false, errors: { inLineVrMax: 'the in-line range must end above where it starts (4)' } });
  });

  it('the chosen shaft and blade-pass orders reach the screening', () => {
    const r = readExcitation(KINDS.stem.resonance, { flowSpeed: '1', machineSpeed: '1500 rpm', bladeCount: '7', shaftOrders: '1, 2, 3', bladePassOrders: '1, 2' }, 'si', pileBuild());
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.excitation.machinery?.[0]).toMatchObject({ shaftOrders: [1, 2, 3], bladePassOrders: [1, 2], bladeCount: 7 });
  });

  it('machinery can be checked against the dry frequencies too (a drained tank with the agitator running)', () => {
    const r = readExcitation(KINDS.baffle.resonance, { machineSpeed: '84 rpm', bladeCount: '3', machineryAgainst: 'wet-and-dry' }, 'si', pileBuild());
    if (!r.ok) throw new Error(JSON.stringify(r.errors));
    expect(r.excitation.machineryAgainst).toBe('wet-and-dry');
    const screened = screenResonance(screeningInputFor(pileBuild().model, solvedPile(), r.excitation));
    expect(screened.modes[0].checks.some((c) => c.kind === 'machinery' && c.frequencyBasis === 'dry')).toBe(true);
  });
});
