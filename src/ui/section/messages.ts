/**
 * The solver's input messages name fields as the JSON does (`bodies[1].pointsM`, `boundaries[0]`, counting
 * from 0). In the editor they become the words on the screen ("the outline of body 2", "the wall below",
 * counting from 1), and each is placed beside the body or boundary it is about.
 */

const FIELD_WORDS: Record<string, string> = {
  diameterM: 'diameter',
  widthM: 'width',
  heightM: 'height',
  thicknessM: 'thickness',
  cornerRadiusM: 'corner radius',
  centerM: 'centre',
  angleDeg: 'angle',
};

/** Rewrites a solver message in the editor's words. `boundaryNames[k]` names boundaries[k] ("the wall below"). */
export function humanise(message: string, boundaryNames: readonly string[]): string {
  let t = message
    .replace(/bodies\[(\d+)\]\.pointsM/g, (_, k: string) => `the outline of body ${Number(k) + 1}`)
    .replace(/bodies\[(\d+)\]\.(\w+)/g, (_, k: string, f: string) => `the ${FIELD_WORDS[f] ?? f} of body ${Number(k) + 1}`)
    .replace(/bodies\[(\d+)\]/g, (_, k: string) => `body ${Number(k) + 1}`)
    .replace(/(?:the enclosure )?boundaries\[(\d+)\](?:\.\w+)?/g, (_, k: string) => boundaryNames[Number(k)] ?? `boundary ${Number(k) + 1}`)
    // Points and edges counted from 1, as the user typed them.
    .replace(/\bedge (\d+)/g, (_, k: string) => `edge ${Number(k) + 1}`)
    .replace(/\bpoints (\d+)(–| and )(\d+)/g, (_, a: string, sep: string, b: string) => `points ${Number(a) + 1}${sep}${Number(b) + 1}`);
  t = t.charAt(0).toUpperCase() + t.slice(1);
  return t;
}

/** Where a solver message belongs: the first body it names, else the first boundary, else nowhere in particular. */
export function locate(message: string): { body: number } | { boundary: number } | null {
  const b = /bodies\[(\d+)\]/.exec(message);
  if (b) return { body: Number(b[1]) };
  const s = /boundaries\[(\d+)\]/.exec(message);
  if (s) return { boundary: Number(s[1]) };
  return null;
}
