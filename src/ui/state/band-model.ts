/**
 * The band of the open case over its ranges, kept apart from the open-case model so the likely answer still
 * follows every keystroke: it watches the open case, and a short while after the member, resonance inputs or
 * ranges last changed (about a quarter of a second, so typing does not queue bands) asks the band worker for
 * the band. Older requests are dropped by the client (latest wins) and by the key each answer carries.
 */
import { type Case } from '../../case';
import type { BandAnswer, BandRequest } from '../../app/band-case';
import type { Answer } from '../../worker/solver-client';
import type { Verdict as BandVerdictWord } from '../../physics/excitation/verdict';
import type { AppModel } from './app-model';
import { type SolverAdvice, solverFailureWords } from './solver-words';

/** Advice after a band that gave no answer. */
export const BAND_ADVICE: SolverAdvice = {
  timeout: 'Try fewer or narrower ranges.',
  crashed: 'Your ranges are kept; change a value to try again.',
};

export interface BandSolver {
  request(req: BandRequest): Promise<Answer<BandAnswer>>;
}

export interface BandState {
  /** 'none': no range is on. */
  status: 'none' | 'working' | 'done' | 'failed';
  answer: BandAnswer | null;
  /** Key of the case the answer belongs to. */
  forKey: string | null;
  /** A solver problem in words (timeout, crash). */
  message: string | null;
}

/** What decides the band: the member and resonance inputs, the units and the ranges. */
export function bandKey(c: Case): string {
  return JSON.stringify([c.kind, c.unitSystem, c.inputs, c.excitation, c.ranges ?? {}]);
}

export function hasRangesOn(c: Case | null): boolean {
  return !!c && Object.values(c.ranges ?? {}).some((r) => r.on);
}

export class BandModel {
  private state: BandState = { status: 'none', answer: null, forKey: null, message: null };
  private listeners = new Set<() => void>();
  private timer: ReturnType<typeof setTimeout> | null = null;
  private lastKey: string | null = null;

  constructor(
    private readonly app: AppModel,
    private readonly solver: BandSolver,
    private readonly delayMs = 250,
  ) {
    app.subscribe(() => this.onCase());
    this.onCase();
  }

  get(): BandState {
    return this.state;
  }

  subscribe(fn: () => void): () => void {
    this.listeners.add(fn);
    return () => this.listeners.delete(fn);
  }

  /** True when the band on screen belongs to the case on screen. */
  current(): boolean {
    const doc = this.app.get().doc;
    return !!doc && this.state.status === 'done' && this.state.forKey === bandKey(doc);
  }

  /** The verdict over the band of the case on screen, when it is worked out and current. */
  currentVerdict(): BandVerdictWord | undefined {
    const a = this.state.answer;
    return this.current() && a && a.ok && a.band && a.verdict ? a.verdict.bandVerdict : undefined;
  }

  private set(patch: Partial<BandState>): void {
    this.state = { ...this.state, ...patch };
    for (const fn of this.listeners) fn();
  }

  private onCase(): void {
    const doc = this.app.get().doc;
    const key = doc ? bandKey(doc) : null;
    if (key === this.lastKey) return;
    this.lastKey = key;
    if (this.timer !== null) clearTimeout(this.timer);
    this.timer = null;
    if (!doc || !hasRangesOn(doc)) {
      this.set({ status: 'none', answer: null, forKey: null, message: null });
      return;
    }
    this.set({ status: 'working', message: null });
    this.timer = setTimeout(() => this.ask(doc, key!), this.delayMs);
  }

  private ask(doc: Case, key: string): void {
    this.timer = null;
    const { kind, inputs, excitation, unitSystem, ranges } = doc;
    void this.solver.request({ op: 'band', case: { kind, inputs, excitation, unitSystem, ranges } }).then((ans) => {
      if (ans.status === 'superseded' || key !== this.lastKey) return;
      if (ans.status === 'done') this.set({ status: ans.value.ok ? 'done' : 'failed', answer: ans.value, forKey: key, message: null });
      else this.set({ status: 'failed', message: solverFailureWords(ans, BAND_ADVICE) });
    });
  }
}
