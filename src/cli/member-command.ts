/**
 * `wetmode member FILE`: reads a member description (JSON), solves its dry and wet modes, and returns
 * one pretty JSON object. Bad input (invalid JSON, invalid fields, a mechanism) throws an Error whose
 * message names the field; a member that buckles is a result, printed with `ok: false`.
 */
import { MECHANISM_MESSAGE, parseMemberModel, solveMember } from '../physics/beam';
import { cautionLines } from '../text/cautions';
import { bandJson, splitRanges } from './band-output';
import { parseJsonText, toJson } from './json-out';

export function runMemberCommand(inputText: string): string {
  const { member, ranges } = splitRanges(parseJsonText(inputText, 'member'));
  const model = parseMemberModel(member);
  const outcome = solveMember(model);
  const cautions = cautionLines();
  if (!outcome.ok) {
    if (outcome.reason === 'mechanism') throw new Error(MECHANISM_MESSAGE);
    return toJson({ ok: false, reason: outcome.reason, message: outcome.message, cautions });
  }
  const r = outcome.result;
  const out = {
    ok: true,
    units: 'SI: m, kg, s, N, Hz',
    modesRequested: r.modesRequested,
    beamTheory: r.beamTheory,
    dry: r.dry,
    wet: r.wet,
    wetOmittedBecause: r.wetOmittedBecause,
    wetToDryRatio: r.wetToDryRatio,
    zones: r.zones,
    tension: r.tension,
    addedMass: r.addedMass,
    mesh: r.mesh,
    warnings: r.warnings,
    ...(ranges === undefined ? {} : { band: bandJson(model, ranges, r) }),
    cautions,
  };
  return toJson(out);
}
