/// <reference lib="webworker" />
/**
 * The band worker: the band over the ranges of a case, apart from the solver worker so the likely answer
 * keeps following every keystroke while a band is worked out. Messages `{ id, request }`, replies
 * `{ id, value }` (see SolverClient).
 */
import { bandCase, type BandRequest } from '../app/band-case';

declare const self: DedicatedWorkerGlobalScope;

self.onmessage = (e: MessageEvent<{ id: number; request: BandRequest }>) => {
  const { id, request } = e.data;
  let value;
  try {
    value = bandCase(request.case);
  } catch (err) {
    value = { ok: false, errors: {}, message: err instanceof Error ? err.message : String(err) };
  }
  self.postMessage({ id, value });
};
