/**
 * The boot of the page, started as the app's script runs, before the UI mounts: the solver worker starts, the
 * device store opens, and the first case (this tab's draft, a closed tab's draft, the last case, or the demo on a
 * fresh device) is opened in the model, which reads it with the quick unit reader and sends it to the worker at
 * once. The UI then mounts on a model that is already solving, straight onto the Member screen. When the first
 * case can be told without the store (the demo on a device that has kept nothing, device-record.ts; the unsaved
 * work a page left as it went away, first-guess.ts) it is opened before the store, and the UI mounts at once; the
 * store's choice replaces it when it opens if it differs and the user has not touched it. Whatever fails on the way, the store and the
 * Cases screen still open. One boot per page; `useBoot` takes it over.
 */
import type { CaseStore } from '../../store';
import type { AppServices } from './context';
import { clearFallback, readFallbacks } from './draft-fallback';
import { openDeviceStoreOnce } from './early-store';
import { lastOpenCase } from './last-case';
import { followStoreChanges } from './remote-changes';
import { createModel, createSectionModel, createSectionSolver, firstCase, mergeFallbacks, type FirstCase } from './services';
import { openTabs, tabIdentity, type TabIdentity } from './tab';
import { markOnce } from './boot-marks';
import { likelyFirstRequest } from './first-request';
import { freshDevice, noteStoreHolds } from './device-record';
import { sameCaseContent, type Case } from '../../case';
import { guessFirstCase, type GuessedCase } from './first-guess';
import { caseFromDemo } from '../../app/create-case';
import { DEMO_CASES } from '../../kinds/registry';

export type BootServices = Pick<AppServices, 'model' | 'section' | 'sectionSolver'>;

export interface BootOutcome {
  tab: TabIdentity;
  store: CaseStore | null;
  storeMessage: string | null;
  storeRetryable: boolean;
}

export interface Boot {
  services: BootServices;
  /** Settles (never rejects) once the store is open (or known unavailable) and the first case, if any, is open. */
  outcome: Promise<BootOutcome>;
  /** The outcome once settled (null before): a UI mounted after it starts with the store and renders once. */
  settled: BootOutcome | null;
  /** True once the first case has been opened before the store (the demo on a device with nothing kept, or a page's
   * unsaved work left as it went away; settled at once, or when the open tabs are known): the UI mounts then. */
  openedEarly: Promise<boolean>;
}

let boot: Boot | null = null;

/** The page's boot, started on the first call; `openingLink`: the page opens a shared link, so no case is reopened. */
export function bootOnce(openingLink: boolean): Boot {
  if (boot) return boot;
  const sectionSolver = createSectionSolver();
  const services: BootServices = { model: createModel(), section: createSectionModel(sectionSolver), sectionSolver };
  const lastCase = { reloaded: lastOpenCase(false), newTab: lastOpenCase(true) }; // before an early case is remembered
  // The first case opened before the store has opened (its solve starts at once), when it can be told without the
  // store: the demo on a device that has kept nothing, or the unsaved work a page left as it went away
  // (first-guess.ts). The store is still read below and wins if it holds something else.
  let early: Promise<Case | null> = Promise.resolve(null);
  if (!openingLink) {
    const open = (guess: GuessedCase | null): Case | null => {
      if (!guess) return null;
      services.model.open(guess.doc, 'editing', false, guess.baseRevision);
      if (landingHash()) location.hash = '#/member';
      return guess.doc;
    };
    const tab = tabIdentity();
    const fallbacks = typeof indexedDB === 'undefined' ? [] : readFallbacks();
    const opened = open(freshDevice() ? { doc: caseFromDemo(DEMO_CASES[0]), baseRevision: null } : guessFirstCase(fallbacks, tab, null));
    if (opened) early = Promise.resolve(opened);
    else {
      // The worker starts on the likeliest first case now, while the store opens (a few hundred ms on a slow tablet).
      const request = likelyFirstRequest();
      if (request) services.model.prefetch(request);
      // A new tab may take a closed tab's copy: which tabs are open is known long before the store is.
      if (tab.fresh && fallbacks.length > 0) early = openTabs().then((live) => (live ? open(guessFirstCase(fallbacks, tab, live)) : null));
    }
  }
  const made: Boot = { services, settled: null, openedEarly: early.then((c) => c !== null), outcome: openFirstCase(services.model, openingLink, early, lastCase).then((o) => (made.settled = o)) };
  boot = made;
  return made;
}

/** Whether this browser can tell open tabs from closed ones (Web Locks): only then does a new tab take a closed tab's draft. */
function canTellOpenTabs(): boolean {
  return typeof (globalThis.navigator as { locks?: { query?: unknown } } | undefined)?.locks?.query === 'function';
}

/** Longest the store waits for the first answer of a case opened early (a slow solve must not hold it back). */
const STORE_WAITS_FOR_ANSWER_MS = 1000;

