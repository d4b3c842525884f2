/**
 * The `wetmode` command line, as a function of its arguments (tested without a process).
 * Output is JSON on standard output; errors go to standard error with a non-zero exit code.
 */
import { readInput } from './read-input';
import { cautionLines } from '../text/cautions';
import { runCalibrateCommand } from './calibrate-command';
import { runCaseCommand } from './case-command';
import { runMemberCommand } from './member-command';
import { runSectionCommand } from './section-command';
import { runSpectrumCommand } from './spectrum-command';
import { runPlateCommand } from './plate-command';

interface Subcommand {
  summary: string;
  usage: string;
  run: (inputText: string) => string;
}

const SUBCOMMANDS: Record<string, Subcommand> = {
  member: { usage: 'member FILE', summary: 'dry and wet modes of a member model (SI JSON)', run: runMemberCommand },
  section: { usage: 'section FILE', summary: '2D added-mass matrix of a cross-section (SI JSON)', run: runSectionCommand },
  plate: { usage: 'plate FILE', summary: 'dry and wet modes of a plate panel in liquid (SI JSON)', run: runPlateCommand },
  case: { usage: 'case FILE', summary: 'a saved case file (.wetmode.json): frequencies and resonance verdict', run: runCaseCommand },
  spectrum: { usage: 'spectrum FILE', summary: 'peaks of a motion record (CSV or text: time s, 1 to 3 accelerations)', run: runSpectrumCommand },
  calibrate: { usage: 'calibrate FILE', summary: 'back-calculate one unknown input from a measured frequency', run: runCalibrateCommand },
};

function help(): string {
  const lines = [
    `wetmode ${__APP_VERSION__} — dry and wet natural frequencies of members in liquid (screening estimates)`,
    '',
    'Usage:',
    '  wetmode <command> FILE      FILE is a JSON file, or - for standard input',
    '  wetmode --help | -h         this text',
    '  wetmode --version | -v      the version',
    '',
    'Commands:',
    ...Object.entries(SUBCOMMANDS).map(([name, c]) => `  ${c.usage.padEnd(26)}${c.summary}`),
    ...(Object.keys(SUBCOMMANDS).length === 0 ? ['  (none yet)'] : []),
    '',
    'Cautions:',
    ...cautionLines().map((l) => `  - ${l}`),
  ];
  return lines.join('\n');
}

/** Runs the command line; returns the exit code. Separated from process handling so it can be tested. */
export function main(argv: string[], out: (s: string) => void, err: (s: string) => void): number {
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
    err(`wetmode: unknown command "${first}". Expected one of: ${Object.keys(SUBCOMMANDS).join(', ') || '--help, --version'}. Try "wetmode --help".`);
    return 2;
  }
  if (rest.length !== 1) {
    err(`wetmode ${first}: expected exactly one FILE (or - for standard input), got ${rest.length}. Usage: wetmode ${sub.usage}`);
    return 2;
  }
  try {
    out(sub.run(readInput(rest[0])));
    return 0;
  } catch (e) {
    err(`wetmode ${first}: ${e instanceof Error ? e.message : String(e)}`);
    return 1;
  }
}

