/**
 * The open case and everything derived from it: field messages, the last results and whether they are
 * out of date. One small observable object; screens subscribe through `useModel`.
 *
 * Flow: an edit changes `doc` → the case is read at once (units, checks) → if readable, a solve is asked of
 * the worker (latest request wins) → results arrive and are kept with the reading they belong to. A form that
 * does not read keeps the last good results on screen, marked out of date. Every edit of an editable case is
 * saved as a draft shortly after, so closing the tab, an update or a crash loses nothing.
 */
import type { Case, KeyResult } from '../../case';
import { sameCaseContent } from '../../case';
import type { KindBuild } from '../../kinds/common/types';
import type { FieldErrors } from '../../forms';
import { readCaseOnDemand } from './read-on-demand';
import { revisionOf } from '../../store';
import { requestOf, warningLines } from '../../app/read-case';
import { answerFigures } from '../../app/answer-figures';
import type { CaseAnswer, CaseRequest } from '../../app/solve-case';
import type { Answer } from '../../worker/solver-client';
import { caseSolverWords } from './case-solver-words';
import { markOnce } from './boot-marks';
import { rememberRequest } from './first-request';

export type CaseMode = 'editing' | 'received';

export interface Results {
  answer: CaseAnswer;
  build: KindBuild;
  /** Content key of the case these results were computed for. */
  forKey: string;
  /** Accepted inputs outside their soft range, as sentences (warningLines), shown with the results and in the report. */
  inputWarnings?: string[];
}

export interface ModelState {
  doc: Case | null;
  mode: CaseMode;
  /** The open case as last saved on the device (null: not saved yet). */
  saved: Case | null;
  errors: FieldErrors;
  excitationErrors: FieldErrors;
  /** Accepted values outside their soft range, by field key (member and resonance fields). */
  warnings: FieldErrors;
  results: Results | null;
  computing: boolean;
  /** A solver problem in words (timeout, crash), if any. */
  solverMessage: string | null;
  /** Draft or save problem in words, if any. */
  storageMessage: string | null;
  /** Revision of the saved copy the open case started from (null: never saved on this device, as far as we know). */
  baseRevision: number | null;
  /** A save refused because another tab or window saved the case meanwhile: the choice waiting for the user. */
  conflict: Conflict | null;
  /** What another tab did to the open case's saved copy, in words (null when nothing). */
  elsewhere: string | null;
}

/** The saved version found when a save was refused (null when that record cannot be read) and its revision. */
export interface Conflict {
  theirs: Case | null;
  revision: number;
}

export interface Solver {
  request(req: CaseRequest): Promise<Answer<CaseAnswer>>;
  /** Starts a solve expected to be asked for soon (SolverClient.prefetch); absent in tests' fakes. */
  prefetch?(req: CaseRequest): void;
}

export interface DraftSink {
  saveDraft(c: Case, baseRevision: number | null, received: boolean): Promise<{ ok: boolean; message?: string }>;
}

/** What decides the results: the member and resonance inputs and the unit system (not name, tag or note). */
export function contentKey(c: Case): string {
  return JSON.stringify([c.kind, c.unitSystem, c.inputs, c.excitation]);
}

/** The figures kept with a saved case for the Cases list. */
export function keyResultOf(results: Results | null): KeyResult | undefined {
  const a = results?.answer;
  if (!a || !a.ok) return undefined;
  // A member with no liquid has no wet frequency: the list then shows the verdict only.
  const { lowestWetHz: f, verdict } = answerFigures(a);
  return { lowestWetFrequencyHz: f !== null && f > 0 && Number.isFinite(f) ? f : undefined, verdict: verdict ?? undefined };
}

export class AppModel {
  private state: ModelState = {
    doc: null,
    mode: 'editing',
    saved: null,
    errors: {},
    excitationErrors: {},
    warnings: {},
    results: null,
    computing: false,
    solverMessage: null,
    storageMessage: null,
    baseRevision: null,
    conflict: null,
    elsewhere: null,
  };
  private listeners = new Set<() => void>();
  private draftTimer: ReturnType<typeof setTimeout> | null = null;

  constructor(
    private readonly solver: Solver,
    private drafts: DraftSink | null = null,
    private readonly draftDelayMs = 400,
  ) {}

  get(): ModelState {
    return this.state;
  }

  /** Starts the solve of a case about to be opened (its request), ahead of opening it. */
  prefetch(request: CaseRequest): void {
    this.solver.prefetch?.(request);
  }

  subscribe(fn: () => void): () => void {
    this.listeners.add(fn);
    return () => this.listeners.delete(fn);
  }

  setDraftSink(sink: DraftSink | null): void {
    this.drafts = sink;
  }

  private set(patch: Partial<ModelState>): void {
    this.state = { ...this.state, ...patch };
    for (const fn of this.listeners) fn();
  }

  /**
   * Opens a case: `saved` says whether this exact content is already on the device; `baseRevision` is the
   * revision of the saved copy it starts from (by default the one the store read it at, when saved).
   */
  open(doc: Case, mode: CaseMode, saved: boolean, baseRevision: number | null = saved ? revisionOf(doc) : null): void {
    this.set({ doc, mode, saved: saved ? doc : null, results: null, solverMessage: null, storageMessage: null, baseRevision, conflict: null, elsewhere: null });
    this.recompute();
  }

