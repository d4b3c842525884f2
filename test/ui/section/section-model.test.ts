import { describe, expect, it } from 'vitest';
import { DEMO_CASES, FORMS } from '../../../src/kinds/registry';
import { solveSection, type SectionInput } from '../../../src/physics/section';
import { sectionFromMember } from '../../../src/ui/section/from-member';
import { SECTION_PRESETS } from '../../../src/ui/section/presets';
import { SectionModel } from '../../../src/ui/section/section-model';
import type { SectionSolver } from '../../../src/ui/section/section-solves';
import { SURROUND_WORDS } from '../../../src/ui/section/view-words';
import { CASE_ADVICE, solverFailureWords } from '../../../src/ui/state/solver-words';
import type { Answer } from '../../../src/worker/solver-client';
import { createSectionMemo, solveSectionRequest, type SectionAnswer, type SectionRequest } from '../../../src/app/solve-section';
import { expectClose } from '../../helpers/expect-close';

/** The worker's own function run in place of the worker; `hold` keeps matching requests waiting for ever. */
function fakeSolver(hold: (req: SectionRequest) => boolean = () => false) {
  const memo = createSectionMemo();
  const requests: SectionRequest[] = [];
  let terminated = 0;
  const solver: SectionSolver = {
    request: (req) => {
      requests.push(req);
      if (hold(req)) return new Promise<Answer<SectionAnswer>>(() => {});
      return Promise.resolve({ status: 'done', value: solveSectionRequest(req, memo) });
    },
    terminate: () => {
      terminated++;
    },
  };
  return { solver, requests, terminated: () => terminated };
}

/** Lets pending answers arrive (each answer is one resolved promise; a few turns cover the two-step solve). */
async function settle(): Promise<void> {
  for (let k = 0; k < 5; k++) await new Promise((r) => setTimeout(r, 0));
}

function demoModel(kind: 'pile' | 'riser' | 'baffle' | 'stem') {
  const d = DEMO_CASES.find((c) => c.kind === kind)!;
  const r = FORMS[kind].build({ ...FORMS[kind].defaults(d.system), ...d.values }, d.system);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.build.model;
}

