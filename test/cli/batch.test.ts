import { describe, it, expect, beforeEach, afterEach } from 'vitest';
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { main, type CliIo } from '../../src/cli/main';
import { runMemberCommand } from '../../src/cli/member-command';
import { runSectionCommand } from '../../src/cli/section-command';
import { CAUTIONS } from '../../src/text/cautions';

const MEMBERS = ['examples/member-baffle-marrow-creek.json', 'examples/member-fender-pile-port-halloran.json', 'examples/member-temperature-stem-tern-haven.json'];
const SECTION = 'examples/section-tank-baffle.json';

interface Run {
  code: number;
  out: string[];
  err: string[];
}

async function run(args: string[], opts: { stdin?: string; tty?: boolean; clock?: () => number } = {}): Promise<Run> {
  const out: string[] = [];
  const err: string[] = [];
  const io: CliIo = {
    readStdin: () => opts.stdin ?? '',
    stderrIsTty: opts.tty ?? false,
    now: opts.clock ?? (() => 0),
  };
  const code = await main(args, (s) => out.push(s), (s) => err.push(s), io);
  return { code, out, err };
}

/** The command's own single-file answer, without the cautions (the batch prints them once, first). */
function expectedResult(text: string, command: (t: string) => string): unknown {
  const r = JSON.parse(command(text));
  delete r.cautions;
  return r;
}

const lines = (r: Run) => r.out.map((l) => JSON.parse(l));
const oneLine = (file: string) => JSON.stringify(JSON.parse(readFileSync(file, 'utf8')));

let dir: string;
beforeEach(() => {
  dir = mkdtempSync(join(tmpdir(), 'wetmode-batch-'));
});
afterEach(() => rmSync(dir, { recursive: true, force: true }));

