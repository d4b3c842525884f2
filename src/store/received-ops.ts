/**
 * Received cases (from a link or a file). The rule: never overwrite. Same id and same entered content ->
 * nothing to do; same id but changed -> a copy with a new id and a name that says where it came from.
 */
import { CASE_LIMITS, cutText, isRenamedCopy, parseCase, sameCaseContent, type Case } from '../case';
import type { ReceivedOutcome, SameCaseAnswer } from './api';
import { checkIncoming, inTx, type StoreContext, type Tx } from './context';
import { CASES, LIST } from './db-schema';
import { summaryOf } from './list-record';
import type { StoreResult } from './errors';
import { stamp, stampFrom, toRecord } from './revision';

async function compareWithSaved(tx: Tx, c: Case): Promise<SameCaseAnswer> {
  const raw: unknown = await tx.objectStore(CASES).get(c.id);
  if (raw === undefined) return { status: 'new' };
  const parsed = parseCase(raw);
  if (!parsed.ok) return { status: 'changed', saved: null };
  const saved = { ok: true as const, value: stampFrom(parsed.value, raw) };
  if (sameCaseContent(saved.value, c)) return { status: 'same', saved: saved.value };
  // The same changed link received before was saved as a renamed copy with a new id: that copy is "the same".
  for (const other of await tx.objectStore(CASES).getAll()) {
    const o = parseCase(other);
    if (o.ok && o.value.id !== c.id && isRenamedCopy(o.value, c)) return { status: 'same', saved: stampFrom(o.value, other) };
  }
  return { status: 'changed', saved: saved.value };
}

export function findSameCase(ctx: StoreContext, c: Case): Promise<StoreResult<SameCaseAnswer>> {
  const action = 'check the received case against your cases';
  return inTx(ctx, action, [CASES], 'readonly', (tx) => compareWithSaved(tx, checkIncoming(c, action)));
}

/** The local calendar date, YYYY-MM-DD, as the surveyor would read it. */
export function localDate(d: Date): string {
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
}

/**
 * "<name> (received 2026-12-01)", with ", 2", ", 3" … when that name is taken, the name shortened if needed
 * so the whole stays within the name limit. An empty name becomes "Case".
 */
export function receivedName(name: string, date: string, taken: ReadonlySet<string>): string {
  const base = name === '' ? 'Case' : name;
  for (let n = 1; ; n++) {
    const suffix = n === 1 ? ` (received ${date})` : ` (received ${date}, ${n})`;
    const candidate = cutText(base, CASE_LIMITS.nameChars - suffix.length) + suffix;
    if (!taken.has(candidate)) return candidate;
  }
}

export function saveReceived(ctx: StoreContext, c: Case): Promise<StoreResult<ReceivedOutcome>> {
  const action = 'save the received case';
  return inTx(ctx, action, [CASES, LIST], 'readwrite', async (tx): Promise<ReceivedOutcome> => {
    const incoming = checkIncoming(c, action);
    const found = await compareWithSaved(tx, incoming);
    if (found.status === 'same') return { status: 'same', case: found.saved };
    const cases = tx.objectStore(CASES);
    const now = ctx.now();
    const nowIso = now.toISOString();
    if (found.status === 'new') {
      const value: Case = { ...incoming, updatedAt: nowIso, appVersion: ctx.appVersion };
      await cases.add(toRecord(value, 1));
      await tx.objectStore(LIST).put(summaryOf(value, 1));
      return { status: 'saved', case: stamp(value, 1) };
    }
    const names = new Set<string>();
    for (const raw of await cases.getAll()) {
      const name = (raw as { name?: unknown } | null)?.name;
      if (typeof name === 'string') names.add(name);
    }
    const copy = checkIncoming(
      { ...incoming, id: ctx.newId(), name: receivedName(incoming.name, localDate(now), names), createdAt: nowIso, updatedAt: nowIso, appVersion: ctx.appVersion },
      action,
    );
    // `add`, not `put`: if the new id were somehow taken, the transaction aborts instead of overwriting.
    await cases.add(toRecord(copy, 1));
    await tx.objectStore(LIST).put(summaryOf(copy, 1));
    return { status: 'saved-copy', case: stamp(copy, 1) };
  });
}