describe('the Section screen model', () => {
  it('opens on the first preset, read into a solver input, and solves nothing until a screen attaches', async () => {
    const f = fakeSolver();
    const model = new SectionModel(f.solver);
    expect(model.get().about).toBe(SECTION_PRESETS[0].about);
    expect(model.get().input).not.toBeNull();
    await settle();
    expect(f.requests).toHaveLength(0);
    model.attach();
    await settle();
    const s = model.get().solve;
    expect(s.phase).toBe('done');
    // Numbers and map first, then the energy cross-check without a map.
    expect(f.requests.map((r) => [r.energyCheck, r.map !== null])).toEqual([
      [false, true],
      [true, false],
    ]);
    // Circle in open water: Ca = 1 (H. Lamb, Hydrodynamics, classical); 1e-3 is the solver's accuracy goal.
    expectClose(s.shown!.result.bodies[0].caX, 1, { rtol: 1e-3, label: 'preset circle Ca' });
  });

  it('solves a member exactly as the member engine sees it, with no round trip through millimetre text', async () => {
    const f = fakeSolver();
    const model = new SectionModel(f.solver);
    model.attach();
    const riser = demoModel('riser');
    expect(model.openMember(riser)).toBe(true);
    const exact = sectionFromMember(riser)!.input;
    expect(model.get().given).toEqual(exact);
    expect(model.get().input).toBe(model.get().given);
    await settle();
    expect(f.requests.at(-1)!.input).toEqual(exact);
    const direct = solveSection(exact);
    if (!direct.ok) throw new Error(direct.message);
    // Same input, same solver: equal to round-off (cross-check of the model's plumbing, not of the physics).
    expectClose(model.get().solve.shown!.result.addedMass[0][0], direct.result.addedMass[0][0], { rtol: 1e-12, label: 'caisson sway added mass' });
    // The editor still shows the section, in mm text; the caisson is a circular enclosure.
    expect(model.get().form.surround.enclosure).toBe('circle');
    expect(model.get().about).toMatch(/^This member's section at z = /);
  });

  it('an edit of the form replaces the given input: from then on the form is what is solved', () => {
    const model = new SectionModel(fakeSolver().solver);
    model.openMember(demoModel('pile'));
    expect(model.get().given).not.toBeNull();
    model.editForm({ ...model.get().form, density: '998' });
    expect(model.get().given).toBeNull();
    expect(model.get().about).toBe('');
    expect(model.get().input?.liquidDensityKgPerM3).toBe(998);
  });

  it('a member the water level crosses opens in plan view, with quay-wall words; a wholly wet one in elevation', () => {
    const model = new SectionModel(fakeSolver().solver);
    const pile = demoModel('pile');
    model.openMember(pile);
    expect(model.get().view).toBe('plan');
    expect(SURROUND_WORDS.plan.wallBelow).toMatch(/quay wall/i);
    expect(SURROUND_WORDS.plan.addBody).toMatch(/neighbour pile/);
    // The same pile with the liquid over its whole length (a horizontal member under water): an elevation.
    model.openMember({ ...pile, liquid: { ...pile.liquid!, toM: pile.lengthM } });
    expect(model.get().view).toBe('elevation');
    expect(SURROUND_WORDS.elevation.wallBelow).toBe('Wall or seabed below');
  });

  it('messages name the boundaries in the words of the view', () => {
    const model = new SectionModel(fakeSolver().solver);
    // The seabed preset's wall moved 2 m above the pile's centre leaves the pile on its dry side: refused.
    model.pickPreset(SECTION_PRESETS.find((p) => p.id === 'seabed')!);
    model.editForm({ ...model.get().form, surround: { ...model.get().form.surround, wallBelowDistance: '-2000' } });
    const message = () => Object.values(model.get().reading.errors).join(' ');
    expect(message()).toContain('dry side of the wall below');
    model.setView('plan');
    expect(message()).toContain('dry side of the wall alongside');
    expect(model.get().input).toBeNull();
  });

  it('a field that does not read solves nothing and keeps the last numbers on screen', async () => {
    const f = fakeSolver();
    const model = new SectionModel(f.solver);
    model.attach();
    await settle();
    const before = model.get().solve.shown;
    expect(before).not.toBeNull();
    const body = model.get().form.bodies[0];
    model.editForm({ ...model.get().form, bodies: [{ ...body, diameter: 'abc' }] });
    await settle();
    expect(model.get().input).toBeNull();
    expect(model.get().reading.errors[`body.${body.id}.diameter`]).toBeTruthy();
    expect(model.get().solve.phase).toBe('idle');
    expect(model.get().solve.shown).toBe(before);
  });

  it('detaching stops a running energy check; attaching again solves again', async () => {
    const f = fakeSolver((req) => req.energyCheck);
    const model = new SectionModel(f.solver);
    const detach = model.attach();
    await settle();
    expect(model.get().solve.phase).toBe('checking');
    detach();
    expect(f.terminated()).toBe(1);
    detach(); // a second call changes nothing
    expect(f.terminated()).toBe(1);
    const asked = f.requests.length;
    model.attach();
    await settle();
    expect(f.requests.length).toBeGreaterThan(asked);
  });

  it('a timeout shows the same sentence as the Member and Results screens, with advice for sections', async () => {
    const timeout: Answer<SectionAnswer> = { status: 'timeout', afterMs: 60_000 };
    const model = new SectionModel({ request: () => Promise.resolve(timeout), terminate: () => {} });
    model.attach();
    await settle();
    expect(model.get().solve.phase).toBe('failed');
    expect(model.get().solve.message).toBe('The solver took longer than 60 s and was stopped. Try fewer bodies.');
    const sameStart = 'The solver took longer than 60 s and was stopped.';
    expect(solverFailureWords(timeout, CASE_ADVICE)!.startsWith(sameStart)).toBe(true);
  });

  it('two models share nothing: there is no module-level state', () => {
    const a = new SectionModel(fakeSolver().solver);
    const b = new SectionModel(fakeSolver().solver);
    a.pickPreset(SECTION_PRESETS.find((p) => p.id === 'pair')!);
    expect(a.get().form.bodies).toHaveLength(2);
    expect(a.get().view).toBe('plan');
    expect(b.get().form.bodies).toHaveLength(1);
    expect(b.get().view).toBe('elevation');
  });

  it('keeps the mapped body within the bodies when one is removed', () => {
    const model = new SectionModel(fakeSolver().solver);
    model.pickPreset(SECTION_PRESETS.find((p) => p.id === 'pair')!);
    model.setBody(1);
    expect(model.get().body).toBe(1);
    model.editForm({ ...model.get().form, bodies: model.get().form.bodies.slice(0, 1) });
    expect(model.get().body).toBe(0);
  });

  it('opens any solver input as given and shows it in the editor', () => {
    const model = new SectionModel(fakeSolver().solver);
    const input: SectionInput = {
      liquidDensityKgPerM3: 1025,
      bodies: [{ shape: 'rectangle', widthM: 0.30001, heightM: 0.2, centerM: [0.1, -0.05], angleDeg: 30 }],
      boundaries: [{ kind: 'wall', pointM: [0, -1], normal: [0, 1] }],
    };
    model.openInput(input, 'Given.');
    expect(model.get().input).toEqual(input);
    expect(model.get().form.bodies[0]).toMatchObject({ shape: 'rectangle', width: '300.01', height: '200', x: '100', y: '-50', angle: '30' });
    expect(model.get().form.surround).toMatchObject({ wallBelow: true, wallBelowDistance: '1000' });
  });
});