describe('wetmode with many inputs in one run', () => {
  it('several files give a first line with the cautions, then one JSON line per file in order with the same result as one file alone', async () => {
    const r = await run(['member', ...MEMBERS]);
    expect(r.code).toBe(0);
    expect(r.out).toHaveLength(1 + MEMBERS.length);
    const [head, ...cases] = lines(r);
    expect(head).toMatchObject({ command: 'member', cases: MEMBERS.length });
    expect(head.cautions).toHaveLength(CAUTIONS.length);
    cases.forEach((c, i) => {
      expect(c).toEqual({ file: MEMBERS[i], ok: true, result: expectedResult(readFileSync(MEMBERS[i], 'utf8'), runMemberCommand) });
      expect(c.result.cautions).toBeUndefined(); // once per batch, not on every line
    });
    expect(r.err).toEqual([expect.stringMatching(/^wetmode member: 3 cases, 3 ok, 0 failed, [\d.]+ s$/)]);
  });

  it('a folder runs its .json files in name order and skips earlier .result.json outputs and other files', async () => {
    copyFileSync(MEMBERS[1], join(dir, 'b-pile.json'));
    copyFileSync(MEMBERS[0], join(dir, 'a-baffle.wetmode.json'));
    writeFileSync(join(dir, 'a-baffle.result.json'), '{"not": "a case"}');
    writeFileSync(join(dir, 'notes.txt'), 'not a case');
    const r = await run(['member', dir]);
    expect(r.code).toBe(0);
    expect(lines(r).slice(1).map((c) => [c.file, c.ok])).toEqual([
      [join(dir, 'a-baffle.wetmode.json'), true],
      [join(dir, 'b-pile.json'), true],
    ]);
  });

  it('JSON lines on standard input are detected, one case per line, numbered as an editor numbers them', async () => {
    const stdin = `${oneLine(MEMBERS[0])}\n\n${oneLine(MEMBERS[2])}\n`;
    const r = await run(['member', '-'], { stdin });
    expect(r.code).toBe(0);
    const cases = lines(r).slice(1);
    expect(cases.map((c) => c.line)).toEqual([1, 3]);
    expect(cases[1].result).toEqual(expectedResult(readFileSync(MEMBERS[2], 'utf8'), runMemberCommand));
  });

  it('--jsonl reads even a one-line standard input as a batch; a .jsonl file is a batch without it', async () => {
    const viaFlag = await run(['section', '--jsonl', '-'], { stdin: oneLine(SECTION) });
    expect(lines(viaFlag)[1]).toEqual({ line: 1, ok: true, result: expectedResult(readFileSync(SECTION, 'utf8'), runSectionCommand) });
    writeFileSync(join(dir, 'cases.jsonl'), `${oneLine(MEMBERS[0])}\n${oneLine(MEMBERS[1])}\n`);
    const viaFile = await run(['member', join(dir, 'cases.jsonl')]);
    expect(lines(viaFile).slice(1).map((c) => [c.file, c.line, c.ok])).toEqual([
      [join(dir, 'cases.jsonl'), 1, true],
      [join(dir, 'cases.jsonl'), 2, true],
    ]);
  }, 60_000); // one section solve with its energy cross-check: about a second, several on a loaded machine

  it('a bad case in the middle is reported on its line, the batch goes on, and the exit status is 1', async () => {
    const bad = join(dir, 'bad.json');
    writeFileSync(bad, JSON.stringify({ lengthM: -3 }));
    const r = await run(['member', MEMBERS[0], bad, 'no/such/file.json', MEMBERS[1]]);
    expect(r.code).toBe(1);
    const cases = lines(r).slice(1);
    expect(cases.map((c) => c.ok)).toEqual([true, false, false, true]);
    expect(cases[1]).toEqual({ file: bad, ok: false, error: expect.stringContaining('lengthM') });
    expect(cases[2]).toEqual({ file: 'no/such/file.json', ok: false, error: 'cannot read "no/such/file.json": no such file' });
    expect(r.err.at(-1)).toMatch(/4 cases, 2 ok, 2 failed/);
  });

  it('a bad line of standard input fails alone', async () => {
    const r = await run(['member', '-'], { stdin: `${oneLine(MEMBERS[0])}\n{"lengthM": 5\n${oneLine(MEMBERS[1])}\n` });
    expect(r.code).toBe(1);
    expect(lines(r).slice(1).map((c) => [c.line, c.ok])).toEqual([
      [1, true],
      [2, false],
      [3, true],
    ]);
  });

  it('--out DIR writes each result as a single-file run prints it, named after its input, and lists where', async () => {
    const out = join(dir, 'results');
    const r = await run(['member', '--out', out, MEMBERS[0], MEMBERS[1]]);
    expect(r.code).toBe(0);
    expect(readdirSync(out).sort()).toEqual(['member-baffle-marrow-creek.result.json', 'member-fender-pile-port-halloran.result.json']);
    const written = readFileSync(join(out, 'member-baffle-marrow-creek.result.json'), 'utf8');
    expect(written).toBe(runMemberCommand(readFileSync(MEMBERS[0], 'utf8')) + '\n'); // with its cautions: it may travel alone
    expect(lines(r)[1]).toEqual({ file: MEMBERS[0], ok: true, out: join(out, 'member-baffle-marrow-creek.result.json') });
  });

  it('--out DIR names standard-input lines by line number and keeps two inputs of the same name apart', async () => {
    mkdirSync(join(dir, 'x'));
    copyFileSync(MEMBERS[0], join(dir, 'x', 'pile.json'));
    copyFileSync(MEMBERS[1], join(dir, 'pile.json'));
    const out = join(dir, 'out');
    const r = await run(['member', '--out', out, join(dir, 'x', 'pile.json'), join(dir, 'pile.json'), '-'], { stdin: `\n${oneLine(MEMBERS[2])}\n${oneLine(MEMBERS[0])}\n` });
    expect(r.code).toBe(0);
    expect(readdirSync(out).sort()).toEqual(['line-2.result.json', 'line-3.result.json', 'pile-2.result.json', 'pile.result.json']);
  });

  it('--out never overwrites an input: an --out that is an input is a usage error, and a clashing result name fails that case only', async () => {
    copyFileSync(MEMBERS[0], join(dir, 'pile.json'));
    const refused = await run(['member', '--out', dir, dir]);
    expect(refused.code).toBe(2);
    expect(refused.err.join('')).toContain('is one of the inputs');
    const out = join(dir, 'out');
    mkdirSync(out);
    const input = join(out, 'pile.result.json');
    const original = readFileSync(MEMBERS[1], 'utf8');
    writeFileSync(input, original);
    // pile.json's result would be out/pile.result.json, which is the other input.
    const r = await run(['member', '--out', out, join(dir, 'pile.json'), input]);
    expect(r.code).toBe(1);
    expect(lines(r)[1]).toMatchObject({ file: join(dir, 'pile.json'), ok: false, error: expect.stringContaining('is an input file; it was not overwritten') });
    expect(readFileSync(input, 'utf8')).toBe(original);
    expect(lines(r)[2]).toMatchObject({ file: input, ok: true });
    expect(existsSync(join(out, 'pile.result.result.json'))).toBe(true);
  });

  it('usage errors exit 2 and say what was expected', async () => {
    const cases: [string[], RegExp][] = [
      [['member'], /expected at least one FILE/],
      [['member', '--frobnicate', MEMBERS[0]], /unknown option "--frobnicate"/],
      [['member', MEMBERS[0], '--out'], /--out needs a folder name/],
      [['member', '-', '-'], /standard input \(-\) can be read only once/],
      [['member', '--out', MEMBERS[0], MEMBERS[1]], /is a file, expected a folder/],
    ];
    for (const [args, message] of cases) {
      const r = await run(args);
      expect(r.code, args.join(' ')).toBe(2);
      expect(r.err.join('\n')).toMatch(message);
      expect(r.out).toEqual([]);
    }
  });

  it('prints a progress line on standard error at most once a second, with --progress or on a terminal only', async () => {
    let t = 0;
    const clock = () => (t += 600); // each call moves the clock 0.6 s
    const withFlag = await run(['member', '--progress', ...MEMBERS], { clock });
    const progress = withFlag.err.filter((l) => l.includes('/3 cases'));
    expect(progress.length).toBeGreaterThanOrEqual(1);
    expect(progress.length).toBeLessThan(MEMBERS.length); // not one per case at 0.6 s per case
    expect(progress[0]).toMatch(/^wetmode member: \d\/3 cases, 0 failed, [\d.]+ s/);
    const onTty = await run(['member', ...MEMBERS], { clock, tty: true });
    expect(onTty.err.some((l) => l.includes('/3 cases'))).toBe(true);
    const quiet = await run(['member', ...MEMBERS], { clock });
    expect(quiet.err.filter((l) => l.includes('/3 cases'))).toEqual([]);
  });

  it('one FILE, or one document on standard input, still prints the pretty single answer', async () => {
    const text = readFileSync(MEMBERS[0], 'utf8');
    expect(await run(['member', MEMBERS[0]])).toEqual({ code: 0, out: [runMemberCommand(text)], err: [] });
    expect(await run(['member', '-'], { stdin: text })).toEqual({ code: 0, out: [runMemberCommand(text)], err: [] });
    const broken = await run(['member', '-'], { stdin: '{ "lengthM": 20,\n  oops' });
    expect(broken.code).toBe(1);
    expect(broken.err.join('')).toContain('the member file is not valid JSON');
  });
});
