/**
 * Seeded fuzz of the link decoder: 12,000 mutated payloads. Nothing throws or rejects; a cut, altered or foreign
 * payload is always refused with one of the link messages; a payload that passes its checksum (deliberately
 * re-framed after tampering) is either refused or yields a whole, valid case; markup in names survives as text.
 */
import { describe, expect, it } from 'vitest';
import { NEWER_VERSION_MESSAGE, type Case } from '../../src/case';
import { decodeCasePayload, encodeCasePayload, LINK_MESSAGES } from '../../src/share';
import { fromBase64url, toBase64url } from '../../src/share/base64url';
import { deflateRaw } from '../../src/share/compression';
import { framed } from './frame';
import { caseToWire } from '../../src/share/wire';
import { baffleCase, demoCase } from '../case/fixtures';
import { checkWhole, hostile, int, MARKUP, pick, seeded, type Rng } from '../case/fuzz-gen';

const N = 12_000;
const ALPHABET = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789-_';
const CHARS = [...ALPHABET];
const KNOWN = new Set<string>([...Object.values(LINK_MESSAGES), NEWER_VERSION_MESSAGE]);
const utf8 = new TextEncoder();

/** Frames arbitrary JSON text as a well-formed link (valid checksum), compressed or not. */
async function framedJson(rnd: Rng, json: string): Promise<string> {
  const bytes = utf8.encode(json);
  return rnd() < 0.5 || bytes.length > 100_000 ? framed('j', bytes) : framed('z', await deflateRaw(bytes));
}

type Mutation = { payload: string; mustFail: boolean; markup?: string };

async function mutate(rnd: Rng, bases: string[], cases: Case[]): Promise<Mutation> {
  const p = pick(rnd, bases);
  switch (int(rnd, 9)) {
    case 0: // cut off when copied
      return { payload: p.slice(0, int(rnd, p.length)), mustFail: true };
    case 1: { // one character changed
      const at = int(rnd, p.length);
      let c = pick(rnd, CHARS);
      if (c === p[at]) c = c === 'A' ? 'B' : 'A';
      return { payload: p.slice(0, at) + c + p.slice(at + 1), mustFail: true };
    }
    case 2: { // a character added or lost in the middle
      const at = 1 + int(rnd, p.length - 1);
      return { payload: rnd() < 0.5 ? p.slice(0, at) + pick(rnd, CHARS) + p.slice(at) : p.slice(0, at) + p.slice(at + 1), mustFail: true };
    }
    case 3: { // bit flips in the decoded bytes, checksum left as it was
      const d = fromBase64url(p.slice(1));
      if (!d.ok) throw new Error('base payload must decode');
      const b = d.bytes.slice();
      for (let k = 1 + int(rnd, 4); k > 0; k--) b[int(rnd, b.length)] ^= 1 << int(rnd, 8);
      const changed = p[0] + toBase64url(b);
      return { payload: changed, mustFail: changed !== p };
    }
    case 4: { // garbage of link characters, or of anything
      const len = int(rnd, 800);
      const text = rnd() < 0.7
        ? Array.from({ length: len }, () => pick(rnd, CHARS)).join('')
        : String.fromCharCode(...Array.from({ length: len }, () => int(rnd, 0x3000)));
      return { payload: text, mustFail: true };
    }
    case 5: { // tampered body, re-framed so the checksum matches: reaches the decompressor and the parser
      const d = fromBase64url(p.slice(1));
      if (!d.ok) throw new Error('base payload must decode');
      const body = d.bytes.slice(7);
      for (let k = 1 + int(rnd, 3); k > 0; k--) body[int(rnd, body.length)] ^= 1 << int(rnd, 8);
      return { payload: framed(p[0], rnd() < 0.3 ? body.subarray(0, int(rnd, body.length)) : body), mustFail: false };
    }
    case 6: { // well-framed wire form with hostile values in random places
      const wire: unknown[] = caseToWire(pick(rnd, cases));
      let markup: string | undefined;
      for (let k = 1 + int(rnd, 2); k > 0; k--) {
        const at = int(rnd, wire.length + 1);
        if (rnd() < 0.3) {
          markup = pick(rnd, MARKUP);
          wire[2] = markup;
        } else {
          const v = hostile(rnd);
          wire[at] = typeof v === 'object' && v !== null && JSON.stringify(v).length > 40_000 ? 'x' : v;
          if (at === 2) markup = undefined;
        }
      }
      return { payload: await framedJson(rnd, JSON.stringify(wire)), mustFail: false, markup };
    }
    case 7: { // deep nesting and huge numbers as raw JSON text
      const depth = 1 + int(rnd, 20_000);
      const json = pick(rnd, [
        '['.repeat(depth) + ']'.repeat(depth),
        `[1,"${demoCase().id}",${'['.repeat(depth)}${']'.repeat(depth)}]`,
        `[1e999,"a",-1e999,${'9'.repeat(400)}]`,
        '{"__proto__":{"polluted":1},"constructor":{"prototype":{"polluted":1}}}',
      ]);
      return { payload: await framedJson(rnd, json), mustFail: true };
    }
    default: { // white space and case changes as a messenger might make
      const at = int(rnd, p.length);
      const changed = rnd() < 0.5 ? p.slice(0, at) + ' \n' + p.slice(at) : p.slice(0, at) + p.slice(at).toUpperCase();
      return { payload: changed, mustFail: changed.replace(/\s/g, '') !== p };
    }
  }
}

describe('link decoder fuzz', () => {
  it(`survives ${N} seeded mutations: no throw, nothing partial, every failure in words`, async () => {
    const rnd = seeded(4_2026);
    const cases: Case[] = [demoCase(), baffleCase(), { ...demoCase(), name: MARKUP[0], note: MARKUP[1] }];
    const bases: string[] = [];
    for (const c of cases) bases.push(await encodeCasePayload(c), await encodeCasePayload(c, { compress: false }));
    const problems: string[] = [];
    const tally = { ok: 0, refused: 0, markupKept: 0 };
    for (let i = 0; i < N && problems.length < 10; i++) {
      const m = await mutate(rnd, bases, cases);
      let r: Awaited<ReturnType<typeof decodeCasePayload>>;
      try {
        r = await decodeCasePayload(m.payload);
      } catch (e) {
        problems.push(`#${i} threw ${String(e)}`);
        continue;
      }
      if (r.ok) {
        tally.ok++;
        if (m.mustFail) problems.push(`#${i}: a damaged payload was accepted`);
        const whole = checkWhole(r.value);
        if (whole) problems.push(`#${i}: ${whole}`);
        if (m.markup !== undefined) {
          if (r.value.name !== m.markup) problems.push(`#${i}: name changed from ${m.markup} to ${r.value.name}`);
          else tally.markupKept++;
        }
      } else {
        tally.refused++;
        const known = KNOWN.has(r.message) || r.message.startsWith('this link holds a case this Wetmode cannot read: ');
        if (!known || r.message.length > 500) problems.push(`#${i}: unexpected message ${r.message.slice(0, 200)}`);
      }
    }
    expect(problems).toEqual([]);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    expect(tally.ok + tally.refused).toBe(N);
    // Some tampered-but-framed payloads must get through to a whole case, or the acceptance path is not exercised.
    expect(tally.ok).toBeGreaterThan(200);
    expect(tally.markupKept).toBeGreaterThan(50);
  }, 30_000);
});
