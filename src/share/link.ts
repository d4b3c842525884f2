/**
 * Case links: `${base}#/open/<payload>`. The fragment never leaves the browser, so no server sees the case.
 *
 * Payload = one format character + base64url (no padding) of a framed body:
 *   byte 0–2   body length N, unsigned 24-bit big-endian (tells a cut link from a damaged one)
 *   byte 3–6   CRC-32 of the body, big-endian (catches an altered character, a swapped pair)
 *   byte 7…    body, N bytes
 * Format characters:
 *   'z'  body = deflate-raw (RFC 1951) of the UTF-8 JSON wire form (`wire.ts`) — made when CompressionStream exists
 *   'j'  body = the UTF-8 JSON wire form itself — the fallback, and used whenever it comes out shorter
 * Any other first character is a format this build does not know (a newer Wetmode may add one).
 */
import { NEWER_VERSION_MESSAGE, parseCase, type Case } from '../case';
import { fromBase64url, toBase64url } from './base64url';
import { compressionAvailable, deflateRaw, inflateRaw } from './compression';
import { crc32 } from './crc32';
import { caseToWire, wireToCase } from './wire';

const HEADER_BYTES = 7;
/**
 * Longest payload accepted. The largest valid case (every CASE_LIMITS at its maximum, in three-byte characters
 * that deflate cannot shrink) is about 99 kB of JSON, 132,000 characters plain; a real case is a few hundred.
 */
export const MAX_PAYLOAD_CHARS = 140_000;
/** Largest JSON a link may expand to; a real case is a few kB at most (see CASE_LIMITS). */
export const MAX_LINK_JSON_BYTES = 256 * 1024;

/** The messages a broken link gets, in plain words (shown as they are). */
export const LINK_MESSAGES = {
  empty: 'this link has no case in it — it may have been cut off when copied',
  incomplete: 'this link is incomplete — it may have been cut off when copied',
  tooLong: 'this link is far longer than any Wetmode case link — it was not made by Wetmode',
  badChars: 'this link contains characters that do not belong in it — it may have been changed when copied',
  unknownFormat:
    'this link is in a form this Wetmode does not know — if it was made by a newer Wetmode, update the app to open it; otherwise ask the sender to copy it again',
  extra: 'this link has extra characters at the end — it may have been changed when copied',
  damaged: 'this link is damaged — it may have been changed when copied; ask the sender to copy it again',
  notALink: 'this is not a Wetmode case link (a case link contains "#/open/")',
  newer: NEWER_VERSION_MESSAGE,
} as const;

export type DecodeResult = { ok: true; value: Case } | { ok: false; message: string };

const utf8 = new TextEncoder();

function frame(prefix: 'z' | 'j', body: Uint8Array): string {
  const framed = new Uint8Array(HEADER_BYTES + body.length);
  const view = new DataView(framed.buffer);
  view.setUint16(0, body.length >>> 8);
  view.setUint8(2, body.length & 0xff);
  view.setUint32(3, crc32(body));
  framed.set(body, HEADER_BYTES);
  return prefix + toBase64url(framed);
}

/**
 * The payload for a case (what follows `#/open/`). Compressed where the platform can, plain otherwise,
 * whichever is shorter. `compress: false` forces the plain form (used by tests of the fallback).
 * Rejects with a RangeError only if `c` does not pass parseCase (a programming error, not a user one).
 */
export async function encodeCasePayload(c: Case, options: { compress?: boolean } = {}): Promise<string> {
  const checked = parseCase(c);
  if (!checked.ok) throw new RangeError(`encodeCasePayload: the case is not valid: ${checked.message}`);
  const json = utf8.encode(JSON.stringify(caseToWire(checked.value)));
  let best = frame('j', json);
  if (options.compress !== false && compressionAvailable()) {
    const deflated = await deflateRaw(json);
    if (deflated.length < json.length) best = frame('z', deflated);
  }
  // Cannot happen within CASE_LIMITS (see MAX_PAYLOAD_CHARS); kept as a guard.
  if (best.length > MAX_PAYLOAD_CHARS) throw new RangeError('encodeCasePayload: this case is too large for a link; export it as a file instead');
  return best;
}

/**
 * A full link: `baseUrl` without any fragment, then `#/open/<payload>`.
 * Pass the app's address, e.g. `location.origin + location.pathname`.
 */
