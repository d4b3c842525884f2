import { describe, it, expect } from 'vitest';

import { sectionFormFromMember } from '../../../src/ui/section/from-member';
import { readSectionForm } from '../../../src/ui/section/read-form';
import { solveSection } from '../../../src/physics/section';
import { expectClose } from '../../helpers/expect-close';
import { DEMO_CASES, FORMS } from '../../../src/kinds/registry';

function demoModel(kind: 'pile' | 'riser' | 'baffle' | 'stem') {
  const d = DEMO_CASES.find((c) => c.kind === kind)!;
  const r = FORMS[kind].build({ ...FORMS[kind].defaults(d.system), ...d.values }, d.system);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.build.model;
}

describe('the section view filled from a member', () => {
  it('a pile in open water becomes a circle of its diameter with growth, with Ca = 1 (Lamb, classical)', () => {
    const s = sectionFormFromMember(demoModel('pile'))!;
    // Demo pile: 762 mm + 2 × 75 mm growth = 912 mm at mid-depth (growth band covers the water column).
    expect(s.form.bodies[0]).toMatchObject({ shape: 'circle', diameter: '912' });
    const input = readSectionForm(s.form).input!;
    const out = solveSection(input);
    if (!out.ok) throw new Error(out.message);
    expectClose(out.result.bodies[0].caX, 1, { rtol: 1e-3, label: 'Ca of the pile section' }); // solver accuracy goal 0.1 %
  });

  it('the riser in its caisson gives the same sway added mass through the editor as the member engine uses', () => {
    const model = demoModel('riser');
    const s = sectionFormFromMember(model)!;
    expect(s.form.surround.enclosure).toBe('circle');
    const viaEditor = solveSection(readSectionForm(s.form).input!);
    const direct = solveSection({ liquidDensityKgPerM3: model.liquid!.densityKgPerM3, bodies: [{ shape: 'circle', diameterM: Number(s.form.bodies[0].diameter) / 1000 }], boundaries: model.liquid!.boundaries });
    if (!viaEditor.ok || !direct.ok) throw new Error('solve failed');
    // Same geometry both ways (common practice: a round trip must not change the answer); 1e-4 allows the 5-figure mm text.
    expectClose(viaEditor.result.addedMass[0][0], direct.result.addedMass[0][0], { rtol: 1e-4, label: 'caisson sway added mass' });
  });

  it('a baffle becomes a plate standing across the motion, with its wall beside it', () => {
    const s = sectionFormFromMember(demoModel('baffle'))!;
    expect(s.form.bodies[0]).toMatchObject({ shape: 'plate', angle: '90' });
    expect(readSectionForm(s.form).input).not.toBeNull();
  });

  it('a member with no liquid has no submerged section', () => {
    const model = demoModel('stem');
    expect(sectionFormFromMember({ ...model, liquid: undefined })).toBeNull();
  });
});
