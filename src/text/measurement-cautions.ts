/**
 * Cautions that go with a measured frequency (the spectrum command and the measurement screen), shown after the
 * general cautions of `cautions.ts`. Plain words for a surveyor; wording is ours.
 */
export const MEASUREMENT_CAUTIONS: readonly { title: string; text: string }[] = [
  {
    title: 'Measure only under the site\'s safety procedures',
    text:
      'Tapping or pushing a member, or fixing a sensor or a tablet to it, is work on a structure: do it only under the site\'s safety procedures, ' +
      'permits and supervision, never on a pressurised, live or moving part, and never by leaning over an edge or into a tank.',
  },
  {
    title: 'A tablet is not a calibrated instrument',
    text:
      'A tablet\'s motion sensor is not calibrated and its timing wanders. Its rate (often about 60 samples a second) limits the highest frequency it can ' +
      'see to half that rate; a mode above it is missed or shows at a false lower frequency. A tablet held by hand records the hand too: press it firmly ' +
      'against the member, and confirm which peak is which mode before relying on it.',
  },
];

/** The measurement cautions as plain lines, for command-line output and files. */
export function measurementCautionLines(): string[] {
  return MEASUREMENT_CAUTIONS.map((c) => `${c.title}: ${c.text}`);
}
