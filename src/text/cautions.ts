/**
 * The cautions, in one place: shown on every screen, in every result, report and command output.
 * Plain words for a surveyor; wording is ours.
 */

/** The short line shown on every screen. */
export const CAUTION_LINE =
  'Screening estimate only. Have results checked by a qualified engineer under your local codes and licensed practice.';

/** The full cautions, one paragraph each, in the order they are shown. */
export const CAUTIONS: readonly { title: string; text: string }[] = [
  {
    title: 'A screening estimate, not a design approval',
    text:
      'Wetmode gives a quick estimate of natural frequencies and resonance margins to help decide whether a member needs a closer look. ' +
      'It does not approve, certify or rate any structure, and a "clear" verdict is not permission to operate.',
  },
  {
    title: 'Verify with a qualified engineer',
    text:
      'Have any result that matters checked by a qualified, licensed engineer under the codes and licensed practice that apply where the member is. ' +
      'Their judgement and your local rules take precedence over anything shown here.',
  },
  {
    title: 'Uncertain inputs change the answer',
    text:
      'Fixity at the seabed or support, soil stiffness, scour, marine growth, corrosion, coating, contents and liquid level are rarely known well, ' +
      'and each can move a natural frequency by tens of per cent. Try the likely range of each and look at the spread, not one number.',
  },
  {
    title: 'The model has limits',
    text:
      'Frequencies come from a beam model with added mass from two-dimensional potential flow: inviscid liquid at rest, small motions, ' +
      'and a free surface treated as pressure-release (valid well above sloshing frequencies). Short, stubby members, large motions, ' +
      'strong currents and cracked or damaged members fall outside it.',
  },
  {
    title: 'Site safety comes first',
    text:
      'Never approach, climb, enter or lean over a structure, tank or pipe to collect data without following the site\'s safety procedures, ' +
      'permits and supervision. Take dimensions from drawings where you can.',
  },
];

/** What the model behind a result is: the beam engine (piles, risers, strips, stems) or the plate engine. */
export type CautionModel = 'beam' | 'plate';

/** "The model has limits" for a plate panel, in place of the beam wording. */
export const PLATE_MODEL_LIMITS: { title: string; text: string } = {
  title: 'The model has limits',
  text:
    'Frequencies come from a thin-plate model with ideal edges (welded = clamped, bolted = simply supported) and added mass from ' +
    'three-dimensional potential flow: inviscid, incompressible liquid at rest, small motions, a rigid wall or tank around the plate, and a ' +
    'free surface treated as pressure-release (valid well above the tank\'s sloshing frequencies, which are listed). Real welds are neither ' +
    'fully clamped nor fully free, stiffeners and openings are not modelled, and thick, dented or cracked plates fall outside it.',
};

/** The cautions for a result of this model: the shared ones, with the model's own limits. */
export function cautionsFor(model: CautionModel = 'beam'): readonly { title: string; text: string }[] {
  return model === 'plate' ? CAUTIONS.map((c) => (c.title === PLATE_MODEL_LIMITS.title ? PLATE_MODEL_LIMITS : c)) : CAUTIONS;
}

/** The cautions as plain lines, for command-line output and files. */
export function cautionLines(model: CautionModel = 'beam'): string[] {
  return cautionsFor(model).map((c) => `${c.title}: ${c.text}`);
}
