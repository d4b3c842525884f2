/** Pretty JSON for the command line, numbers to 6 significant figures (inputs are rarely known better than 3). */
const SIGNIFICANT = 6;

function rounded(_key: string, value: unknown): unknown {
  if (typeof value === 'number' && Number.isFinite(value) && value !== 0 && !Number.isInteger(value)) {
    return Number(value.toPrecision(SIGNIFICANT));
  }
  if (value instanceof Float64Array) return Array.from(value);
  return value;
}

export function toJson(value: unknown): string {
  return JSON.stringify(value, rounded, 2);
}

/** JSON.parse with a message that says which file kind was expected. */
export function parseJsonText(text: string, what: string): unknown {
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new Error(`the ${what} file is not valid JSON (${e instanceof Error ? e.message : String(e)})`);
  }
}
