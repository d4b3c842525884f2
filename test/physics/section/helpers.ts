/** Shared helpers for the section tests. */
import { solveSection } from '../../../src/physics/section/index';
import type { SectionInput, SectionResult, SolveOptions } from '../../../src/physics/section/index';

export const RHO = 1000;

/** Solves and fails the test with the solver's message if the solve did not succeed. */
export function solved(input: SectionInput, options: SolveOptions = {}): SectionResult {
  const o = solveSection(input, options);
  if (!o.ok) throw new Error(`solve failed: ${o.reason}: ${o.message}`);
  return o.result;
}

/** Single body in unbounded liquid of density RHO. */
export function alone(body: SectionInput['bodies'][number], boundaries: SectionInput['boundaries'] = []): SectionInput {
  return { liquidDensityKgPerM3: RHO, bodies: [body], boundaries };
}

/** Observed order of convergence from three values at h, h/2, h/4. */
export function observedOrder(a: number, b: number, c: number): number {
  return Math.log2((a - b) / (b - c));
}
