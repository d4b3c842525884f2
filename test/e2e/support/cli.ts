import { spawnSync } from 'node:child_process';

/** Runs the built `wetmode` command with a JSON input on standard input; returns the parsed output. */
export function wetmodeJson(command: string, input: unknown): any {
  const r = spawnSync(process.execPath, ['dist-cli/wetmode.js', command, '-'], { input: JSON.stringify(input), encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`wetmode ${command} failed (${r.status}): ${r.stderr}`);
  return JSON.parse(r.stdout);
}

/** A frequency as the app shows it: the app's own formatter, so the test compares numbers, not formatting. */
export { formatHz } from '../../../src/ui/format/numbers';
