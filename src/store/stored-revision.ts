/** The revision number each stored case record carries next to the case (saves are checked against it). */
export const REVISION_FIELD = 'revision';

/** The revision of a stored record: a whole number ≥ 0; a record without one (older versions) counts as 0. */
export function storedRevision(raw: unknown): number {
  const r = typeof raw === 'object' && raw !== null ? (raw as Record<string, unknown>)[REVISION_FIELD] : undefined;
  return typeof r === 'number' && Number.isSafeInteger(r) && r >= 0 ? r : 0;
}

