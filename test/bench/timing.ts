/** Small timing helpers for `npm run bench`: medians over repeated runs, printed as tables. */
import { performance } from 'node:perf_hooks';
import { seededUniform01 } from '../../src/physics/linalg/seeded';

export interface Timing {
  medianMs: number;
  minMs: number;
  runs: number;
}

/** Runs `fn` a few times to warm up, then `runs` times, and reports the median wall time. */
export function time(fn: () => unknown, runs = 30, warmup = 5): Timing {
  for (let i = 0; i < warmup; i++) fn();
  const t = new Float64Array(runs);
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    fn();
    t[i] = performance.now() - t0;
  }
  t.sort();
  return { medianMs: t[Math.floor(runs / 2)], minMs: t[0], runs };
}

/** Prints a figure against its target: "PASS"/"OVER" is information, not a test result. */
export function report(label: string, t: Timing, targetMs?: number): void {
  const target = targetMs === undefined ? '' : `  target ≤ ${targetMs} ms: ${t.medianMs <= targetMs ? 'met' : 'NOT met'}`;
  console.log(`${label.padEnd(58)} median ${t.medianMs.toFixed(3).padStart(9)} ms  min ${t.minMs.toFixed(3).padStart(9)} ms  (${t.runs} runs)${target}`);
}

/** A seeded generator so benchmark inputs repeat run to run. */
export const seeded = seededUniform01;
