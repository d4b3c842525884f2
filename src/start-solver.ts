/**
 * The page's first script (put in index.html as an `async` module by build/start-solver-first.ts): starts the
 * solver worker before the app's own script has loaded. The worker's script then loads on its own thread while
 * the page fetches, parses and runs the app, so it is ready to solve the first case the moment the app asks
 * (src/ui/state/services.ts takes this worker). Free of imports (a type aside), so it runs as soon as it arrives.
 */
import type { StartedSolverHolder, StartedSolverKey } from './worker/started-solver';

const KEY: StartedSolverKey = '__wetmodeStartedSolver';

try {
  performance.mark('wetmode:solver-start'); // a start step the first-load measurement prints (see boot-marks.ts)
  (globalThis as StartedSolverHolder)[KEY] = new Worker(new URL('./worker/solver.worker.ts', import.meta.url), { type: 'module' });
} catch {
  // No module workers here: the app makes its own and reports the problem.
}
