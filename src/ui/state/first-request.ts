/**
 * The solve the page will most likely ask for first, so the boot can start it before the device store is open
 * (src/ui/state/early-boot.ts; SolverClient.prefetch): the last request answered on this device, kept in
 * localStorage, else the demo case's on a device that has none. A wrong guess costs one solve in the worker and
 * nothing else: the answer is used only for a request with the same JSON text.
 */
import { caseFromDemo } from '../../app/create-case';
import { readCase, requestOf } from '../../app/read-case';
import type { CaseRequest } from '../../app/solve-case';
import { DEMO_CASES } from '../../kinds/registry';

const KEY = 'wetmode-last-request';
/** A request is a few kB; anything far larger is not kept (localStorage is small and shared with the drafts' copies). */
const MAX_CHARS = 200_000;

export function rememberRequest(request: CaseRequest): void {
  try {
    const text = JSON.stringify(request);
    if (text.length <= MAX_CHARS) localStorage.setItem(KEY, text);
  } catch {
    // No localStorage (private mode, a test environment) or it is full: the next start just does not guess.
  }
}

export function likelyFirstRequest(): CaseRequest | null {
  try {
    const text = localStorage.getItem(KEY);
    if (text) return JSON.parse(text) as CaseRequest;
  } catch {
    // Unreadable: guess the demo below.
  }
  try {
    const reading = readCase(caseFromDemo(DEMO_CASES[0]));
    return reading.ok ? requestOf(reading) : null;
  } catch {
    return null; // the demo needs the full unit reader: no guess
  }
}