/** Settles once the open case has its answer (or a solver message), or after `ms`. */
export function answeredOr(model: Pick<BootServices['model'], 'get' | 'subscribe'>, ms: number): Promise<void> {
  return new Promise((resolve) => {
    const answered = () => model.get().results !== null || model.get().solverMessage !== null;
    let off = () => {};
    const timer = setTimeout(() => done(), ms);
    const done = () => {
      off();
      clearTimeout(timer);
      resolve();
    };
    off = model.subscribe(() => answered() && done());
    if (answered()) done();
  });
}

/** The device store once the page's boot has opened it (null when it cannot be opened, or with no boot started). */
export function storeOnceOpen(): Promise<CaseStore | null> {
  return boot ? boot.outcome.then((o) => o.store) : Promise.resolve(null);
}

/** The location of a start with no screen asked for: it lands on the screen of the first case. */
function landingHash(): boolean {
  return location.hash === '' || location.hash === '#' || location.hash === '#/';
}

/**
 * Opens the store, merges the localStorage draft copies, and opens the first case in the model. `early`: the demo
 * opened before the store; if the user has not changed it, the store's choice (a draft, the last case, the Cases
 * list) replaces it exactly as a start without it would open; if they have, their edits stand and are kept as
 * this tab's draft now that there is a store to keep them in. Never rejects.
 */
async function openFirstCase(model: BootServices['model'], openingLink: boolean, earlyOpening: Promise<Case | null>, lastCase: { reloaded: string | null; newTab: string | null }): Promise<BootOutcome> {
  const early = await earlyOpening; // settled at once, or when the open tabs are known (a few ms)
  // A case opened early: the store's work on the main thread (opening, upgrading, merging) waits for its answer.
  if (early) await answeredOr(model, STORE_WAITS_FOR_ANSWER_MS);
  const { tab, opened } = await openDeviceStoreOnce();
  markOnce('wetmode:store-open');
  const store = opened.store && noteWrites(opened.store);
  try {
    if (store) {
      const fallbacks = readFallbacks();
      if (fallbacks.length > 0) noteStoreHolds();
      await mergeFallbacks(store, fallbacks, clearFallback);
      model.setDraftSink({
        saveDraft: async (c, baseRevision, received) => {
          const r = await store.saveDraft(c, baseRevision, received);
          return r.ok ? { ok: true } : { ok: false, message: r.message };
        },
      });
      followStoreChanges(store, model); // for the page's life, as the model is
    }
    const untouched = () => model.get().doc === null || (early !== null && model.get().doc === early);
    if (!openingLink && untouched()) {
      const first = await firstCase(store, tab.fresh, await openTabs(), tab.fresh ? lastCase.newTab : lastCase.reloaded);
      if (store && !first?.demo) noteStoreHolds(); // a store with cases or drafts (one kept before this mark existed)
      // The user may have opened or changed a case while the store was read: theirs stands.
      if (untouched()) openChosen(model, first, early);
    }
    // Edits made to the case opened early, before there was a store: keep them as this tab's draft now.
    if (early && model.get().doc !== early && model.get().mode === 'editing' && model.unsaved()) await model.flushDraft();
  } catch (e) {
    // Never let a case stop the app from starting: the store and the Cases screen still open regardless.
    console.error('Wetmode could not reopen the last case:', e);
  }
  return { tab, store, storeMessage: opened.message, storeRetryable: opened.retryable };
}

/** Opens the boot's choice of first case, in place of the early demo when there was one. */
function openChosen(model: BootServices['model'], first: FirstCase | null, early: Case | null): void {
  if (first?.demo && early) return; // the store holds nothing to reopen: the case already open stays, its answer too
  if (early && first && first.mode === 'editing' && first.doc.id === early.id && sameCaseContent(first.doc, early)) {
    // The guess was the store's choice: it stays open (its answer too), with what the store knows of its saved copy.
    if (first.saved) model.markSaved(early, first.baseRevision);
    else model.setBaseRevision(first.baseRevision);
    return;
  }
  const movedHash = early !== null && location.hash === '#/member';
  if (!first) {
    // Saved cases but nothing to reopen: the Cases list, as a start that had waited for the store would show.
    if (early) model.close();
    if (movedHash) location.replace('#/cases');
    return;
  }
  model.open(first.doc, first.mode, first.saved, first.baseRevision);
  // A first start (or a return to unsaved work) lands on the form, not an empty list.
  if (landingHash() || movedHash) location.hash = first.mode === 'received' ? '#/results' : '#/member';
}

/** The store, with every write that leaves a case or draft on the device marked in the device record first. */
function noteWrites(store: CaseStore): CaseStore {
  const noted = <A extends unknown[], R>(f: (...a: A) => R) => (...a: A): R => {
    noteStoreHolds();
    return f(...a);
  };
  return {
    ...store,
    saveCase: noted(store.saveCase),
    duplicateCase: noted(store.duplicateCase),
    undoDelete: noted(store.undoDelete),
    saveDraft: noted(store.saveDraft),
    mergeDraft: noted(store.mergeDraft),
    saveReceived: noted(store.saveReceived),
  };
}
