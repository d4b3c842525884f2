/**
 * `--out DIR`: one result file per case, named after its input (`pile-7.wetmode.json` → `pile-7.result.json`;
 * line 12 of standard input → `line-12.result.json`). An input is never overwritten: an --out that is itself an
 * input is a usage error, and a result name that would land on an input file fails that case.
 */
import { existsSync, mkdirSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { RESULT_SUFFIX, type CaseSource } from './inputs';

/** Creates DIR if needed; returns a usage error message, or undefined when DIR can take the results. */
export function prepareOutDir(outDir: string, inputs: readonly string[]): string | undefined {
  const dir = resolve(outDir);
  const clash = inputs.find((i) => i !== '-' && resolve(i) === dir);
  if (clash !== undefined) return `--out "${outDir}" is one of the inputs; choose a folder for the results that is not an input`;
  if (existsSync(dir) && !statSync(dir).isDirectory()) return `--out "${outDir}" is a file, expected a folder`;
  try {
    mkdirSync(dir, { recursive: true });
  } catch (e) {
    return `cannot create the --out folder "${outDir}": ${(e as Error).message}`;
  }
  return undefined;
}

/** Hands out result paths: unique within the run (a second `a.json` from another folder becomes `a-2.result.json`). */
export function resultPaths(outDir: string, sources: readonly CaseSource[]): (source: CaseSource) => string {
  const dir = resolve(outDir);
  const inputs = new Set(sources.map((s) => s.inputPath).filter((p): p is string => p !== undefined));
  const used = new Set<string>();
  return (source) => {
    let name = `${source.outName}${RESULT_SUFFIX}`;
    for (let k = 2; used.has(name); k++) name = `${source.outName}-${k}${RESULT_SUFFIX}`;
    used.add(name);
    const path = join(dir, name);
    if (inputs.has(path)) throw new Error(`its result file "${path}" is an input file; it was not overwritten`);
    return path;
  };
}
