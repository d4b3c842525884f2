/**
 * Thrown when a typed value needs the full unit reader (mathjs) before it has loaded in the browser. It is not
 * an input error: the caller loads the reader (`loadUnitReader`) and reads again.
 */
export class UnitReaderPending extends Error {
  readonly unitReaderPending = true;
  constructor(text: string) {
    super(`the unit reader is still loading (needed for "${text}")`);
    this.name = 'UnitReaderPending';
  }
}

export function isUnitReaderPending(e: unknown): e is UnitReaderPending {
  return typeof e === 'object' && e !== null && (e as { unitReaderPending?: unknown }).unitReaderPending === true;
}
