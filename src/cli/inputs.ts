/**
 * Turns the inputs of a command into the list of cases to run: files, folders (their *.json files, sorted, without
 * our own *.result.json outputs), JSON-lines files and standard input (one document, or one case per line).
 * A file that cannot be read becomes a case that fails with the reason, so one bad input never stops a batch.
 */
import { readdirSync, statSync } from 'node:fs';
import { basename, join, resolve } from 'node:path';
import { readInput } from './read-input';

/** Where a case came from, as printed on its output line: `{"file": ...}`, `{"line": n}` or both. */
export interface CaseLabel {
  file?: string;
  line?: number;
}

export interface CaseSource {
  label: CaseLabel;
  /** The case's JSON text; throws an Error saying why it cannot be read. */
  read: () => string;
  /** Absolute path of the input file it came from (never overwritten by --out), or undefined for standard input. */
  inputPath: string | undefined;
  /** Name for its result file under --out, before ".result.json". */
  outName: string;
}

export interface InputIo {
  readStdin: () => string;
}

/** Our result files, skipped when a folder is read so results written beside the cases are not read as cases. */
export const RESULT_SUFFIX = '.result.json';

function stem(path: string): string {
  return basename(path).replace(/(\.wetmode)?\.jsonl?$/i, '');
}

function failing(label: CaseLabel, message: string, inputPath: string | undefined, outName: string): CaseSource {
  return {
    label,
    inputPath,
    outName,
    read: () => {
      throw new Error(message);
    },
  };
}

/**
 * True when text that is not one JSON document starts with a line that is a JSON object on its own: then it is
 * JSON lines. A broken single document stays a single document, so its parse error is reported as today.
 */
export function looksLikeJsonLines(text: string): boolean {
  try {
    JSON.parse(text);
    return false;
  } catch {
    const first = text.split('\n').find((l) => l.trim() !== '');
    if (first === undefined) return false;
    try {
      const v: unknown = JSON.parse(first);
      return typeof v === 'object' && v !== null && !Array.isArray(v);
    } catch {
      return false;
    }
  }
}

/** One case per non-blank line; line numbers count every line, so they match an editor's. */
function linesOf(text: string, file: string | undefined, inputPath: string | undefined): CaseSource[] {
  const out: CaseSource[] = [];
  const lines = text.split('\n');
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i];
    if (line.trim() === '') continue;
    const n = i + 1;
    out.push({
      label: file === undefined ? { line: n } : { file, line: n },
      read: () => line,
      inputPath,
      outName: file === undefined ? `line-${n}` : `${stem(file)}-line-${n}`,
    });
  }
  return out;
}

function folderCases(folder: string): CaseSource[] {
  const names = readdirSync(folder)
    .filter((n) => n.toLowerCase().endsWith('.json') && !n.toLowerCase().endsWith(RESULT_SUFFIX))
    .sort();
  if (names.length === 0) return [failing({ file: folder }, `the folder "${folder}" has no .json files`, undefined, stem(folder))];
  return names.map((n) => fileCase(join(folder, n)));
}

function fileCase(file: string): CaseSource {
  return { label: { file }, read: () => readInput(file), inputPath: resolve(file), outName: stem(file) };
}

function isFolder(path: string): boolean {
  try {
    return statSync(path).isDirectory();
  } catch {
    return false; // a missing file fails when its case is read, with readInput's message
  }
}

/**
 * Expands the inputs. `single` is true for exactly one plain file or one standard-input document: that case
 * prints as it always has (pretty JSON, errors on standard error).
 */
export function expandInputs(inputs: readonly string[], jsonl: boolean, io: InputIo): { sources: CaseSource[]; single: boolean } {
  const sources: CaseSource[] = [];
  let plain = 0;
  for (const input of inputs) {
    if (input === '-') {
      let text: string;
      try {
        text = io.readStdin();
      } catch (e) {
        sources.push(failing({ file: '-' }, `cannot read standard input: ${(e as Error).message}`, undefined, 'stdin'));
        continue;
      }
      if (jsonl || looksLikeJsonLines(text)) sources.push(...linesOf(text, undefined, undefined));
      else {
        sources.push({ label: { file: '-' }, read: () => text, inputPath: undefined, outName: 'stdin' });
        plain++;
      }
    } else if (isFolder(input)) {
      sources.push(...folderCases(input));
    } else if (jsonl || input.toLowerCase().endsWith('.jsonl')) {
      try {
        sources.push(...linesOf(readInput(input), input, resolve(input)));
      } catch (e) {
        sources.push(failing({ file: input }, (e as Error).message, resolve(input), stem(input)));
      }
    } else {
      sources.push(fileCase(input));
      plain++;
    }
  }
  return { sources, single: inputs.length === 1 && plain === 1 };
}
