/**
 * Solving one view's section in the section worker: the numbers and the map first, the kinetic-energy
 * cross-check second (it takes several times longer). The last good answer is kept while the section is
 * edited, invalid or being solved again; a view marks it out of date by comparing its key with the current
 * input's. Holds no module state: each view (the Section screen's model, the Results screen's panel) owns one
 * runner, and the page's one worker client is passed in.
 */
import type { SectionInput, SectionResult } from '../../physics/section';
import type { Answer } from '../../worker/solver-client';
import type { SectionAnswer, SectionField, SectionMapRequest, SectionRequest } from '../../app/solve-section';
import { SECTION_ADVICE, solverFailureWords } from '../state/solver-words';

/** The part of the worker client a view uses (a fake in tests). */
export interface SectionSolver {
  request(req: SectionRequest): Promise<Answer<SectionAnswer>>;
  /** Stops the worker; anything running or waiting resolves as superseded, the next request starts a new one. */
  terminate(): void;
}

export interface Shown {
  /** Key of the input these numbers belong to (see inputKey). */
  key: string;
  input: SectionInput;
  result: SectionResult;
  field: SectionField | null;
  fieldError: string | null;
}

export type SolvePhase = 'idle' | 'solving' | 'checking' | 'done' | 'failed';

export interface SolveState {
  phase: SolvePhase;
  /** Why the last solve gave no numbers, in words (phase 'failed'), or why the energy check is missing. */
  message: string | null;
  shown: Shown | null;
}

export const IDLE: SolveState = { phase: 'idle', message: null, shown: null };

export function inputKey(input: SectionInput | null): string {
  return input ? JSON.stringify(input) : '';
}

/** Words for an answer that is not a result (null for `superseded`: a newer request replaced it). */
export function answerProblem(a: Answer<SectionAnswer>): string | null {
  if (a.status === 'done') return a.value.ok ? null : `No numbers for this section: ${a.value.message}.`;
  return solverFailureWords(a, SECTION_ADVICE);
}

export class SectionSolves {
  private state: SolveState = IDLE;
  private listeners = new Set<(s: SolveState) => void>();
  /** Input and map of the last run, so asking again for the same does nothing. */
  private asked = '';
  /** Bumped by every run and stop: an answer for an older ticket is dropped. */
  private ticket = 0;
  private checking = false;

  constructor(
    private readonly solver: SectionSolver,
    private readonly energyCheck = true,
  ) {}

  get(): SolveState {
    return this.state;
  }

  subscribe(fn: (s: SolveState) => void): () => void {
    this.listeners.add(fn);
    return () => this.listeners.delete(fn);
  }

  /** Solves `input` (null: nothing to solve) and maps `map`; does nothing if both are as last asked. */
  run(input: SectionInput | null, map: SectionMapRequest | null): void {
    const asked = `${inputKey(input)}\n${JSON.stringify(map)}`;
    if (asked === this.asked) return;
    this.stop();
    this.asked = asked;
    if (!input) {
      this.set({ ...this.state, phase: 'idle', message: null });
      return;
    }
    this.set({ ...this.state, phase: 'solving', message: null });
    void this.sequence(this.ticket, input, map);
  }

  /**
   * Drops any answer still to come and forgets what was asked, so the next run solves again. A running energy
   * check is stopped with its worker: new edits would otherwise wait for it (a fresh worker starts with the
   * next request and answers in a fraction of a second).
   */
  stop(): void {
    this.ticket++;
    this.asked = '';
    if (this.checking) this.solver.terminate();
    this.checking = false;
  }

  private set(s: SolveState): void {
    this.state = s;
    for (const fn of this.listeners) fn(s);
  }

  private async sequence(ticket: number, input: SectionInput, map: SectionMapRequest | null): Promise<void> {
    const key = inputKey(input);
    const a = await this.solver.request({ op: 'section', input, energyCheck: false, map });
    if (ticket !== this.ticket || a.status === 'superseded') return;
    if (a.status !== 'done' || !a.value.ok) {
      this.set({ ...this.state, phase: 'failed', message: answerProblem(a) });
      return;
    }
    const { result, field, fieldError } = a.value;
    const shown: Shown = { key, input, result, field, fieldError };
    if (!this.energyCheck) {
      this.set({ phase: 'done', message: null, shown });
      return;
    }
    this.set({ phase: 'checking', message: null, shown });
    this.checking = true;
    const b = await this.solver.request({ op: 'section', input, energyCheck: true, map: null });
    if (ticket !== this.ticket) return;
    this.checking = false;
    if (b.status === 'done' && b.value.ok) {
      this.set({ phase: 'done', message: null, shown: { ...shown, result: b.value.result } });
    } else {
      // Superseded here means another view asked the shared worker meanwhile: the numbers stand, unchecked.
      this.set({ phase: 'done', message: `The energy cross-check did not run. ${answerProblem(b) ?? ''}`.trim(), shown });
    }
  }
}
