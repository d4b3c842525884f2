/**
 * Creates the app's services: the solver worker behind a SolverClient, the open-case model, and the device
 * store (opened asynchronously). Also the first-start choice of what to open.
 */
import { SolverClient, type WorkerLike } from '../../worker/solver-client';
import type { CaseAnswer, CaseRequest } from '../../app/solve-case';
import { openStore, revisionOf, SET_ASIDE_TAB, type CaseStore, type Draft } from '../../store';
import type { FallbackDraft } from './draft-fallback';
import { caseFromDemo } from '../../app/create-case';
import { sameCaseContent, type Case } from '../../case';
import { AppModel } from './app-model';
import type { SectionAnswer, SectionRequest } from '../../app/solve-section';
import { sectionModelOnDemand, type SectionModelOnDemand } from '../section/section-model-on-demand';
import type { SectionSolver } from '../section/section-solves';
import { DEMO_CASES } from '../../kinds/registry';
import { loadUnitReaderAfterFirstAnswer } from './read-on-demand';
import { takeStartedSolver } from '../../worker/started-solver';

export function createModel(): AppModel {
  const client = new SolverClient<CaseRequest, CaseAnswer>(
    // The first worker was started by the page's first script (src/start-solver.ts); a replacement is made here.
    () => (takeStartedSolver() ?? new Worker(new URL('../../worker/solver.worker.ts', import.meta.url), { type: 'module' })) as unknown as WorkerLike,
  );
  client.start(); // the worker loads while the device store opens
  const model = new AppModel(client);
  loadUnitReaderAfterFirstAnswer(model);
  return model;
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

/** The Section screen's model on the page's section worker, made on first use (see section-model-on-demand.ts). */
export function createSectionModel(solver: SectionSolver): SectionModelOnDemand {
  return sectionModelOnDemand(solver);
}


export type StoreOpening = { store: CaseStore; message: null; retryable: false } | { store: null; message: string; retryable: boolean };

export async function openDeviceStore(tabId?: string): Promise<StoreOpening> {
  if (typeof indexedDB === 'undefined') return { store: null, message: 'This browser offers no storage for cases here. Links and files still work.', retryable: false };
  const r = await openStore(undefined, { tabId });
  // Blocked by another tab, closed under us, or upgraded by a newer Wetmode: a reload (after closing other tabs) fixes it.
  return r.ok ? { store: r.value, message: null, retryable: false } : { store: null, message: r.message, retryable: r.kind === 'blocked' || r.kind === 'closed' || r.kind === 'newer-database' };
}

/** Merges the drafts tabs left in localStorage as they closed into the store (newer wins), then removes them. */
export async function mergeFallbacks(store: CaseStore, fallbacks: readonly FallbackDraft[], clear: (tab: string) => void): Promise<void> {
  for (const f of fallbacks) {
    const r = await store.mergeDraft(f.tab, f.case as Case, f.savedAt, f.baseRevision, f.received);
    // Written or older than the database's: either way the copy has done its work. A copy the store refuses
    // (not a readable case) is dropped too; it can only come from a damaged localStorage entry.
    if (r.ok || r.kind === 'invalid-case') clear(f.tab);
  }
}

export interface FirstCase {
  doc: Case;
  mode: 'editing' | 'received';
  saved: boolean;
  baseRevision: number | null;
  /** The demo, opened because the store holds nothing to reopen (or there is no store). */
  demo?: true;
}

async function fromDraft(store: CaseStore, draft: Draft): Promise<FirstCase> {
  const mode = draft.received ? 'received' : 'editing';
  const saved = await store.getCase(draft.case.id);
  const same = mode === 'editing' && saved.ok && sameCaseContent(saved.value, draft.case);
  return { doc: draft.case, mode, saved: same, baseRevision: same && saved.ok ? revisionOf(saved.value) : draft.baseRevision };
}

/**
 * What to open at start. This tab's own draft first (a reload or an update in this tab). A new tab takes the
 * newest draft of a tab that was closed — a surveyor who closed the tab and opens the app again expects to find
 * the work where they left it; other closed tabs' drafts are offered on the Cases screen. Else the saved case last
 * open (this tab's after a reload, the device's in a new tab: `lastCaseId`). Else, on a device with
 * no saved cases, the demo pile (a first look shows a real answer); else nothing (the Cases list).
 * Never throws: a draft or list that cannot be read is passed over (and listed on the Cases screen).
 */
export async function firstCase(store: CaseStore | null, fresh = false, liveTabs: Set<string> | null = null, lastCaseId: string | null = null): Promise<FirstCase | null> {
  const demo = (): FirstCase => ({ doc: caseFromDemo(DEMO_CASES[0]), mode: 'editing', saved: false, baseRevision: null, demo: true });
  if (!store) return demo();
  try {
    const own = await store.loadDraft();
    if (own.ok && own.value) return await fromDraft(store, own.value);
    if (fresh && liveTabs) {
      const all = await store.listDrafts();
      for (const d of all.ok ? all.value.drafts : []) {
        // Set-aside drafts were left on purpose (or by a link opened over them): offered on the Cases screen only.
        if (liveTabs.has(d.tab) || d.tab === SET_ASIDE_TAB) continue;
        const taken = await store.adoptDraft(d.key);
        if (taken.ok) return await fromDraft(store, taken.value);
      }
    }
    if (lastCaseId) {
      // The case open when the app last closed, saved since (a saved case keeps no draft): reopen it as saved.
      const last = await store.getCase(lastCaseId);
      if (last.ok) return { doc: last.value, mode: 'editing', saved: true, baseRevision: revisionOf(last.value) };
    }
    // One light row and the count (no full case parsed); the whole light list only when no case is readable.
    const first = await store.listRows('updated', 1);
    if (first.ok && first.value.total > 0) return null;
    const list = await store.listRows('updated');
    if (list.ok && (list.value.rows.length > 0 || list.value.unreadable.length > 0)) return null;
    return demo();
  } catch {
    return null;
  }
}
