/**
 * `wetmode case FILE`: a saved or exported case file (our `.wetmode.json`), read through the same forms as
 * the app (units as typed), solved dry and wet, screened for resonance. Prints one JSON object: the case
 * name and tag, the member model used, frequencies, the verdict with every check, the band over the ranges
 * entered in the app (null when none is on) and the cautions.
 */
import { caseFromFileText } from '../share';
import { readCase, requestOf, warningLines } from '../app/read-case';
import { solveCase } from '../app/solve-case';
import { cautionLines } from '../text/cautions';
import { toJson } from './json-out';
import { plateCaseJson } from './plate-case-json';
import { caseBandJson } from './case-band';

function fieldMessages(errors: Record<string, string>): string {
  return Object.entries(errors)
    .map(([k, m]) => `${k}: ${m}`)
    .join('; ');
}

export function runCaseCommand(inputText: string): string {
  const parsed = caseFromFileText(inputText);
  if (!parsed.ok) throw new Error(parsed.message);
  const c = parsed.value;
  const reading = readCase(c);
  if (!reading.ok) throw new Error(`the case "${c.name || c.id}" has inputs that do not read: ${fieldMessages(reading.errors)}`);
  const answer = solveCase(requestOf(reading), () => 0);
  const cautions = cautionLines(reading.engine);
  const head = { case: { id: c.id, name: c.name, tag: c.tag, kind: c.kind, unitSystem: c.unitSystem, updatedAt: c.updatedAt } };
  if (!answer.ok) return toJson({ ok: false, ...head, reason: answer.reason, message: answer.message, cautions });
  if (answer.engine === 'plate' || reading.engine === 'plate') {
    if (answer.engine !== 'plate' || reading.engine !== 'plate') throw new Error('the plate case was answered by another engine');
    return plateCaseJson(head, answer, reading.build, reading.excitationErrors, cautions);
  }
  const m = answer.member;
  return toJson({
    ok: true,
    ...head,
    units: 'SI: m, kg, s, N, Hz',
    dry: { frequenciesHz: m.dry.frequenciesHz, periodsS: m.dry.periodsS },
    wet: m.wet ? { frequenciesHz: m.wet.frequenciesHz, periodsS: m.wet.periodsS } : null,
    wetToDryRatio: m.wetToDryRatio,
    zones: m.zones,
    resonance: answer.screening
      ? {
          verdict: answer.screening.verdict,
          driver: answer.screening.driver,
          // Indicative only (Blevins, Flow-Induced Vibration, 1990, §3.4): the Scruton number and A/D of the driving mode.
          severity: answer.screening.severity,
          checks: answer.screening.modes.flatMap((mode) =>
            mode.checks.map((k) => ({ mode: mode.modeIndex + 1, excitation: k.label, verdict: k.verdict, marginPercent: k.marginPercent, criticalSpeedMPerS: k.criticalSpeedMPerS, source: k.source })),
          ),
          limits: answer.screening.limits,
          damping: answer.screening.damping,
          notes: answer.screening.notes,
        }
      : null,
    resonanceNotRunBecause: answer.screening ? null : (answer.screeningError ?? (fieldMessages(reading.excitationErrors) || 'no resonance inputs')),
    band: caseBandJson(c),
    // Measured frequencies and their notes as kept with the case (a motion record stays on the device that made it).
    measurements: c.measurements ?? [],
    model: reading.build.model,
    modelNotes: reading.build.notes,
    warnings: m.warnings,
    inputWarnings: warningLines(reading.warnings),
    mesh: m.mesh,
    cautions,
  });
}