export async function encodeCaseLink(c: Case, baseUrl: string): Promise<string> {
  const base = baseUrl.split('#')[0];
  return `${base}#/open/${await encodeCasePayload(c)}`;
}

const fail = (message: string): DecodeResult => ({ ok: false, message });

/**
 * Undoes percent-encoding (RFC 3986 §2.1) where it is well formed; a stray "%" is left as it is (and then
 * refused as a character that does not belong). The payload alphabet has no "%", so this never changes a good link.
 */
export function percentDecode(text: string): string {
  if (!text.includes('%')) return text;
  try {
    return decodeURIComponent(text);
  } catch {
    return text.replace(/%[0-9A-Fa-f]{2}/g, (m) => {
      const c = parseInt(m.slice(1), 16);
      return c < 0x80 ? String.fromCharCode(c) : m;
    });
  }
}

/**
 * Reads a payload back into a case. Never throws and never returns part of a case: any cut, altered
 * or foreign payload gets one of LINK_MESSAGES (or parseCase's reason, for a well-formed link holding a bad case).
 */
export async function decodeCasePayload(payload: unknown): Promise<DecodeResult> {
  try {
    if (typeof payload !== 'string') return fail(LINK_MESSAGES.damaged);
    if (payload.length > 2 * MAX_PAYLOAD_CHARS) return fail(LINK_MESSAGES.tooLong);
    // The browser hands the fragment over percent-encoded (a space as %20, a pasted line break as %0A), and mail
    // and chat apps wrap long links: decode, then drop white space, which is never part of a payload.
    const text = percentDecode(payload).replace(/\s+/g, '');
    if (text.length === 0) return fail(LINK_MESSAGES.empty);
    if (text.length > MAX_PAYLOAD_CHARS) return fail(LINK_MESSAGES.tooLong);
    const prefix = text[0];
    if (prefix !== 'z' && prefix !== 'j') return fail(LINK_MESSAGES.unknownFormat);
    const decoded = fromBase64url(text.slice(1));
    if (!decoded.ok) return fail(decoded.reason === 'bad-char' ? LINK_MESSAGES.badChars : LINK_MESSAGES.incomplete);
    const bytes = decoded.bytes;
    if (bytes.length < HEADER_BYTES) return fail(LINK_MESSAGES.incomplete);
    const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
    const declared = (view.getUint16(0) << 8) | view.getUint8(2);
    const body = bytes.subarray(HEADER_BYTES);
    if (body.length < declared) return fail(LINK_MESSAGES.incomplete);
    if (body.length > declared) return fail(LINK_MESSAGES.extra);
    // A cut link is reported as incomplete above; at full length, stray low bits mean an altered last character.
    if (!decoded.canonical) return fail(LINK_MESSAGES.damaged);
    if (crc32(body) !== view.getUint32(3)) return fail(LINK_MESSAGES.damaged);
    let json: Uint8Array = body;
    if (prefix === 'z') {
      const inflated = await inflateRaw(body, MAX_LINK_JSON_BYTES);
      if (!inflated.ok) {
        return fail(inflated.reason === 'too-large' ? LINK_MESSAGES.tooLong : LINK_MESSAGES.damaged);
      }
      json = inflated.bytes;
    }
    let wire: unknown;
    try {
      wire = JSON.parse(new TextDecoder('utf-8', { fatal: true }).decode(json));
    } catch {
      return fail(LINK_MESSAGES.damaged);
    }
    const parsed = wireToCase(wire);
    if (parsed.ok) return { ok: true, value: parsed.value };
    if (parsed.message === NEWER_VERSION_MESSAGE) return fail(NEWER_VERSION_MESSAGE);
    return fail(`this link holds a case this Wetmode cannot read: ${parsed.message}`);
  } catch {
    // Nothing above should throw; if the platform does, the link still gets words, not a crash.
    return fail(LINK_MESSAGES.damaged);
  }
}

/** Decodes a whole link (or a pasted one): everything after "#/open/". */
export function decodeCaseLink(link: unknown): Promise<DecodeResult> {
  if (typeof link !== 'string') return Promise.resolve(fail(LINK_MESSAGES.notALink));
  const at = link.indexOf('#/open/');
  if (at < 0) return Promise.resolve(fail(LINK_MESSAGES.notALink));
  return decodeCasePayload(link.slice(at + '#/open/'.length));
}
