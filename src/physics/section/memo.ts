/**
 * Section results remembered between keystrokes: a small least-recently-used memo of `solveSection`,
 * keyed by a canonical serialisation of the input and the options (object keys sorted, so two inputs
 * that differ only in key order share an entry).
 *
 * Why it is safe: the solve is a pure function of its input and options (no clock, no randomness, no
 * global state), and every remembered outcome is deep-frozen before it is stored, so no caller can change
 * what the next caller receives. Bound: MEMO_ENTRIES outcomes; a one-body result is about 2 kB of numbers
 * and text, a 24-body one about 0.3 MB, so the memo stays well under 10 MB in the worst case.
 */
import { BoundedMemo } from '../memo/bounded-memo';
import { solveSection } from './solve';
import type { SectionInput, SectionOutcome, SolveOptions } from './types';

/** Most remembered outcomes: a form's section, its previous edits and a few surroundings. */
export const MEMO_ENTRIES = 32;

const memo = new BoundedMemo<SectionOutcome>(MEMO_ENTRIES);

/** JSON with object keys sorted at every level (arrays keep their order); undefined members are dropped. */
export function canonicalKey(v: unknown): string {
  if (v === null || typeof v !== 'object') return JSON.stringify(v) ?? 'null';
  if (Array.isArray(v)) return `[${v.map(canonicalKey).join(',')}]`;
  const o = v as Record<string, unknown>;
  const keys = Object.keys(o).filter((k) => o[k] !== undefined).sort();
  return `{${keys.map((k) => `${JSON.stringify(k)}:${canonicalKey(o[k])}`).join(',')}}`;
}

function deepFreeze<T>(v: T): T {
  // Typed arrays cannot be frozen (the result holds none; kept safe if one is added).
  if (v !== null && typeof v === 'object' && !ArrayBuffer.isView(v) && !Object.isFrozen(v)) {
    Object.freeze(v);
    for (const x of Object.values(v as object)) deepFreeze(x);
  }
  return v;
}

/**
 * `solveSection` through the memo. The outcome is frozen (read-only): copy what you change. Invalid input
 * throws as `solveSection` does and is not remembered.
 */
export function solveSectionMemo(input: SectionInput, options: SolveOptions = {}): Readonly<SectionOutcome> {
  // A throw (invalid input) leaves nothing behind; failures of the solve itself are outcomes and are kept.
  return memo.get(canonicalKey({ input, options }), () => deepFreeze(solveSection(input, options))) as SectionOutcome;
}

/** Number of remembered outcomes (for tests). */
export function memoSize(): number {
  return memo.size;
}

/** Forgets every remembered outcome (for tests and benchmarks that time the solve itself). */
export function clearSectionMemo(): void {
  memo.clear();
}
