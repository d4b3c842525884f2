/**
 * The progress line of a long batch on standard error: at most one a second, so a 10,000-case run says how far it
 * is without flooding a log. The clock is passed in so tests can drive it.
 */
export const PROGRESS_INTERVAL_MS = 1000;

export interface ProgressMeter {
  /** Call after each case; prints when a second has passed since the last line. */
  tick(done: number, failed: number): void;
}

export function progressLine(command: string, done: number, total: number, failed: number, elapsedMs: number): string {
  const s = elapsedMs / 1000;
  const left = done > 0 && done < total ? `, about ${((s / done) * (total - done)).toFixed(0)} s left` : '';
  return `wetmode ${command}: ${done}/${total} cases, ${failed} failed, ${s.toFixed(1)} s${left}`;
}

export function progressMeter(command: string, total: number, now: () => number, write: ((line: string) => void) | undefined): ProgressMeter {
  const start = now();
  let last = start;
  return {
    tick(done, failed) {
      if (!write) return;
      const t = now();
      if (t - last < PROGRESS_INTERVAL_MS) return;
      last = t;
      write(progressLine(command, done, total, failed, t - start));
    },
  };
}
