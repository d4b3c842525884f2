/**
 * Creates the app's services: the solver worker behind a SolverClient, the open-case model, and the device
 * store (opened asynchronously). Also the first-start choice of what to open.
 */
import { SolverClient, type WorkerLike } from '../../worker/solver-client';
import type { CaseAnswer, CaseRequest } from '../../worker/solve-case';
import { openStore, newCase, type CaseStore } from '../../store';
import { DEMO_CASES, FORMS } from '../../forms';
import { excitationDefaults } from '../../forms/excitation';
import { sameCaseContent, type Case } from '../../physics/case';
import type { DemoCase } from '../../forms';
import { AppModel } from './app-model';
import { loadUnitReaderAfterFirstAnswer } from './read-on-demand';

export function createModel(): AppModel {
  const client = new SolverClient<CaseRequest, CaseAnswer>(
    () => new Worker(new URL('../../worker/solver.worker.ts', import.meta.url), { type: 'module' }) as unknown as WorkerLike,
  );
  client.start(); // the worker loads while the device store opens
  const model = new AppModel(client);
  loadUnitReaderAfterFirstAnswer(model);
  return model;
}

/** A fresh, unsaved case from a demo, with its own id. */
export function caseFromDemo(demo: DemoCase): Case {
  const c = newCase({ kind: demo.kind, unitSystem: demo.system, name: demo.name, tag: demo.tag, note: demo.note });
  return {
    ...c,
    inputs: { ...FORMS[demo.kind].defaults(demo.system), ...demo.values },
    excitation: { ...excitationDefaults(demo.kind, demo.system), ...(demo.excitation ?? {}) },
  };
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
