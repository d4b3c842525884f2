import { readFileSync } from 'node:fs';

/** Reads a case file's text, or standard input when the name is "-". Errors say which file and why. */
export function readInput(name: string): string {
  try {
    return readFileSync(name === '-' ? 0 : name, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    const why = code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'it is a folder, expected a JSON file' : String((e as Error).message);
    throw new Error(`cannot read ${name === '-' ? 'standard input' : `"${name}"`}: ${why}`);
  }
}
