import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { afterFirstAnswer } from '../../../src/ui/state/after-first-answer';

/** The part of the open-case model the helper reads: its state and its change listeners. */
function fakeModel() {
  let state = { results: null as object | null, solverMessage: null as string | null };
  const listeners = new Set<() => void>();
  return {
    get: () => state as never,
    subscribe: (fn: () => void) => {
      listeners.add(fn);
      return () => listeners.delete(fn);
    },
    set(patch: Partial<typeof state>) {
      state = { ...state, ...patch };
      for (const fn of listeners) fn();
    },
    listeners: () => listeners.size,
  };
}

// In Node there is no document (so the page counts as loaded) and no requestIdleCallback (a short timer stands in).
describe('work held back until the first answer', () => {
  beforeEach(() => vi.useFakeTimers());
  afterEach(() => vi.useRealTimers());

  it('runs once, shortly after the first answer, and not again on later answers', () => {
    const model = fakeModel();
    const run = vi.fn();
    afterFirstAnswer(model, run);
    vi.advanceTimersByTime(1000);
    expect(run).not.toHaveBeenCalled();
    model.set({ results: {} });
    vi.advanceTimersByTime(300);
    expect(run).toHaveBeenCalledTimes(1);
    model.set({ results: {} });
    vi.advanceTimersByTime(10_000);
    expect(run).toHaveBeenCalledTimes(1);
    expect(model.listeners()).toBe(0);
  });

  it('a solver message counts as the first answer', () => {
    const model = fakeModel();
    const run = vi.fn();
    afterFirstAnswer(model, run);
    model.set({ solverMessage: 'The solver stopped unexpectedly.' });
    vi.advanceTimersByTime(300);
    expect(run).toHaveBeenCalledTimes(1);
  });

  it('runs anyway a few seconds after load when no case opens, and never once cancelled', () => {
    const quiet = fakeModel();
    const run = vi.fn();
    afterFirstAnswer(quiet, run);
    vi.advanceTimersByTime(3900);
    expect(run).not.toHaveBeenCalled();
    vi.advanceTimersByTime(200);
    expect(run).toHaveBeenCalledTimes(1);

    const cancelled = vi.fn();
    const cancel = afterFirstAnswer(fakeModel(), cancelled);
    cancel();
    vi.advanceTimersByTime(10_000);
    expect(cancelled).not.toHaveBeenCalled();
  });
});
