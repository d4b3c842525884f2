/**
 * Seeded fuzz of parseCase: 12,000 mutated inputs. Nothing throws, every refusal has a short message, every
 * acceptance is a whole case, markup text comes back as the same plain string, and no prototype is polluted.
 */
import { describe, expect, it } from 'vitest';
import { parseCase } from '../../src/case';
import { baffleCase, copy, demoCase, v0Case } from './fixtures';
import { checkResult, FIELDS, hostile, int, MARKUP, pick, seeded, setPath, type Rng } from './fuzz-gen';

const N = 12_000;

function mutate(rnd: Rng): { raw: unknown; markup: boolean } {
  const base = copy(pick(rnd, [demoCase(), baffleCase(), v0Case()])) as unknown as Record<string, unknown>;
  let markup = false;
  const steps = 1 + int(rnd, 3);
  for (let s = 0; s < steps; s++) {
    switch (int(rnd, 6)) {
      case 0:
      case 1:
        setPath(base, pick(rnd, FIELDS), hostile(rnd));
        break;
      case 2:
        setPath(base, pick(rnd, FIELDS), undefined);
        break;
      case 3: {
        // Markup where text is allowed: must come back unchanged.
        markup = true;
        setPath(base, base.schemaVersion === 0 ? 'title' : 'name', pick(rnd, MARKUP));
        break;
      }
      case 4:
        setPath(base, pick(rnd, ['extra', '__proto__', 'constructor', 'toString', 'x'.repeat(50)]), hostile(rnd));
        break;
      default: {
        // A character-level change to the JSON text, as a damaged file would have.
        const text = JSON.stringify(base);
        const at = int(rnd, text.length);
        const changed = text.slice(0, at) + pick(rnd, ['', '"', '{', '}', ',', '1', 'e999', '\\u0000', ' ']) + text.slice(at + int(rnd, 3));
        try {
          return { raw: JSON.parse(changed), markup: false };
        } catch {
          return { raw: changed, markup: false }; // not JSON any more: the parser must refuse the string itself
        }
      }
    }
  }
  return { raw: base, markup };
}

describe('parseCase fuzz', () => {
  it(`survives ${N} seeded mutations: no throw, no partial case, markup kept as text`, () => {
    const rnd = seeded(20_261_201);
    const problems: string[] = [];
    let accepted = 0;
    let markupKept = 0;
    for (let i = 0; i < N; i++) {
      const { raw, markup } = mutate(rnd);
      let r: ReturnType<typeof parseCase>;
      try {
        r = parseCase(raw);
      } catch (e) {
        problems.push(`#${i} threw ${String(e)}`);
        continue;
      }
      const bad = checkResult(r);
      if (bad) problems.push(`#${i}: ${bad}`);
      if (r.ok) {
        accepted++;
        // Text comes back exactly as given (version 0 keeps its name in "title"): never escaped, trimmed or cleaned.
        const input = raw as Record<string, unknown>;
        const given = input.schemaVersion === 0 ? input.title : input.name;
        if (r.value.name !== given) problems.push(`#${i}: name changed from ${String(given)} to ${r.value.name}`);
        else if (markup && MARKUP.includes(r.value.name)) markupKept++;
      }
      if (problems.length > 10) break;
    }
    expect(problems).toEqual([]);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
    // The mutations must exercise both sides, or the test proves little.
    expect(accepted).toBeGreaterThan(N * 0.1);
    expect(accepted).toBeLessThan(N * 0.9);
    expect(markupKept).toBeGreaterThan(100);
  });
});
