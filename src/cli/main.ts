/**
 * The `wetmode` command line, as a function of its arguments (tested without a process).
 * One FILE: one pretty JSON object on standard output, errors on standard error. Many inputs: see batch.ts.
 * Each command's code is loaded only when that command runs (the case command alone needs the unit reader).
 */
import { readFileSync } from 'node:fs';
import { cautionLines } from '../text/cautions';
import { OPTIONS_HELP, parseCommandArgs } from './args';
import { runBatch } from './batch';
import { expandInputs } from './inputs';
import { prepareOutDir } from './out-dir';

interface Subcommand {
  summary: string;
  usage: string;
  load: () => Promise<(inputText: string) => string>;
}

const SUBCOMMANDS: Record<string, Subcommand> = {
  member: { usage: 'member INPUT...', summary: 'dry and wet modes of a member model (SI JSON)', load: async () => (await import('./member-command')).runMemberCommand },
  section: { usage: 'section INPUT...', summary: '2D added-mass matrix of a cross-section (SI JSON)', load: async () => (await import('./section-command')).runSectionCommand },
  case: { usage: 'case INPUT...', summary: 'a saved case file (.wetmode.json): frequencies and resonance verdict', load: async () => (await import('./case-command')).runCaseCommand },
  plate: { usage: 'plate INPUT...', summary: 'dry and wet modes of a plate panel in liquid (SI JSON)', load: async () => (await import('./plate-command')).runPlateCommand },
  spectrum: { usage: 'spectrum FILE', summary: 'peaks of a motion record (CSV or text: time s, 1 to 3 accelerations)', load: async () => (await import('./spectrum-command')).runSpectrumCommand },
  calibrate: { usage: 'calibrate INPUT...', summary: 'back-calculate one unknown input from a measured frequency', load: async () => (await import('./calibrate-command')).runCalibrateCommand },
};

/** What the command line needs from its process; tests pass their own. */
export interface CliIo {
  readStdin: () => string;
  /** Whether standard error is a terminal (progress is then on without --progress). */
  stderrIsTty: boolean;
  now: () => number;
}

function help(): string {
  const lines = [
    `wetmode ${__APP_VERSION__} — dry and wet natural frequencies of members in liquid (screening estimates)`,
    '',
    'Usage:',
    '  wetmode <command> [options] INPUT...',
    '  wetmode --help | -h         this text',
    '  wetmode --version | -v      the version',
    '',
    'Commands:',
    ...Object.entries(SUBCOMMANDS).map(([name, c]) => `  ${c.usage.padEnd(26)}${c.summary}`),
    '',
    ...OPTIONS_HELP,
    '',
    'Cautions:',
    ...cautionLines().map((l) => `  - ${l}`),
  ];
  return lines.join('\n');
}

const NODE_IO: CliIo = {
  readStdin: () => readFileSync(0, 'utf8'),
  stderrIsTty: Boolean(process.stderr.isTTY),
  now: () => performance.now(),
};

/** Runs the command line; resolves to the exit status: 0 all ok, 1 any case failed, 2 usage error. */
export async function main(argv: string[], out: (s: string) => void, err: (s: string) => void, io: CliIo = NODE_IO): Promise<number> {
  const [first, ...rest] = argv;
  if (first === undefined || first === '--help' || first === '-h' || first === 'help') {
    out(help());
    return first === undefined ? 2 : 0;
  }
  if (first === '--version' || first === '-v') {
    out(__APP_VERSION__);
    return 0;
  }
  const sub = SUBCOMMANDS[first];
  if (!sub) {
    err(`wetmode: unknown command "${first}". Expected one of: ${Object.keys(SUBCOMMANDS).join(', ')}. Try "wetmode --help".`);
    return 2;
  }
  const parsed = parseCommandArgs(rest);
  if (!parsed.ok) {
    err(`wetmode ${first}: ${parsed.message}. Usage: wetmode ${sub.usage}`);
    return 2;
  }
  const args = parsed.value;
  if (args.outDir !== undefined) {
    const problem = prepareOutDir(args.outDir, args.inputs);
    if (problem) {
      err(`wetmode ${first}: ${problem}`);
      return 2;
    }
  }
  const { sources, single } = expandInputs(args.inputs, args.jsonl, io);
  const run = await sub.load();
  if (single && args.outDir === undefined) {
    try {
      out(run(sources[0].read()));
      return 0;
    } catch (e) {
      err(`wetmode ${first}: ${e instanceof Error ? e.message : String(e)}`);
      return 1;
    }
  }
  const progress = args.progress || io.stderrIsTty ? err : undefined;
  return runBatch(first, run, sources, args.outDir, { out, err, progress, now: io.now });
}
