/**
 * The `wetmode` command as an office uses it (built dist-cli/wetmode.js, one process per run):
 *  - start-up: `--version`, one member file and one saved case, against bare `node -e 0`;
 *  - a batch of 1,000 member models of four kinds from a folder, and 1,000 saved pile cases as JSON lines on
 *    standard input, each in one run (target ≤ 30 s each on the 2-core development machine).
 */
import { spawnSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { memberBatch, pileCaseBatch } from './batch-inputs';

const CLI = 'dist-cli/wetmode.js';
const BATCH = 1000;
const BATCH_TARGET_S = 30;

function spawnMs(args: string[], input?: string): { ms: number; status: number | null; stdout: string; stderr: string } {
  const t0 = performance.now();
  const r = spawnSync(process.execPath, args, { input, encoding: 'utf8', maxBuffer: 1 << 30 });
  return { ms: performance.now() - t0, status: r.status, stdout: r.stdout, stderr: r.stderr };
}

/** Median wall time of a whole process, printed with its excess over bare Node (`base`, when given). */
function medianSpawn(label: string, args: string[], base?: number, runs = 11): number {
  spawnMs(args);
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const r = spawnMs(args);
    if (r.status !== 0) throw new Error(`${args.join(' ')} exited ${r.status}: ${r.stderr}`);
    t.push(r.ms);
  }
  t.sort((a, b) => a - b);
  const median = t[runs >> 1];
  const over = base === undefined ? '' : `  (${(median - base).toFixed(0)} ms over bare Node)`;
  console.log(`${label.padEnd(58)} median ${median.toFixed(0).padStart(6)} ms  min ${t[0].toFixed(0).padStart(6)} ms  ${runs} runs${over}`);
  return median;
}

function batchRun(label: string, args: string[], input: string | undefined): void {
  const r = spawnMs(args, input);
  const lines = r.stdout.trim().split('\n').slice(1).map((l) => JSON.parse(l) as { ok: boolean });
  const ok = lines.filter((l) => l.ok).length;
  const s = r.ms / 1000;
  console.log(
    `${label.padEnd(58)} ${s.toFixed(1).padStart(6)} s  ${((r.ms / lines.length) || 0).toFixed(1)} ms/case  ${ok}/${lines.length} ok, exit ${r.status}  target ≤ ${BATCH_TARGET_S} s: ${s <= BATCH_TARGET_S ? 'met' : 'NOT met'}`,
  );
}

export function run(): void {
  console.log('Start-up, whole process, wall clock:');
  const base = medianSpawn('node -e 0 (bare Node)', ['-e', '0']);
  medianSpawn('wetmode --version', [CLI, '--version'], base);
  medianSpawn('wetmode member, one example file', [CLI, 'member', 'examples/member-fender-pile-port-halloran.json'], base);
  medianSpawn('wetmode case, one saved case (loads the unit reader)', [CLI, 'case', 'examples/case-port-halloran-pile.wetmode.json'], base);

  const dir = mkdtempSync(join(tmpdir(), 'wetmode-bench-'));
  try {
    const members = join(dir, 'members');
    mkdirSync(members);
    memberBatch(BATCH).forEach((m, i) => writeFileSync(join(members, `m-${String(i + 1).padStart(4, '0')}.json`), JSON.stringify(m)));
    batchRun(`batch: ${BATCH} member models, 4 kinds, one folder`, [CLI, 'member', members], undefined);
    const jsonl = pileCaseBatch(BATCH).map((c) => JSON.stringify(c)).join('\n') + '\n';
    batchRun(`batch: ${BATCH} saved pile cases, JSON lines on stdin`, [CLI, 'case', '-'], jsonl);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
