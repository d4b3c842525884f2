/**
 * Reading a case in the browser while the unit reader (mathjs) may still be loading: plain entries are read at
 * once (see src/units/math-on-demand.ts); an entry that needs mathjs loads it, then the caller reads again.
 * After the first answer the reader is fetched in the background, so a first edit rarely has to wait for it.
 */
import type { Case } from '../../case';
import { readCase, type CaseReading } from '../../app/read-case';
import { loadUnitReader, unitReaderLoaded } from '../../units/math-on-demand';
import { isUnitReaderPending } from '../../units/reader-pending';
import type { AppModel } from './app-model';
import { afterFirstAnswer } from './after-first-answer';

/**
 * The reading of `doc`, or null while mathjs loads; `again` runs once it has (`failed` if it cannot be
 * fetched, e.g. offline before the service worker had stored it).
 */
export function readCaseOnDemand(
  doc: Pick<Case, 'kind' | 'inputs' | 'excitation' | 'unitSystem'>,
  again: () => void,
  failed: (message: string) => void,
): CaseReading | null {
  try {
    return readCase(doc);
  } catch (e) {
    if (!isUnitReaderPending(e)) throw e;
    loadUnitReader().then(again, (err: unknown) => failed(`The unit reader could not be loaded (${err instanceof Error ? err.message : String(err)}). Reload the page to try again.`));
    return null;
  }
}

/** Fetches mathjs once the first answer is on screen (see after-first-answer.ts), ready for the first edit. */
export function loadUnitReaderAfterFirstAnswer(model: Pick<AppModel, 'get' | 'subscribe'>): void {
  afterFirstAnswer(model, () => {
    if (!unitReaderLoaded()) void loadUnitReader().catch(() => undefined); // a failure here is retried on first need
  });
}
