/** Test helpers: a demo case solved the way the app does it (readCase, then the worker's solveCase, in-process). */
import type { Case } from '../../../src/case';
import { readCase, requestOf } from '../../../src/app/read-case';
import { solveCase, type CaseAnswer, type CaseRequest } from '../../../src/app/solve-case';
import type { Solver } from '../../../src/ui/state/app-model';

export function solveDoc(doc: Case): CaseAnswer {
  const r = readCase(doc);
  if (!r.ok) throw new Error(`test case does not read: ${JSON.stringify(r.errors)}`);
  return solveCase(requestOf(r));
}

/** The worker, in-process and synchronous underneath, for an AppModel in tests. */
export const inlineSolver: Solver = {
  request: async (req: CaseRequest) => ({ status: 'done', value: solveCase(req) }),
};
