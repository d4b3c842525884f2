/**
 * Citations a person who clones the repository can follow. Comments and tests cite the published source
 * itself or a section of docs/sources.md (`§S4`, `§S4.1`); never a document outside the repository or a
 * tracker number. Product text (strings shown or printed) cites the source without the "from memory"
 * confidence note, which lives in docs/sources.md and beside the tests.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = join(__dirname, '..', '..');
const SELF = relative(ROOT, __filename).split(sep).join('/');
const TEXT_FILE = /\.(ts|tsx|md|css|json|html)$/;

function filesUnder(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) out.push(...filesUnder(p));
    else if (TEXT_FILE.test(name)) out.push(p);
  }
  return out;
}

const files = [...filesUnder(join(ROOT, 'src')), ...filesUnder(join(ROOT, 'test'))]
  .map((p) => ({ path: relative(ROOT, p).split(sep).join('/'), text: readFileSync(p, 'utf8') }))
  .filter((f) => f.path !== SELF);

/** Lines of every file matching `re`, as "path:line: text" so a failure says where to look. */
function hits(re: RegExp, within = files): string[] {
  const out: string[] = [];
  for (const f of within) {
    f.text.split('\n').forEach((line, i) => {
      if (re.test(line)) out.push(`${f.path}:${i + 1}: ${line.trim()}`);
    });
  }
  return out;
}

/** Anchors of docs/sources.md: "S4" and "S4.1" from headings "## §S4 …" and "### §S4.1 …". */
function sourceAnchors(markdown: string): string[] {
  return [...markdown.matchAll(/^#{2,4} §(S\d+(?:\.\d+)*)\s/gm)].map((m) => m[1]);
}

describe('citations inside the repository', () => {
  const sourcesDoc = readFileSync(join(ROOT, 'docs', 'sources.md'), 'utf8');
  const anchors = sourceAnchors(sourcesDoc);

  it('no file in src/ or test/ cites a document outside the repository or a tracker number', () => {
    // Each pattern is one way of pointing at something a clone does not contain.
    // Built from parts so that this file does not itself contain the citations it forbids.
    const patterns = [/check[- ]values/i, new RegExp(['design', 'notes'].join(' '), 'i'), new RegExp(['shared', 'docs'].join('\\/'), 'i'), /\bissue #?\d+/i];
    const found = patterns.flatMap((re) => hits(re));
    expect(found, `cite docs/sources.md §… or the published source instead:\n${found.join('\n')}`).toEqual([]);
  });

  it('docs/sources.md numbers its sections once each, so references stay stable', () => {
    expect(anchors.length).toBeGreaterThan(10);
    expect(new Set(anchors).size).toBe(anchors.length);
    // The pattern must catch the headings as written (a format change would otherwise silently pass everything).
    expect(anchors).toContain('S1');
    expect(anchors).toContain('S4.2');
  });

  it('every §S reference in src/ and test/ names a section that exists in docs/sources.md', () => {
    const missing: string[] = [];
    for (const f of files) {
      for (const m of f.text.matchAll(/§(S\d+(?:\.\d+)*)/g)) {
        if (!anchors.includes(m[1])) missing.push(`${f.path}: §${m[1]}`);
      }
    }
    expect(missing, `no such section in docs/sources.md:\n${missing.join('\n')}`).toEqual([]);
  });

  it('the §S references inside docs/sources.md itself point at existing sections', () => {
    const missing = [...sourcesDoc.matchAll(/§(S\d+(?:\.\d+)*)/g)].map((m) => m[1]).filter((a) => !anchors.includes(a));
    expect(missing).toEqual([]);
  });
});

/**
 * A source file with its comments removed: what is left is code, string and template literals and JSX text,
 * which is everything the program can show or print. A small scanner (quotes, templates, comments) is
 * enough here; a quote inside a regular-expression literal can only make it keep more text, never less.
 */
function withoutComments(code: string): string {
  let out = '';
  let i = 0;
  while (i < code.length) {
    const c = code[i];
    const next = code[i + 1];
    if (c === '/' && next === '/') {
      while (i < code.length && code[i] !== '\n') i++;
    } else if (c === '/' && next === '*') {
      const end = code.indexOf('*/', i + 2);
      i = end < 0 ? code.length : end + 2;
    } else if (c === "'" || c === '"' || c === '`') {
      let j = i + 1;
      while (j < code.length && code[j] !== c && !(c !== '`' && code[j] === '\n')) j += code[j] === '\\' ? 2 : 1;
      out += code.slice(i, j + 1);
      i = j + 1;
    } else {
      out += c;
      i++;
    }
  }
  return out;
}

describe('product text cites sources without confidence notes', () => {
  const code = files.filter((f) => f.path.startsWith('src/') && /\.tsx?$/.test(f.path)).map((f) => ({ path: f.path, text: withoutComments(f.text) }));

  it('the comment remover keeps strings and drops comments', () => {
    const kept = withoutComments("const a = 'x // y'; // from memory\n/* from memory */ const b = `z`;");
    expect(kept).toBe("const a = 'x // y'; \n const b = `z`;");
  });

  it('finds the strings it checks (help texts and printed sources are among them)', () => {
    expect(code.some((f) => f.text.includes('NORSOK N-003'))).toBe(true);
    expect(code.some((f) => f.text.includes('DNV-RP-C205 §9'))).toBe(true);
  });

  it('no string in src/ says "from memory" (that note belongs in docs/sources.md and the tests)', () => {
    expect(hits(/from memory/i, code)).toEqual([]);
  });
});
