/**
 * Case links: length of the link for the demo-like case (a pile with 12 inputs, 3 screening inputs, name, tag and
 * a short note) and the time to encode and decode it. Target: short enough for a text message (< 600 characters).
 */
import { performance } from 'node:perf_hooks';
import { CASE_LIMITS, type Case } from '../../src/case';
import { caseToFileText, decodeCasePayload, encodeCaseLink, encodeCasePayload } from '../../src/share';
import { caseToWire } from '../../src/share/wire';
import { demoCase } from '../case/fixtures';
import { report, seeded, type Timing } from './timing';

async function timeAsync(fn: () => Promise<unknown>, runs = 200, warmup = 20): Promise<Timing> {
  for (let i = 0; i < warmup; i++) await fn();
  const t = new Float64Array(runs);
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    await fn();
    t[i] = performance.now() - t0;
  }
  t.sort();
  return { medianMs: t[Math.floor(runs / 2)], minMs: t[0], runs };
}

/** A case at the size limits, with seeded random text (incompressible): the longest link a valid case can make. */
function largestCase(): Case {
  const rnd = seeded(11);
  const text = (n: number) => Array.from({ length: n }, () => String.fromCharCode(0x21 + Math.floor(rnd() * 90))).join('').replace(/["\\]/g, 'x');
  const values = (p: string) => Object.fromEntries(Array.from({ length: CASE_LIMITS.fields }, (_, i) => [`${p}${i}`.padEnd(CASE_LIMITS.fieldNameChars, 'q'), text(CASE_LIMITS.fieldValueChars)]));
  return { ...demoCase(), name: text(CASE_LIMITS.nameChars), tag: text(CASE_LIMITS.tagChars), note: text(CASE_LIMITS.noteChars), inputs: values('i'), excitation: values('e') };
}

export async function run(): Promise<void> {
  const c = demoCase();
  const base = 'https://wetmode.example/';
  const link = await encodeCaseLink(c, base);
  const z = await encodeCasePayload(c);
  const j = await encodeCasePayload(c, { compress: false });
  const wireJson = JSON.stringify(caseToWire(c));
  console.log(`demo case: file ${caseToFileText(c).length} chars, compact JSON ${JSON.stringify(c).length} chars, wire JSON ${wireJson.length} chars`);
  console.log(`payload: deflate-raw ${z.length} chars, plain fallback ${j.length} chars`);
  console.log(`link with "${base}": ${link.length} characters  target < 600: ${link.length < 600 ? 'met' : 'NOT met'}`);
  const big = await encodeCasePayload(largestCase());
  console.log(`largest valid case (every limit, random text): payload ${big.length} chars (format '${big[0]}')`);
  report('encodeCasePayload, demo case', await timeAsync(() => encodeCasePayload(c)), 5);
  report('decodeCasePayload, demo case (compressed)', await timeAsync(() => decodeCasePayload(z)), 5);
  report('decodeCasePayload, demo case (plain fallback)', await timeAsync(() => decodeCasePayload(j)), 5);
  report('decodeCasePayload, cut-off link (refused)', await timeAsync(() => decodeCasePayload(z.slice(0, 300))), 1);
}
