/**
 * Creates the app's services: the solver worker behind a SolverClient, the open-case model, and the device
 * store (opened asynchronously). Also the first-start choice of what to open.
 */
import { SolverClient, type WorkerLike } from '../../worker/solver-client';
import type { CaseAnswer, CaseRequest } from '../../app/solve-case';
import { openStore, type CaseStore } from '../../store';
import { caseFromDemo } from '../../app/create-case';
import { sameCaseContent, type Case } from '../../case';
import { AppModel } from './app-model';
import type { SectionAnswer, SectionRequest } from '../../worker/solve-section';
import { SectionModel } from '../section/section-model';
import type { SectionSolver } from '../section/section-solves';
import { DEMO_CASES } from '../../kinds/registry';

export function createModel(): AppModel {
  const client = new SolverClient<CaseRequest, CaseAnswer>(
    () => new Worker(new URL('../../worker/solver.worker.ts', import.meta.url), { type: 'module' }) as unknown as WorkerLike,
  );
  return new AppModel(client);
}

/** The energy check of eight bodies takes about 9 s on the development machine; allow a slow tablet well beyond that. */
const SECTION_TIMEOUT_MS = 60_000;

/** The page's one section worker (started on first use), shared by the Section screen and the Results panel. */
export function createSectionSolver(): SectionSolver {
  return new SolverClient<SectionRequest, SectionAnswer>(
    () => new Worker(new URL('../../worker/section.worker.ts', import.meta.url), { type: 'module' }) as unknown as WorkerLike,
    SECTION_TIMEOUT_MS,
  );
}

/** The Section screen's model on the page's section worker. */
export function createSectionModel(solver: SectionSolver): SectionModel {
  return new SectionModel(solver);
}


export type StoreOpening = { store: CaseStore; message: null; retryable: false } | { store: null; message: string; retryable: boolean };

export async function openDeviceStore(): Promise<StoreOpening> {
  if (typeof indexedDB === 'undefined') return { store: null, message: 'This browser offers no storage for cases here. Links and files still work.', retryable: false };
  const r = await openStore();
  // Blocked by another tab, closed under us, or upgraded by a newer Wetmode: a reload (after closing other tabs) fixes it.
  return r.ok ? { store: r.value, message: null, retryable: false } : { store: null, message: r.message, retryable: r.kind === 'blocked' || r.kind === 'closed' || r.kind === 'newer-database' };
}

/**
 * What to open at start: the draft if there is one (never lose work), else — on a device with no saved
 * cases — the demo pile, so a first look shows a real answer; else nothing (the Cases list).
 */
export async function firstCase(store: CaseStore | null): Promise<{ doc: Case; saved: boolean } | null> {
  if (store) {
    const draft = await store.loadDraft();
    if (draft.ok && draft.value) {
      const saved = await store.getCase(draft.value.case.id);
      const same = saved.ok && sameCaseContent(saved.value, draft.value.case);
      return { doc: draft.value.case, saved: same };
    }
    const list = await store.listCases();
    if (list.ok && (list.value.cases.length > 0 || list.value.unreadable.length > 0)) return null;
  }
  return { doc: caseFromDemo(DEMO_CASES[0]), saved: false };
}
