/// <reference lib="webworker" />
/**
 * The solver worker: a thin adapter so the page never blocks while solving. Each message is
 * `{ id, request }`; each reply is `{ id, value }` (see SolverClient).
 */
import { solveCase, type CaseRequest } from '../app/solve-case';

declare const self: DedicatedWorkerGlobalScope;

self.onmessage = (e: MessageEvent<{ id: number; request: CaseRequest }>) => {
  const { id, request } = e.data;
  self.postMessage({ id, value: solveCase(request) });
};
