/**
 * Many cases in one run (office batch): one process, so start-up is paid once.
 *
 * Standard output: a first line `{"wetmode": version, "command": ..., "cases": N, "cautions": [...]}` (the
 * cautions once per batch, not on every line), then one compact JSON line per case, in input order:
 *   {"file": ..., "ok": true, "result": {...}}            the command's output without its cautions
 *   {"file"|"line": ..., "ok": false, "error": "..."}     why this case gave no result
 * With `--out DIR`, each result is written to its own file exactly as a single-file run prints it (pretty, with the
 * cautions) and its line says `"out": path` instead of holding the result. A `result.ok` of false (a member that
 * buckles) is an answer, not a failure. Standard error: progress (see progress.ts), then one summary line.
 * A failing case never stops the batch; the exit status is 1 when any case failed.
 */
import { writeFileSync } from 'node:fs';
import { cautionLines } from '../text/cautions';
import type { CaseSource } from './inputs';
import { resultPaths } from './out-dir';
import { progressMeter } from './progress';

export interface BatchIo {
  out: (line: string) => void;
  err: (line: string) => void;
  /** Writes a progress line, or undefined when progress is off. */
  progress: ((line: string) => void) | undefined;
  now: () => number;
}

/** The command's pretty JSON output, compacted to one line; numbers keep the command's 6-figure rounding. */
function compactResult(pretty: string): Record<string, unknown> {
  const result = JSON.parse(pretty) as Record<string, unknown>;
  delete result.cautions; // printed once, on the first line
  return result;
}

export function runBatch(command: string, run: (inputText: string) => string, sources: readonly CaseSource[], outDir: string | undefined, io: BatchIo): number {
  const start = io.now();
  io.out(JSON.stringify({ wetmode: __APP_VERSION__, command, cases: sources.length, cautions: cautionLines() }));
  const pathFor = outDir === undefined ? undefined : resultPaths(outDir, sources);
  const meter = progressMeter(command, sources.length, io.now, io.progress);
  let failed = 0;
  for (let i = 0; i < sources.length; i++) {
    const s = sources[i];
    let line: string;
    try {
      const pretty = run(s.read());
      if (pathFor) {
        const path = pathFor(s);
        writeFileSync(path, pretty + '\n');
        line = JSON.stringify({ ...s.label, ok: true, out: path });
      } else {
        line = JSON.stringify({ ...s.label, ok: true, result: compactResult(pretty) });
      }
    } catch (e) {
      failed++;
      line = JSON.stringify({ ...s.label, ok: false, error: e instanceof Error ? e.message : String(e) });
    }
    io.out(line);
    meter.tick(i + 1, failed);
  }
  const seconds = ((io.now() - start) / 1000).toFixed(1);
  io.err(`wetmode ${command}: ${sources.length} cases, ${sources.length - failed} ok, ${failed} failed, ${seconds} s${outDir === undefined ? '' : `; results in ${outDir}`}`);
  return failed === 0 ? 0 : 1;
}