  /** Closes the open case without keeping it (the boot's early demo on a device whose store turned out to hold cases). */
  close(): void {
    if (this.draftTimer !== null) clearTimeout(this.draftTimer);
    this.draftTimer = null;
    this.set({ doc: null, mode: 'editing', saved: null, errors: {}, excitationErrors: {}, warnings: {}, results: null, computing: false, solverMessage: null, baseRevision: null, conflict: null, elsewhere: null });
  }

  /** A save was refused because the case was saved elsewhere meanwhile (null: the choice was made). */
  setConflict(conflict: Conflict | null): void {
    this.set({ conflict });
  }

  /** Says what another tab did to the open case (null to clear). */
  setElsewhere(text: string | null): void {
    this.set({ elsewhere: text });
  }

  /** The open case's edits now start from this saved revision (its own rename made on the Cases list). */
  setBaseRevision(revision: number | null): void {
    this.set({ baseRevision: revision });
  }

  /** True when the open case has changes not saved as a case (name, note and inputs all count). */
  unsaved(): boolean {
    const { doc, saved } = this.state;
    return !!doc && (!saved || !sameCaseContent(doc, saved));
  }

  markSaved(doc: Case, revision: number | null = revisionOf(doc)): void {
    this.set({ doc, saved: doc, mode: 'editing', baseRevision: revision ?? this.state.baseRevision, conflict: null, elsewhere: null });
  }

  /** Applies an edit to the open case; a received case becomes editable only through saving. */
  edit(change: (doc: Case) => Case): void {
    const { doc } = this.state;
    if (!doc) return;
    const next = { ...change(doc), updatedAt: new Date().toISOString() };
    const inputsChanged = contentKey(next) !== contentKey(doc);
    this.set({ doc: next });
    if (inputsChanged) this.recompute();
    this.scheduleDraft();
  }

  setField(key: string, text: string): void {
    this.edit((d) => ({ ...d, inputs: { ...d.inputs, [key]: text } }));
  }

  setExcitation(key: string, text: string): void {
    this.edit((d) => ({ ...d, excitation: { ...d.excitation, [key]: text } }));
  }

  /** Whether the results on screen belong to the inputs on screen. */
  resultsCurrent(): boolean {
    const { doc, results, computing } = this.state;
    return !!doc && !!results && !computing && results.forKey === contentKey(doc);
  }

  /**
   * Saves the draft now (when the page is hidden). `everyCase`: before an app update, any open case is kept —
   * a received or imported one too, marked so it reopens as received — so the update reopens it.
   */
  async flushDraft(options: { everyCase?: boolean } = {}): Promise<void> {
    if (this.draftTimer !== null) clearTimeout(this.draftTimer);
    this.draftTimer = null;
    const { doc, mode, baseRevision } = this.state;
    if (!doc || !this.drafts || (mode !== 'editing' && !options.everyCase)) return;
    const r = await this.drafts.saveDraft(doc, baseRevision, mode === 'received');
    if (!r.ok && options.everyCase) throw new Error(r.message ?? 'storage refused it');
    if (!r.ok) this.set({ storageMessage: `Draft not saved: ${r.message ?? 'storage refused it'}` });
    else if (this.state.storageMessage?.startsWith('Draft not saved')) this.set({ storageMessage: null });
  }

  private scheduleDraft(): void {
    if (this.state.mode !== 'editing' || !this.drafts) return;
    if (this.draftTimer !== null) clearTimeout(this.draftTimer);
    this.draftTimer = setTimeout(() => void this.flushDraft(), this.draftDelayMs);
  }

  private recompute(): void {
    const { doc } = this.state;
    if (!doc) return;
    const reading = readCaseOnDemand(doc, () => this.recompute(), (m) => this.set({ solverMessage: m }));
    if (!reading) return; // read again once the unit reader has loaded
    this.set({ errors: reading.ok ? {} : reading.errors, excitationErrors: reading.excitationErrors, warnings: reading.ok ? reading.warnings : {} });
    if (!reading.ok) return; // last good results stay, marked out of date
    const key = contentKey(doc);
    const build = reading.build;
    const inputWarnings = warningLines(reading.warnings);
    this.set({ computing: true });
    markOnce('wetmode:solve-asked');
    const request = requestOf(reading);
    void this.solver
      .request(request)
      .catch((e: unknown): Answer<CaseAnswer> => ({ status: 'crashed', message: e instanceof Error ? e.message : String(e) }))
      .then((ans) => {
      if (ans.status === 'superseded' || !this.state.doc) return; // closed meanwhile: nothing to show it on
      if (ans.status === 'done') {
        markOnce('wetmode:answer-received');
        const current = this.state.doc && contentKey(this.state.doc) === key;
        if (current) rememberRequest(request);
        this.set({ results: { answer: ans.value, build, forKey: key, inputWarnings }, computing: !current, solverMessage: null });
      } else {
        this.set({ computing: false, solverMessage: caseSolverWords(ans, doc) });
      }
    });
  }
}
