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
