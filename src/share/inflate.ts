/**
 * deflate-raw decoding (RFC 1951, "DEFLATE Compressed Data Format Specification version 1.3", P. Deutsch, 1996)
 * written out here so that every platform — Node and every browser — accepts and refuses exactly the same bytes.
 * The platforms' DecompressionStream differ at the edges: Node's accepts bytes after the end of the deflate
 * stream, browsers refuse them. Here the rule is ours: the stream must end with its final block, and nothing but
 * the padding bits of that last byte may follow.
 *
 * Synchronous, bounded: output beyond `maxBytes` stops at once; every loop advances the input or the output.
 */

export type InflateResult = { ok: true; bytes: Uint8Array } | { ok: false; reason: 'corrupt' | 'too-large' | 'trailing' };

class Corrupt extends Error {}
class TooLarge extends Error {}

// RFC 1951 §3.2.5: base lengths and extra bits for length codes 257–285, distance codes 0–29.
const LEN_BASE = [3, 4, 5, 6, 7, 8, 9, 10, 11, 13, 15, 17, 19, 23, 27, 31, 35, 43, 51, 59, 67, 83, 99, 115, 131, 163, 195, 227, 258];
const LEN_EXTRA = [0, 0, 0, 0, 0, 0, 0, 0, 1, 1, 1, 1, 2, 2, 2, 2, 3, 3, 3, 3, 4, 4, 4, 4, 5, 5, 5, 5, 0];
const DIST_BASE = [1, 2, 3, 4, 5, 7, 9, 13, 17, 25, 33, 49, 65, 97, 129, 193, 257, 385, 513, 769, 1025, 1537, 2049, 3073, 4097, 6145, 8193, 12289, 16385, 24577];
const DIST_EXTRA = [0, 0, 0, 0, 1, 1, 2, 2, 3, 3, 4, 4, 5, 5, 6, 6, 7, 7, 8, 8, 9, 9, 10, 10, 11, 11, 12, 12, 13, 13];
// RFC 1951 §3.2.7: the order in which code-length code lengths are sent.
const CL_ORDER = [16, 17, 18, 0, 8, 7, 9, 6, 10, 5, 11, 4, 12, 3, 13, 2, 14, 1, 15];

/** A canonical Huffman code (RFC 1951 §3.2.2) as counts per length and symbols in code order. */
interface Huffman {
  counts: Uint16Array;
  symbols: Uint16Array;
}

/**
 * `incomplete`: which incomplete codes may stand: 'any' for the fixed codes (RFC 1951 §3.2.6 defines 30 distance
 * codes of 5 bits, two slots unused), 'single' for a block's own literal/length and distance codes, 'none' for
 * its code-length code. An over-subscribed code cannot be decoded unambiguously
 * and is always refused. An incomplete one is refused too, except a literal/length or distance code of a single
 * one-bit code (or none at all), which RFC 1951 §3.2.7 allows for a distance code of one symbol; this is exactly
 * what zlib accepts (its inftrees.c), so one link gets one answer in Node and in every browser.
 */
function huffman(lengths: ArrayLike<number>, n: number, incomplete: 'any' | 'single' | 'none'): Huffman {
  const counts = new Uint16Array(16);
  for (let i = 0; i < n; i++) counts[lengths[i]]++;
  counts[0] = 0;
  let left = 1;
  let max = 0;
  for (let len = 1; len < 16; len++) {
    left = left * 2 - counts[len];
    if (left < 0) throw new Corrupt();
    if (counts[len] > 0) max = len;
  }
  if (left > 0 && max > 0 && incomplete !== 'any' && !(incomplete === 'single' && max === 1)) throw new Corrupt();
  const offs = new Uint16Array(16);
  for (let len = 1; len < 15; len++) offs[len + 1] = offs[len] + counts[len];
  const symbols = new Uint16Array(n);
  for (let i = 0; i < n; i++) if (lengths[i] !== 0) symbols[offs[lengths[i]]++] = i;
  return { counts, symbols };
}

const FIXED_LIT = (() => {
  const l = new Uint8Array(288);
  l.fill(8, 0, 144);
  l.fill(9, 144, 256);
  l.fill(7, 256, 280);
  l.fill(8, 280, 288);
  return huffman(l, 288, 'any');
})();
const FIXED_DIST = huffman(new Uint8Array(30).fill(5), 30, 'any');

class Reader {
  pos = 0;
  private bitBuf = 0;
  private bitCnt = 0;
  constructor(private readonly src: Uint8Array) {}

  bits(need: number): number {
    let val = this.bitBuf;
    while (this.bitCnt < need) {
      if (this.pos >= this.src.length) throw new Corrupt();
      val |= this.src[this.pos++] << this.bitCnt;
      this.bitCnt += 8;
    }
    this.bitBuf = val >>> need;
    this.bitCnt -= need;
    return val & ((1 << need) - 1);
  }

