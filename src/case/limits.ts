/**
 * Size limits of a case. They keep a huge or hostile link, file or record from hurting the app
 * (memory, layout, a link that no messenger will carry), and are generous for real cases:
 * a typical pile has about a dozen inputs of under 20 characters each.
 */
export const CASE_LIMITS = {
  /** Characters in `name`. */
  nameChars: 200,
  /** Characters in `tag`. */
  tagChars: 100,
  /** Characters in `note`. */
  noteChars: 4000,
  /** Fields in `inputs`, and separately in `excitation`. */
  fields: 64,
  /** Characters in a field name. */
  fieldNameChars: 64,
  /** Characters in a field value as entered (e.g. "610 mm", or a list such as "30 ft, 62 ft, 94 ft, 126 ft"). */
  fieldValueChars: 200,
  /** Characters in `appVersion`. */
  appVersionChars: 32,
  /** Largest plausible frequency, Hz, for `keyResult.lowestWetFrequencyHz` (sensor stems reach a few kHz at most). */
  frequencyHzMax: 1e6,
} as const;

/**
 * Cuts text to at most `max` UTF-16 units without splitting a surrogate pair (an emoji cut in half is a
 * broken character the parser refuses). Used wherever a suffix is added to a name near its limit.
 */
export function cutText(s: string, max: number): string {
  if (s.length <= max) return s;
  const code = s.charCodeAt(max - 1);
  return s.slice(0, code >= 0xd800 && code <= 0xdbff ? max - 1 : max);
}
