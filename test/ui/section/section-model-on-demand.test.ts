import { describe, expect, it } from 'vitest';
import { DEMO_CASES, FORMS } from '../../../src/kinds/registry';
import { sectionFromMember } from '../../../src/ui/section/from-member';
import { sectionModelOnDemand } from '../../../src/ui/section/section-model-on-demand';
import type { SectionSolver } from '../../../src/ui/section/section-solves';

/** A solver that never answers: these tests look at what the model holds, not at solves. */
const idleSolver: SectionSolver = { request: () => new Promise(() => {}), terminate: () => {} };

function demoPile() {
  const d = DEMO_CASES.find((c) => c.kind === 'pile')!;
  const r = FORMS.pile.build({ ...FORMS.pile.defaults(d.system), ...d.values }, d.system);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.build.model;
}

describe('the Section model made on first use', () => {
  it('is not made until it is first asked for, and then is one model for the page', async () => {
    const slot = sectionModelOnDemand(idleSolver);
    expect(slot.current()).toBeNull();
    const [a, b] = await Promise.all([slot.get(), slot.get()]);
    expect(a).toBe(b);
    expect(slot.current()).toBe(a);
  });

  it('a member handed over before the model exists is open in it when the model is first had', async () => {
    const slot = sectionModelOnDemand(idleSolver);
    const pile = demoPile();
    slot.openMember(pile);
    const model = await slot.get();
    // The same solver input the member engine builds from this member (cross-check by the other route).
    expect(model.get().given).toEqual(sectionFromMember(pile)?.input ?? null);
    expect(model.get().given).not.toBeNull();
  });
});
