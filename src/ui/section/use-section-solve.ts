/**
 * A component's own section solves (the Results screen's member panel): one SectionSolves runner per
 * component on the page's section worker, re-run when the input or the map changes, stopped on unmount.
 * The Section screen itself keeps its runner in its model (section-model.ts).
 */
import { useEffect, useState } from 'preact/hooks';
import type { SectionInput } from '../../physics/section';
import type { SectionMapRequest } from '../../app/solve-section';
import { SectionSolves, type SectionSolver, type SolveState } from './section-solves';

export function useSectionSolve(
  solver: SectionSolver,
  input: SectionInput | null,
  map: SectionMapRequest | null,
  options: { energyCheck?: boolean } = {},
): SolveState {
  const [solves] = useState(() => new SectionSolves(solver, options.energyCheck ?? true));
  const [state, setState] = useState<SolveState>(() => solves.get());
  useEffect(() => {
    const off = solves.subscribe(setState);
    return () => {
      off();
      solves.stop();
    };
  }, [solves]);
  // run() compares the input and map with the last ones asked, so running on every render costs one JSON text.
  useEffect(() => solves.run(input, map));
  return state;
}
