/**
 * The solver worker started by the page's first script (src/start-solver.ts), handed to the app once. A second
 * worker (after a timeout or a crash) is made as usual.
 */
export type StartedSolverKey = '__wetmodeStartedSolver';

const KEY: StartedSolverKey = '__wetmodeStartedSolver';

export type StartedSolverHolder = { [K in StartedSolverKey]?: Worker };

/** The worker started ahead of the app, the first time only (null if none was started, and afterwards). */
export function takeStartedSolver(): Worker | null {
  const holder = globalThis as StartedSolverHolder;
  const w = holder[KEY] ?? null;
  delete holder[KEY];
  return w;
}
