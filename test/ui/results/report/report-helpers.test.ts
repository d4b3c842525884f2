import { describe, expect, it } from 'vitest';

import { inputRows, withUnit } from '../../../../src/ui/report/report-inputs';
import { formatDateTime } from '../../../../src/ui/report/report-meta';
import { methodNotes, strouhalSources } from '../../../../src/ui/report/method-notes';
import { displayUnits } from '../../../../src/ui/results/display-units';
import { dryMember, pileScreening, wetMember } from '../fixtures';
import { FORMS, kindOf } from '../../../../src/kinds/registry';

describe('inputs as typed, for the report', () => {
  it('adds the field unit to a bare number and keeps a typed unit', () => {
    expect(withUnit('610', 'mm')).toBe('610 mm');
    expect(withUnit(' 24 in ', 'mm')).toBe('24 in');
    expect(withUnit('3, 12; 21', 'm')).toBe('3, 12; 21 m');
    expect(withUnit('7.85 t/m^3', 'kg/m^3')).toBe('7.85 t/m³');
    expect(withUnit('1.2e3', 'kg/m^3')).toBe('1.2e3 kg/m³');
    expect(withUnit('20', '')).toBe('20');
  });

  it('lists the shown pile fields with labels, choice words and preset values', () => {
    const rows = inputRows(FORMS.pile.fields, { outerDiameter: '762', wallThickness: '0.55 in', foundation: 'fixity', fixityDepth: '' }, 'si');
    const by = new Map(rows.map((r) => [r.key, r.value]));
    expect(by.get('outerDiameter')).toBe('762 mm');
    expect(by.get('wallThickness')).toBe('0.55 in');
    expect(by.get('material')).toBe('Carbon steel');
    // Carbon steel preset E = 210 GPa (src/forms/presets.ts)
    expect(by.get('youngsModulus')).toBe('210 GPa (from Carbon steel)');
    expect(by.get('fixityDepth')).toMatch(/^empty: /);
    // Soil-spring fields are hidden while "Fixed at a depth" is chosen, so they are not inputs of this case.
    expect(by.has('embeddedLength')).toBe(false);
    expect(rows.find((r) => r.key === 'outerDiameter')!.label).toBe('Outer diameter');
  });

  it('gives a US case’s bare numbers the US unit, and missing keys their SI default', () => {
    const rows = inputRows(FORMS.pile.fields, { outerDiameter: '30' }, 'us');
    const by = new Map(rows.map((r) => [r.key, r.value]));
    expect(by.get('outerDiameter')).toBe('30 in');
    // wallThickness not in the values: the form reads its SI default '12' mm
    expect(by.get('wallThickness')).toBe('12 mm');
  });

  it('lists resonance inputs with what an empty field stands for', () => {
    const rows = inputRows(kindOf('pile').resonance.fields, { currentSurface: '1.2 m/s', currentMid: '' }, 'si');
    const by = new Map(rows.map((r) => [r.key, r.value]));
    expect(by.get('currentSurface')).toBe('1.2 m/s');
    expect(by.get('currentMid')).toBe('empty: same as at the surface');
    expect(by.get('dampingRatio')).toBe('0.5 %');
  });
});

describe('report dates', () => {
  it('prints an ISO time as year-month-day hours:minutes in UTC', () => {
    expect(formatDateTime('2026-03-14T09:21:05.123Z', true)).toBe('2026-03-14 09:21 UTC');
  });

  it('prints local time with its offset from UTC', () => {
    expect(formatDateTime('2026-03-14T09:21:05.123Z')).toMatch(/^\d{4}-\d\d-\d\d \d\d:\d\d \(UTC[+\u2212]\d\d:\d\d\)$/);
  });

  it('prints text that is not a date as it is', () => {
    expect(formatDateTime('yesterday', true)).toBe('yesterday');
  });
});

describe('method notes with their published sources', () => {
  const si = displayUnits('si');

  it('cites beam theory, Lamb’s closed form, DNV-RP-C205 §9 and the Strouhal source of the result', () => {
    const s = pileScreening();
    const notes = methodNotes(wetMember(), s, si);
    expect(notes[0].text).toMatch(/^Natural frequencies and mode shapes by Euler–Bernoulli beam finite elements/);
    expect(notes.some((n) => n.source === 'H. Lamb, Hydrodynamics (classical)')).toBe(true);
    expect(notes.some((n) => n.source === 'DNV-RP-C205 §9')).toBe(true);
    const st = strouhalSources(s);
    expect(st.length).toBeGreaterThan(0);
    for (const src of st) expect(notes).toContainEqual({ text: 'Strouhal number', source: src });
  });

  it('leaves out added mass and screening for a dry member without resonance inputs', () => {
    const notes = methodNotes(dryMember(), null, si);
    expect(notes).toHaveLength(1);
  });

  it('cites DNV-RP-H103 when a perforation factor was applied', () => {
    const m = wetMember({ addedMass: { endEffect: null, perforation: { ratio: 0.2, factor: 0.85, source: 'DNV-RP-H103, Modelling and Analysis of Marine Operations, §4.6.4.3' }, sectionSolves: 0, sectionRelativeError: null } });
    expect(methodNotes(m, null, si).some((n) => n.source.startsWith('DNV-RP-H103'))).toBe(true);
  });
});
