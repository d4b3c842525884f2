/**
 * A small scanner for the architecture tests: lists the source files under src/, finds their string
 * literals (comments, template text and regular expressions skipped) and their relative imports.
 * Hand-written so the tests need no parser: TypeScript's own syntax is all it follows.
 */
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';

export const SRC = resolve(__dirname, '../../src');

/** Every .ts and .tsx file under `dir`, as absolute paths. */
export function sourceFiles(dir: string = SRC): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) out.push(...sourceFiles(p));
    else if (/\.tsx?$/.test(name)) out.push(p);
  }
  return out.sort();
}

/** Path relative to src/, with forward slashes: "kinds/pile/build.ts". */
export function srcPath(file: string): string {
  return relative(SRC, file).split('\\').join('/');
}

// After one of these characters (or at the start), a "/" begins a regular expression, not a division.
const REGEX_AFTER = new Set(['', '(', ',', '=', ':', '[', '!', '&', '|', '?', '{', '}', ';', '+', '-', '*', '%', '<', '>', '~', '^']);
const REGEX_AFTER_WORDS = new Set(['return', 'typeof', 'case', 'do', 'else', 'in', 'of', 'new', 'delete', 'void', 'throw', 'yield', 'await']);

/** The string literals of a source text ('…' and "…", escapes resolved for quotes and backslashes only). */
export function stringLiterals(text: string): string[] {
  const found: string[] = [];
  let i = 0;
  let last = ''; // last significant character outside strings and comments
  let word = ''; // last identifier-like word
  const n = text.length;

  function quoted(q: string): string {
    let s = '';
    i++;
    while (i < n && text[i] !== q) {
      if (text[i] === '\\') {
        s += text[i + 1];
        i += 2;
      } else s += text[i++];
    }
    i++;
    return s;
  }

  function skipRegex(): void {
    i++;
    let inClass = false;
    while (i < n) {
      const c = text[i];
      if (c === '\\') i += 2;
      else if (c === '[') (inClass = true), i++;
      else if (c === ']') (inClass = false), i++;
      else if (c === '/' && !inClass) {
        i++;
        break;
      } else if (c === '\n') break;
      else i++;
    }
    while (i < n && /[a-z]/i.test(text[i])) i++;
  }

  function template(): void {
    i++;
    while (i < n && text[i] !== '`') {
      if (text[i] === '\\') i += 2;
      else if (text[i] === '$' && text[i + 1] === '{') {
        i += 2;
        code('}');
      } else i++;
    }
    i++;
  }

  function code(until: string | null): void {
    let depth = 0;
    while (i < n) {
      const c = text[i];
      if (until !== null && c === '{') depth++;
      if (until !== null && c === '}') {
        if (depth === 0) {
          i++;
          return;
        }
        depth--;
      }
      if (c === '/' && text[i + 1] === '/') {
        while (i < n && text[i] !== '\n') i++;
      } else if (c === '/' && text[i + 1] === '*') {
        i = text.indexOf('*/', i + 2);
        i = i < 0 ? n : i + 2;
      } else if (c === "'" || c === '"') {
        found.push(quoted(c));
        last = 'x';
        word = '';
      } else if (c === '`') {
        template();
        last = 'x';
        word = '';
      } else if (c === '/' && (REGEX_AFTER.has(last) || REGEX_AFTER_WORDS.has(word))) {
        skipRegex();
        last = 'x';
        word = '';
      } else {
        if (/\s/.test(c)) {
          i++;
          continue;
        }
        if (/[A-Za-z0-9_$]/.test(c)) {
          word = last !== '' && /[A-Za-z0-9_$]/.test(last) ? word + c : c;
        } else word = '';
        last = c;
        i++;
      }
    }
  }

  code(null);
  return found;
}

/** Module specifiers this file imports at run time (`import type` and `export type` are left out). */
export function runtimeImports(text: string): string[] {
  const out: string[] = [];
  const re = /^\s*(import|export)\s+(type\s+)?([^'";]*?\sfrom\s+)?['"]([^'"]+)['"]/gm;
  for (let m = re.exec(text); m; m = re.exec(text)) {
    if (m[2]) continue;
    // `import { type A, type B } from` carries types only and is erased as well.
    const clause = (m[3] ?? '').replace(/\sfrom\s+$/, '').trim();
    const braces = /^\{([^}]*)\}$/.exec(clause);
    const names = braces ? braces[1].split(',').map((x) => x.trim()).filter((x) => x !== '') : [];
    if (braces && names.length > 0 && names.every((x) => x.startsWith('type '))) continue;
    out.push(m[4]);
  }
  return out;
}

/** Resolves a relative specifier from `file` to a source file, or null (packages, assets). */
export function resolveImport(file: string, spec: string): string | null {
  if (!spec.startsWith('.')) return null;
  const base = resolve(dirname(file), spec);
  for (const candidate of [base, `${base}.ts`, `${base}.tsx`, join(base, 'index.ts'), join(base, 'index.tsx')]) {
    if (existsSync(candidate) && statSync(candidate).isFile() && /\.tsx?$/.test(candidate)) return candidate;
  }
  return null;
}

/** The run-time import graph of src/: file -> files it imports. */
export function importGraph(files: readonly string[]): Map<string, string[]> {
  const graph = new Map<string, string[]>();
  for (const f of files) {
    const text = readFileSync(f, 'utf8');
    graph.set(f, runtimeImports(text).map((s) => resolveImport(f, s)).filter((x): x is string => x !== null));
  }
  return graph;
}

/** Every import cycle found by depth-first search, each as the list of files around it (first file repeated at the end). */
export function findCycles(graph: Map<string, string[]>): string[][] {
  const state = new Map<string, 'open' | 'done'>();
  const stack: string[] = [];
  const cycles: string[][] = [];
  function visit(f: string): void {
    state.set(f, 'open');
    stack.push(f);
    for (const g of graph.get(f) ?? []) {
      if (state.get(g) === 'open') cycles.push([...stack.slice(stack.indexOf(g)), g]);
      else if (!state.has(g)) visit(g);
    }
    stack.pop();
    state.set(f, 'done');
  }
  for (const f of graph.keys()) if (!state.has(f)) visit(f);
  return cycles;
}
