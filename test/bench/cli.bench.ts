/**
 * The `wetmode` command as an office uses it (built dist-cli/wetmode.js, one process per run):
 *  - start-up: `--version`, one member file and one saved case, against bare `node -e 0`;
 *  - a batch of 1,000 member models of four kinds from a folder, and 1,000 saved pile cases as JSON lines on
 *    standard input, each in one run (target ≤ 30 s each on the 2-core development machine).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { performance } from 'node:perf_hooks';
import { memberBatch, pileCaseBatch } from './batch-inputs';

const CLI = 'dist-cli/wetmode.js';
const BATCH = 1000;
const BATCH_TARGET_S = 30;

/**
 * CPU time (user + system, ms) of this process's finished children, from Linux's /proc/self/stat (cutime and
 * cstime, fields 16 and 17, in ticks of 10 ms); undefined elsewhere. On a shared machine wall time swings with the
 * load, CPU time much less.
 */
function childrenCpuMs(): number | undefined {
  if (!existsSync('/proc/self/stat')) return undefined;
  const fields = readFileSync('/proc/self/stat', 'utf8').split(') ')[1].split(' '); // fields from 3 on
  return (Number(fields[13]) + Number(fields[14])) * 10;
}

function spawnMs(args: string[], input?: string): { ms: number; cpuMs: number | undefined; status: number | null; stdout: string; stderr: string } {
  const cpu0 = childrenCpuMs();
  const t0 = performance.now();
  const r = spawnSync(process.execPath, args, { input, encoding: 'utf8', maxBuffer: 1 << 30 });
  const ms = performance.now() - t0;
  const cpu1 = childrenCpuMs();
  return { ms, cpuMs: cpu0 === undefined || cpu1 === undefined ? undefined : cpu1 - cpu0, status: r.status, stdout: r.stdout, stderr: r.stderr };
}

/** Median wall time and mean CPU time of a whole process, with the CPU over bare Node (`baseCpu`, when given). */
function medianSpawn(label: string, args: string[], baseCpu?: number, runs = 11): number | undefined {
  spawnMs(args);
  const t: number[] = [];
  let cpu: number | undefined = 0;
  for (let i = 0; i < runs; i++) {
    const r = spawnMs(args);
    if (r.status !== 0) throw new Error(`${args.join(' ')} exited ${r.status}: ${r.stderr}`);
    t.push(r.ms);
    cpu = cpu === undefined || r.cpuMs === undefined ? undefined : cpu + r.cpuMs;
  }
  t.sort((a, b) => a - b);
  const meanCpu = cpu === undefined ? undefined : cpu / runs;
  const cpuText = meanCpu === undefined ? '' : `  CPU ${meanCpu.toFixed(0).padStart(4)} ms${baseCpu === undefined ? '' : ` (${(meanCpu - baseCpu).toFixed(0)} over bare Node)`}`;
  console.log(`${label.padEnd(58)} wall median ${t[runs >> 1].toFixed(0).padStart(5)} ms  min ${t[0].toFixed(0).padStart(5)} ms${cpuText}  ${runs} runs`);
  return meanCpu;
}

function batchRun(label: string, args: string[], input: string | undefined): void {
  const r = spawnMs(args, input);
  const lines = r.stdout.trim().split('\n').slice(1).map((l) => JSON.parse(l) as { ok: boolean });
  const ok = lines.filter((l) => l.ok).length;
  const s = r.ms / 1000;
  const cpu = r.cpuMs === undefined ? '' : ` (CPU ${(r.cpuMs / 1000).toFixed(1)} s)`;
  console.log(
    `${label.padEnd(58)} ${s.toFixed(1).padStart(6)} s${cpu}  ${(r.ms / Math.max(1, lines.length)).toFixed(1)} ms/case  ${ok}/${lines.length} ok, exit ${r.status}  target ≤ ${BATCH_TARGET_S} s: ${s <= BATCH_TARGET_S ? 'met' : 'NOT met'}`,
  );
}

export function run(): void {
  console.log('Start-up, whole process (CPU = user + system, mean):');
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