  /** Drops the bits left in the current byte (stored blocks start on a byte boundary). */
  align(): void {
    this.bitBuf = 0;
    this.bitCnt = 0;
  }

  byte(): number {
    if (this.pos >= this.src.length) throw new Corrupt();
    return this.src[this.pos++];
  }

  decode(h: Huffman): number {
    let code = 0;
    let first = 0;
    let index = 0;
    for (let len = 1; len < 16; len++) {
      code |= this.bits(1);
      const count = h.counts[len];
      if (code - count < first) return h.symbols[index + (code - first)];
      index += count;
      first = (first + count) << 1;
      code <<= 1;
    }
    throw new Corrupt();
  }
}

class Output {
  buf: Uint8Array;
  len = 0;
  constructor(private readonly max: number) {
    this.buf = new Uint8Array(Math.min(max, 4096));
  }
  private room(n: number): void {
    if (this.len + n > this.max) throw new TooLarge();
    if (this.len + n <= this.buf.length) return;
    const next = new Uint8Array(Math.min(this.max, Math.max(this.buf.length * 2, this.len + n)));
    next.set(this.buf.subarray(0, this.len));
    this.buf = next;
  }
  push(b: number): void {
    this.room(1);
    this.buf[this.len++] = b;
  }
  copy(dist: number, n: number): void {
    if (dist > this.len) throw new Corrupt();
    this.room(n);
    for (let i = 0; i < n; i++, this.len++) this.buf[this.len] = this.buf[this.len - dist];
  }
}

function codes(r: Reader, out: Output, lit: Huffman, dist: Huffman): void {
  for (;;) {
    const sym = r.decode(lit);
    if (sym < 256) out.push(sym);
    else if (sym === 256) return;
    else {
      const li = sym - 257;
      if (li >= 29) throw new Corrupt();
      const len = LEN_BASE[li] + r.bits(LEN_EXTRA[li]);
      const di = r.decode(dist);
      if (di >= 30) throw new Corrupt();
      out.copy(DIST_BASE[di] + r.bits(DIST_EXTRA[di]), len);
    }
  }
}

function dynamicTables(r: Reader): [Huffman, Huffman] {
  const nlen = r.bits(5) + 257;
  const ndist = r.bits(5) + 1;
  const ncode = r.bits(4) + 4;
  if (nlen > 286 || ndist > 30) throw new Corrupt();
  const cl = new Uint8Array(19);
  for (let i = 0; i < ncode; i++) cl[CL_ORDER[i]] = r.bits(3);
  const clCode = huffman(cl, 19, 'none');
  const lengths = new Uint8Array(nlen + ndist);
  for (let i = 0; i < nlen + ndist; ) {
    const sym = r.decode(clCode);
    if (sym < 16) {
      lengths[i++] = sym;
      continue;
    }
    let repeat: number;
    let value = 0;
    if (sym === 16) {
      if (i === 0) throw new Corrupt();
      value = lengths[i - 1];
      repeat = 3 + r.bits(2);
    } else if (sym === 17) repeat = 3 + r.bits(3);
    else repeat = 11 + r.bits(7);
    if (i + repeat > nlen + ndist) throw new Corrupt();
    lengths.fill(value, i, i + repeat);
    i += repeat;
  }
  // A block must be able to end: the end-of-block code needs a length.
  if (lengths[256] === 0) throw new Corrupt();
  return [huffman(lengths, nlen, 'single'), huffman(lengths.subarray(nlen), ndist, 'single')];
}

/** Inflates a whole deflate-raw stream; refuses a cut stream, a bad code, and anything after the final block. */
export function inflateRawSync(src: Uint8Array, maxBytes: number): InflateResult {
  const r = new Reader(src);
  const out = new Output(maxBytes);
  try {
    let last = 0;
    while (!last) {
      last = r.bits(1);
      const type = r.bits(2);
      if (type === 0) {
        r.align();
        const len = r.byte() | (r.byte() << 8);
        const nlen = r.byte() | (r.byte() << 8);
        if ((len ^ 0xffff) !== nlen) throw new Corrupt();
        for (let i = 0; i < len; i++) out.push(r.byte());
      } else if (type === 1) codes(r, out, FIXED_LIT, FIXED_DIST);
      else if (type === 2) {
        const [lit, dist] = dynamicTables(r);
        codes(r, out, lit, dist);
      } else throw new Corrupt();
    }
    if (r.pos !== src.length) return { ok: false, reason: 'trailing' };
    return { ok: true, bytes: out.buf.slice(0, out.len) };
  } catch (e) {
    if (e instanceof TooLarge) return { ok: false, reason: 'too-large' };
    if (e instanceof Corrupt) return { ok: false, reason: 'corrupt' };
    throw e;
  }
}
