import { describe, expect, it } from 'vitest';
import { statusLine } from '../../../src/ui/results/status';
import { assumptionLines, beamTheoryText, meshText, tensionText } from '../../../src/ui/results/assumptions';
import { displayUnits } from '../../../src/ui/results/display-units';
import type { MemberBuild } from '../../../src/kinds/common/types';
import { dryMember, wetMember } from './fixtures';

describe('status line above the results', () => {
  it('marks kept results out of date with the number of errors', () => {
    expect(statusLine({ hasResults: true, stale: true, computing: false, errorsCount: 2 })).toEqual({
      tone: 'stale',
      text: 'Out of date: the inputs have 2 errors. These are the last results; fix the marked fields on the Member form.',
    });
    expect(statusLine({ hasResults: true, stale: true, computing: false, errorsCount: 1 })!.text).toContain('have 1 error.');
  });

  it('marks results out of date while recomputing after a change', () => {
    expect(statusLine({ hasResults: true, stale: true, computing: true, errorsCount: 0 })).toEqual({ tone: 'stale', text: 'Out of date: the inputs changed. Recomputing…' });
  });

  it('says nothing when the results belong to the inputs', () => {
    expect(statusLine({ hasResults: true, stale: false, computing: false, errorsCount: 0 })).toBeNull();
  });

  it('tells the user what to do when there are no results yet', () => {
    expect(statusLine({ hasResults: false, stale: false, computing: false, errorsCount: 0 })!.text).toMatch(/Fill in the Member form/);
    expect(statusLine({ hasResults: false, stale: false, computing: false, errorsCount: 3 })!.text).toMatch(/has 3 errors/);
    expect(statusLine({ hasResults: false, stale: false, computing: true, errorsCount: 0 })).toEqual({ tone: 'busy', text: 'Computing…' });
  });
});

describe('assumptions and solver report', () => {
  const build = { origin: 'support face of the stem', notes: ['The stem is clamped at the support face.'] } as unknown as MemberBuild;

  it('states potential flow and the pressure-release surface only when there is liquid', () => {
    const wet = assumptionLines(wetMember(), build);
    expect(wet.some((l) => l.startsWith('Added mass from potential flow: the liquid is inviscid'))).toBe(true);
    expect(wet.some((l) => l.includes('pressure-release') && l.includes('sloshing'))).toBe(true);
    const dry = assumptionLines(dryMember(), build);
    expect(dry.some((l) => l.includes('pressure-release'))).toBe(false);
  });

  it('names the beam theory used, the origin of z and the fixity notes of the member', () => {
    const lines = assumptionLines(wetMember({ beamTheory: 'timoshenko' }), build);
    expect(lines).toContain(beamTheoryText('timoshenko'));
    expect(beamTheoryText('timoshenko')).toMatch(/^Timoshenko/);
    expect(beamTheoryText('euler-bernoulli')).toMatch(/^Euler–Bernoulli/);
    expect(lines).toContain('Elevations z are measured along the member from the support face of the stem.');
    expect(lines).toContain('The stem is clamped at the support face.');
  });

  it('does not repeat the beam theory when the member builder already states it', () => {
    const said = { origin: 'support face of the stem', notes: ['Shear deformation and rotary inertia are included (Timoshenko beam), as the member is stubby.'] } as unknown as MemberBuild;
    const lines = assumptionLines(wetMember({ beamTheory: 'timoshenko' }), said);
    expect(lines.filter((l) => l.includes('Timoshenko'))).toHaveLength(1);
  });

  it('reports the mesh used and whether it converged', () => {
    expect(meshText(wetMember())).toBe('32 elements (meshes tried: 16, 32 elements); converged: largest change at the last doubling 0.01 %, tolerance 0.05 %.');
    const m = wetMember({ mesh: { elements: 3200, history: [3200], converged: false, lastChangePercent: null, relativeTolerance: 5e-4 } });
    expect(meshText(m)).toBe('3200 elements; NOT converged: refinement off.');
  });

  it('gives axial load in kN only when there is any', () => {
    expect(tensionText(wetMember(), displayUnits('si'))).toBeNull();
    const t = wetMember({ tension: { varies: true, topN: 250e3, bottomN: 180e3, minN: 180e3, maxN: 250e3 } });
    expect(tensionText(t, displayUnits('si'))).toBe('Axial tension varies with submerged weight: 180 kN at the bottom, 250 kN at the top (negative = compression).');
    // 250 kN / 4.4482216 kN per kip = 56.2 kip
    expect(tensionText(t, displayUnits('us'))).toContain('56.2 kip at the top');
  });
});
