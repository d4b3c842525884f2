/**
 * deflate-raw (RFC 1951): compression through the platform's CompressionStream (all current browsers; Node 20
 * has it globally); decompression through our own decoder (`inflate.ts`), the same on every platform, capped so
 * a crafted link that expands enormously ("zip bomb") is stopped early.
 */
import { inflateRawSync } from './inflate';

export function compressionAvailable(): boolean {
  return typeof CompressionStream === 'function';
}

async function readAll(readable: ReadableStream<Uint8Array>, maxBytes: number): Promise<Uint8Array | 'too-large'> {
  const reader = readable.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > maxBytes) {
      reader.cancel().catch(() => undefined);
      return 'too-large';
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}

/** Writes `bytes` into a transform stream without leaving a rejected promise unobserved. */
function feed(writable: WritableStream<BufferSource>, bytes: Uint8Array): void {
  const writer = writable.getWriter();
  writer.write(bytes as Uint8Array<ArrayBuffer>).catch(() => undefined);
  writer.close().catch(() => undefined);
}

export async function deflateRaw(bytes: Uint8Array): Promise<Uint8Array> {
  const cs = new CompressionStream('deflate-raw');
  feed(cs.writable, bytes);
  const out = await readAll(cs.readable, Number.POSITIVE_INFINITY);
  return out as Uint8Array;
}

export type Inflated = { ok: true; bytes: Uint8Array } | { ok: false; reason: 'corrupt' | 'too-large' };

/**
 * Never throws: a corrupt, truncated or over-long stream (bytes after its final block) is `corrupt`, output
 * beyond `maxBytes` is `too-large`. Decoded by our own `inflateRawSync`, not the platform's DecompressionStream,
 * so Node and every browser accept and refuse exactly the same links (their streams differ on trailing bytes).
 */
export async function inflateRaw(bytes: Uint8Array, maxBytes: number): Promise<Inflated> {
  try {
    const r = inflateRawSync(bytes, maxBytes);
    return r.ok ? r : { ok: false, reason: r.reason === 'too-large' ? 'too-large' : 'corrupt' };
  } catch {
    return { ok: false, reason: 'corrupt' };
  }
}
