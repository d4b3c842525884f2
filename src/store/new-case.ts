/** New cases and ids for the app (the pure part is `createCase` in src/case). */
import { createCase, type Case, type MemberKind, type UnitSystem } from '../case';

/** This build's version, from package.json through Vite's `define`. */
export const APP_VERSION: string = typeof __APP_VERSION__ === 'string' ? __APP_VERSION__ : '0.0.0';

/**
 * A random (version 4) UUID. `crypto.randomUUID` exists only in secure contexts (https, localhost),
 * so a page served over plain http on a site network falls back to `getRandomValues` (RFC 9562 §5.4 layout).
 */
export function newCaseId(): string {
  const c = globalThis.crypto;
  if (typeof c?.randomUUID === 'function') return c.randomUUID();
  const b = new Uint8Array(16);
  c.getRandomValues(b);
  b[6] = (b[6] & 0x0f) | 0x40;
  b[8] = (b[8] & 0x3f) | 0x80;
  const h = Array.from(b, (x) => x.toString(16).padStart(2, '0')).join('');
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
}

/** An empty case of the given kind, with a fresh id, the current time and this app's version. */
export function newCase(init: { kind: MemberKind; unitSystem: UnitSystem; name?: string; tag?: string; note?: string }): Case {
  return createCase({ ...init, id: newCaseId(), nowIso: new Date().toISOString(), appVersion: APP_VERSION });
}
