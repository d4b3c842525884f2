import { describe, expect, it } from 'vitest';
import { drivingCheck, failureText, flowWord, lowestOnset, marginPhrase, summarise } from '../../../src/ui/results/summary';
import { dryMember, pileScreening, solved, wetMember } from './fixtures';

// The standard pile (D = 1 m, U = 1.5 m/s uniform, f = 0.5 Hz, evaluated at the waterline z = 15 m):
// in-line band U/(4.5 D)…U/(1.0 D) = 0.333…1.5 Hz, f inside by min(0.5/0.333 − 1, 1 − 0.5/1.5) = 50 %;
// cross-flow band U/(16 D)…U/(3 D) = 0.094…0.5 Hz, f on its upper edge (margin 0). The in-line check,
// deeper inside, drives (DNV-RP-C205 §9 ranges; margin rule of src/physics/excitation/verdict.ts).

describe('results summary in words', () => {
  it('names the driving mode and excitation with its margin inside the band', () => {
    const s = summarise('pile', 'si', solved(wetMember(), pileScreening()));
    expect(s.verdict).toBe('inside-band');
    expect(s.verdictLine).toBe('Mode 1 against in-line VIV (wet 0.500 Hz): inside band, 50.0 % inside the band.');
  });

  it('gives the lock-in onset speed of the driving check with where it is measured', () => {
    // U_crit = V_R,min · f · D = 1.0 × 0.5 Hz × 1 m = 0.5 m/s (DNV-RP-C205 §9 lower in-line limit).
    const s = summarise('pile', 'si', solved(wetMember(), pileScreening()));
    expect(s.onsetLine).toBe('In-line VIV lock-in begins at a current of 0.5 m/s at 15 m, where mode 1 moves most under the liquid; the current there is 1.5 m/s.');
  });

  it('converts the onset speed and elevation to US units', () => {
    // 0.5 m/s / 0.3048 = 1.640 ft/s; 15 m / 0.3048 = 49.21 ft; 1.5 m/s = 4.921 ft/s (exact foot definition).
    const s = summarise('pile', 'us', solved(wetMember(), pileScreening()));
    expect(s.onsetLine).toBe('In-line VIV lock-in begins at a current of 1.64 ft/s at 49.21 ft, where mode 1 moves most under the liquid; the current there is 4.92 ft/s.');
  });

  it('states the lowest dry and wet frequencies and their ratio', () => {
    const s = summarise('pile', 'si', solved(wetMember(), pileScreening()));
    // 0.5 / 0.55 = 0.90909…
    expect(s.frequencyLine).toBe('Lowest dry frequency 0.550 Hz; lowest wet frequency 0.500 Hz (wet/dry 0.909).');
  });

  it('says frequencies only when there are no resonance inputs, and why wet is missing for a dry member', () => {
    const s = summarise('stem', 'si', solved(dryMember(), null));
    expect(s.verdict).toBeNull();
    expect(s.verdictLine).toBeNull();
    expect(s.frequencyLine).toBe('Lowest dry frequency 0.550 Hz; no wet frequency.');
    expect(s.notes[0]).toBe('No wet frequencies: no liquid given.');
    expect(s.notes[1]).toMatch(/^Frequencies only: no resonance inputs yet/);
  });

  it('passes on a screening error in words while keeping the frequencies', () => {
    const s = summarise('pile', 'si', solved(wetMember(), null, 'flowSpeedMPerS must be ≥ 0, got -1'));
    expect(s.notes).toContain('Resonance screening could not run: flowSpeedMPerS must be ≥ 0, got -1. The frequencies are still good.');
  });

  it('falls back to the lowest onset of any shedding check when a machine drives the verdict', () => {
    // No flow: shedding cannot reach the mode (margin null, clear); a pump at 30 rpm, 1× = 0.5 Hz = f, is on its line.
    const scr = pileScreening({ flowSpeedMPerS: 0, machinery: [{ label: 'pump', shaftSpeedHz: 0.5, shaftOrders: [1] }] });
    const d = drivingCheck(scr)!;
    expect(d.check.kind).toBe('machinery');
    const low = lowestOnset(scr)!;
    // In-line onset 1.0 × 0.5 × 1 = 0.5 m/s is below cross-flow's 3.0 × 0.5 × 1 = 1.5 m/s.
    expect(low.check.kind).toBe('in-line-viv');
    const s = summarise('pile', 'si', solved(wetMember(), scr));
    expect(s.verdictLine).toBe('Mode 1 against pump 1× shaft (wet 0.500 Hz): inside band, on the edge of the band (±20 % required).');
    expect(s.onsetLine).toBe(
      'Lowest onset of any shedding check (mode 1): In-line VIV lock-in would begin at a current of 0.5 m/s at 15 m, where mode 1 moves most under the liquid; the current there is 0 m/s.',
    );
  });

  it('words a margin outside the band with the separation required, and a check that cannot reach the mode', () => {
    expect(marginPhrase({ verdict: 'close', marginPercent: 12.34 }, 0.2)).toBe('margin +12.3 % outside the band (±20 % required)');
    expect(marginPhrase({ verdict: 'clear', marginPercent: null }, 0.2)).toBe('this excitation cannot reach the mode');
  });

  it('calls the flow by its trade name for each member kind', () => {
    expect([flowWord('pile'), flowWord('riser'), flowWord('baffle'), flowWord('stem')]).toEqual(['current', 'current', 'liquid speed', 'flow speed']);
  });
});

describe('failed solves in plain words', () => {
  it('says a buckling member buckles under the compression and keeps the solver message', () => {
    const f = failureText({ ok: false, reason: 'buckles', message: 'buckles under this load: axial force down to -2e6 N' });
    expect(f.title).toBe('The member buckles');
    expect(f.text).toMatch(/^This member buckles under the given compression/);
    expect(f.text).toContain('axial force down to -2e6 N');
  });

  it('asks for a support when the member is a mechanism', () => {
    const f = failureText({ ok: false, reason: 'mechanism', message: 'member can move as a rigid body: add a support' });
    expect(f.text).toMatch(/^This member can move as a rigid body: add a support/);
  });

  it('shows an invalid-input message as it is', () => {
    expect(failureText({ ok: false, reason: 'invalid-input', message: 'lengthM must be > 0, got -2' }).text).toBe('lengthM must be > 0, got -2');
  });
});
