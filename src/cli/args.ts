/**
 * Options and inputs of a command (`wetmode <command> [options] INPUT...`), read without touching the disk.
 * A usage error is a returned message (exit status 2), never a throw.
 */

export interface CommandArgs {
  /** Files, folders, and "-" for standard input (at most once), in the order given. */
  inputs: string[];
  /** Every non-folder input holds one case per line (`.jsonl` files always do). */
  jsonl: boolean;
  /** Write one result file per case into this folder instead of JSON lines on standard output. */
  outDir: string | undefined;
  /** Progress lines on standard error even when it is not a terminal. */
  progress: boolean;
}

export const OPTIONS_HELP: readonly string[] = [
  'INPUT is a JSON file, a folder (its *.json files, sorted; *.result.json skipped), a .jsonl file',
  '(one case per line), or - for standard input (one document, or JSON lines: detected, or say --jsonl).',
  'One FILE prints one pretty JSON object. Several inputs, a folder or JSON lines print one JSON line',
  'per case after a first line holding the cautions: {"file"|"line": ..., "ok": true, "result": {...}}',
  'or {..., "ok": false, "error": "..."}. Exit status: 0 all cases ok, 1 any case failed, 2 usage error.',
  '',
  'Options:',
  '  --out DIR       one result file per case in DIR (pretty JSON, with the cautions), named after the input',
  '  --jsonl         inputs that are not folders hold one JSON case per line',
  '  --progress      progress on standard error every second (the default when it is a terminal)',
];

export function parseCommandArgs(args: readonly string[]): { ok: true; value: CommandArgs } | { ok: false; message: string } {
  const value: CommandArgs = { inputs: [], jsonl: false, outDir: undefined, progress: false };
  let optionsEnded = false;
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (optionsEnded || a === '-' || !a.startsWith('-')) {
      value.inputs.push(a);
    } else if (a === '--') {
      optionsEnded = true;
    } else if (a === '--jsonl') {
      value.jsonl = true;
    } else if (a === '--progress') {
      value.progress = true;
    } else if (a === '--out' || a.startsWith('--out=')) {
      const dir = a === '--out' ? args[++i] : a.slice('--out='.length);
      if (dir === undefined || dir === '') return { ok: false, message: '--out needs a folder name, got nothing' };
      if (value.outDir !== undefined) return { ok: false, message: `--out given twice ("${value.outDir}" and "${dir}")` };
      value.outDir = dir;
    } else {
      return { ok: false, message: `unknown option "${a}". Expected --out DIR, --jsonl or --progress` };
    }
  }
  if (value.inputs.length === 0) return { ok: false, message: 'expected at least one FILE, folder, or - for standard input, got none' };
  if (value.inputs.filter((x) => x === '-').length > 1) return { ok: false, message: 'standard input (-) can be read only once, got it more than once' };
  return { ok: true, value };
}
