/**
 * Solving in the section worker from the view: the numbers and the map first, the kinetic-energy cross-check
 * second (it takes several times longer). The last good answer is kept while the form is edited, invalid or
 * being solved again; the screen marks it out of date by comparing its key with the current input's.
 */
import { useEffect, useState } from 'preact/hooks';
import type { SectionInput, SectionResult } from '../../physics/section';
import { SolverClient, type Answer, type WorkerLike } from '../../worker/solver-client';
import type { SectionAnswer, SectionField, SectionMapRequest, SectionRequest } from '../../worker/solve-section';

/** The energy check of eight bodies takes about 9 s on the development machine; allow a slow tablet well beyond that. */
const TIMEOUT_MS = 60_000;

let client: SolverClient<SectionRequest, SectionAnswer> | null = null;

/** The one section worker of the page, started on first use. */
function sectionClient(): SolverClient<SectionRequest, SectionAnswer> {
  client ??= new SolverClient<SectionRequest, SectionAnswer>(
    () => new Worker(new URL('../../worker/section.worker.ts', import.meta.url), { type: 'module' }) as unknown as WorkerLike,
    TIMEOUT_MS,
  );
  return client;
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

export function inputKey(input: SectionInput | null): string {
  return input ? JSON.stringify(input) : '';
}

/** Words for an answer that is not a result (null for `superseded`: a newer request replaced it). */
export function answerProblem(a: Answer<SectionAnswer>): string | null {
  switch (a.status) {
    case 'superseded':
      return null;
    case 'timeout':
      return `The solve took longer than ${Math.round(a.afterMs / 1000)} s and was stopped. Try fewer bodies.`;
    case 'crashed':
      return `The solver stopped unexpectedly (${a.message}).`;
    case 'done':
      return a.value.ok ? null : `No numbers for this section: ${a.value.message}.`;
  }
}

/**
 * Solves `input` (null: nothing to solve) and maps `map`; re-runs when either changes. `energyCheck: false`
 * skips the slow second step (a summary view that shows no cross-check).
 */
export function useSectionSolve(input: SectionInput | null, map: SectionMapRequest | null, options: { energyCheck?: boolean } = {}): SolveState {
  const withCheck = options.energyCheck ?? true;
  const [state, setState] = useState<SolveState>({ phase: 'idle', message: null, shown: null });
  const key = inputKey(input);
  const mapKey = JSON.stringify(map);
  useEffect(() => {
    if (!input) {
      setState((s) => ({ ...s, phase: 'idle', message: null }));
      return;
    }
    let live = true;
    // While the slow energy check runs, a new input or map would wait for it; stopping the worker instead
    // (a fresh one starts with the next request) keeps edits answered in a fraction of a second.
    let checking = false;
    const c = sectionClient();
    setState((s) => ({ ...s, phase: 'solving', message: null }));
    void (async () => {
      const a = await c.request({ op: 'section', input, energyCheck: false, map });
      if (!live || a.status === 'superseded') return;
      if (a.status !== 'done' || !a.value.ok) {
        setState((s) => ({ ...s, phase: 'failed', message: answerProblem(a) }));
        return;
      }
      const { result, field, fieldError } = a.value;
      if (!withCheck) {
        setState({ phase: 'done', message: null, shown: { key, input, result, field, fieldError } });
        return;
      }
      setState({ phase: 'checking', message: null, shown: { key, input, result, field, fieldError } });
      checking = true;
      const b = await c.request({ op: 'section', input, energyCheck: true, map: null });
      checking = false;
      if (!live || b.status === 'superseded') return;
      if (b.status === 'done' && b.value.ok) {
        const checked = b.value.result;
        setState((s) => ({ phase: 'done', message: null, shown: s.shown && s.shown.key === key ? { ...s.shown, result: checked } : s.shown }));
      } else {
        setState((s) => ({ ...s, phase: 'done', message: `The energy cross-check did not run. ${answerProblem(b) ?? ''}`.trim() }));
      }
    })();
    return () => {
      live = false;
      if (checking) c.terminate();
    };
    // key and mapKey stand for input and map, which are new objects on every render.
  }, [key, mapKey, withCheck]);
  return state;
}
