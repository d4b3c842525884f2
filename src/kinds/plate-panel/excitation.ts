/**
 * The plate panel's resonance inputs: a nearby machine (the shared machinery fields), which frequencies it is
 * checked against and the separation margin. There is no flow input: vortex shedding off a plate held on its
 * edges is not screened here. The tank's sloshing frequencies come from the solve itself (screen.ts).
 */
import { readMachinery } from '../../forms/excitation';
import { makeReader, readFields } from '../../forms/read';
import { MACHINE, MARGIN_AND_DAMPING } from '../../forms/resonance-fields';
import type { FieldDef, FieldErrors, FieldValues } from '../../forms/types';
import { DEFAULT_LIMITS } from '../../physics/excitation';
import type { Machine } from '../../physics/excitation/types';
import type { UnitSystem } from '../../units';

export const PLATE_RESONANCE_FIELDS: readonly FieldDef[] = [
  ...MACHINE,
  ...MARGIN_AND_DAMPING.filter((f) => f.key === 'machineryAgainst' || f.key === 'separationMargin'),
];

/** What the plate screening needs from the case (SI; shaft speeds in rpm as the machinery rules take them). */
export interface PlateExcitation {
  machinery: Machine[];
  machineryAgainst: 'wet' | 'wet-and-dry';
  /** Separation margin as a fraction; absent = the default with its source. */
  separationMargin?: number;
}

export type PlateExcitationRead = { ok: true; excitation: PlateExcitation } | { ok: false; errors: FieldErrors };

/** Reads the plate's resonance inputs; messages by field key, in the user's units. */
export function readPlateExcitation(values: FieldValues, system: UnitSystem): PlateExcitationRead {
  const fields = PLATE_RESONANCE_FIELDS;
  const { read, errors } = readFields(fields, values, system);
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  const r = makeReader(fields, read, system);
  const errs: FieldErrors = {};
  const machinery = readMachinery(r, errs);
  if (Object.keys(errs).length > 0) return { ok: false, errors: errs };
  const margin = r.num('separationMargin');
  return {
    ok: true,
    excitation: {
      machinery,
      machineryAgainst: r.choice('machineryAgainst') === 'wet-and-dry' ? 'wet-and-dry' : 'wet',
      ...(margin !== DEFAULT_LIMITS.separationMargin.value ? { separationMargin: margin } : {}),
    },
  };
}
