import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { KIND_IDS } from '../../src/kinds/registry-pure';
import { SHAPE_IDS } from '../../src/physics/shapes/registry';
import { findCycles, importGraph, resolveImport, runtimeImports, sourceFiles, srcPath, stringLiterals } from './source-scan';

const FILES = sourceFiles();
const LITERALS = new Map(FILES.map((f) => [srcPath(f), new Set(stringLiterals(readFileSync(f, 'utf8')))]));

/** Files under src/ that hold `word` as a whole string literal. */
function filesWithLiteral(word: string): string[] {
  return [...LITERALS].filter(([, set]) => set.has(word)).map(([path]) => path);
}

describe('the source scanner', () => {
  it('finds string literals but not comments, template text or regular expressions', () => {
    const text = [
      "const a = 'pile'; // 'riser'",
      '/* "baffle" */ const b = "stem" + `tube ${"rod"}`;',
      "const re = /'x'/g; const half = 1 / 2; const c = 'a\\'b';",
    ].join('\n');
    expect(stringLiterals(text)).toEqual(['pile', 'stem', 'rod', "a'b"]);
  });

  it('lists run-time imports and leaves out type-only ones', () => {
    const text = [
      "import { a } from './a';",
      "import type { B } from './b';",
      "import { type C, type D } from './c';",
      "import { type E, f } from './e';",
      "export * from './g';",
      "export type { H } from './h';",
    ].join('\n');
    expect(runtimeImports(text)).toEqual(['./a', './e', './g']);
  });
});

describe('each member kind and section shape has one home', () => {
  it.each(KIND_IDS)('the kind id "%s" is a string literal only in its own folder, the registry and the case migrations', (id) => {
    const allowed = (path: string) => path.startsWith(`kinds/${id}/`) || path === 'kinds/registry.ts' || path === 'kinds/registry-pure.ts' || path === 'case/migrations.ts';
    expect(filesWithLiteral(id).filter((p) => !allowed(p))).toEqual([]);
    expect(filesWithLiteral(id).some((p) => p.startsWith(`kinds/${id}/`))).toBe(true);
  });

  it.each(SHAPE_IDS)('the shape id "%s" is a string literal only in its shape description and the case migrations', (id) => {
    const allowed = (path: string) => path === `physics/shapes/${id}.ts` || path === 'case/migrations.ts';
    expect(filesWithLiteral(id).filter((p) => !allowed(p))).toEqual([]);
    expect(filesWithLiteral(id)).toContain(`physics/shapes/${id}.ts`);
  });
});

describe('imports', () => {
  const graph = importGraph(FILES);

  it('every relative import in src/ resolves to a source file or an asset', () => {
    const broken: string[] = [];
    for (const f of FILES) {
      for (const spec of runtimeImports(readFileSync(f, 'utf8'))) {
        if (spec.startsWith('.') && !/\.(css|svg|png|json)$/.test(spec) && resolveImport(f, spec) === null) broken.push(`${srcPath(f)} -> ${spec}`);
      }
    }
    expect(broken).toEqual([]);
  });

  it('form no cycle across src/', () => {
    expect(findCycles(graph).map((c) => c.map(srcPath).join(' -> '))).toEqual([]);
  });

  it('go one way: the physics core imports nothing outside src/physics', () => {
    const outward: string[] = [];
    for (const [f, deps] of graph) {
      if (!srcPath(f).startsWith('physics/')) continue;
      for (const d of deps) if (!srcPath(d).startsWith('physics/')) outward.push(`${srcPath(f)} -> ${srcPath(d)}`);
    }
    expect(outward).toEqual([]);
  });
});
