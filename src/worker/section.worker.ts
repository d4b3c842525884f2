/// <reference lib="webworker" />
/**
 * The section worker: a thin adapter so the Section view never blocks while solving. Each message is
 * `{ id, request }`; each reply is `{ id, value }` (see SolverClient). The memo lives as long as the worker.
 */
import { createSectionMemo, solveSectionRequest, type SectionRequest } from '../app/solve-section';

declare const self: DedicatedWorkerGlobalScope;

const memo = createSectionMemo();

self.onmessage = (e: MessageEvent<{ id: number; request: SectionRequest }>) => {
  const { id, request } = e.data;
  self.postMessage({ id, value: solveSectionRequest(request, memo) });
};
