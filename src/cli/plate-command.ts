/**
 * `wetmode plate FILE`: reads a plate panel (JSON, SI), solves its dry and wet modes, and returns one pretty
 * JSON object. Bad input throws an Error whose message names the field; a numerical failure is printed as a
 * result with `ok: false`. Mode shapes are left out of the printout (they are in the solver's result).
 */
import { parsePlateInput, solvePlate } from '../physics/plate';
import { cautionLines } from '../text/cautions';
import { parseJsonText, toJson } from './json-out';

export function runPlateCommand(inputText: string): string {
  const input = parsePlateInput(parseJsonText(inputText, 'plate'));
  const outcome = solvePlate(input);
  const cautions = cautionLines('plate');
  if (!outcome.ok) return toJson({ ok: false, reason: outcome.reason, message: outcome.message, cautions });
  const r = outcome.result;
  return toJson({
    ok: true,
    tool: 'wetmode plate',
    units: 'SI: m, kg, s, Pa, Hz',
    dry: { frequenciesHz: r.dry.frequenciesHz },
    wet: r.wet ? { frequenciesHz: r.wet.frequenciesHz, wetToDryRatio: r.wetToDryRatio } : null,
    method: r.method,
    validity: r.validity,
    errorEstimate: {
      basis: r.errorEstimate.basis,
      dryRelative: r.errorEstimate.dryRelative,
      wetRelative: r.wet ? r.errorEstimate.wetRelative : null,
    },
    ...(r.sloshing
      ? {
          sloshingHz: r.sloshing.map((s) => s.frequencyHz),
          sloshing: r.sloshing,
          sloshingNote: 'Lowest sloshing frequencies of the tank’s liquid (classical linear theory, H.N. Abramson (ed.), NASA SP-106, 1966): excitations to keep clear of; near them the wet frequencies above do not hold.',
        }
      : {}),
    notes: r.notes,
    cautions,
  });
}
