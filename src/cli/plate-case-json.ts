/**
 * `wetmode case` output for a plate-panel case: the same figures as `wetmode plate` (frequencies, method,
 * validity, error estimate, sloshing) plus the resonance checks against machinery and sloshing.
 */
import type { PlateSolved } from '../app/solve-case';
import type { PlateBuild } from '../kinds/common/types';
import { toJson } from './json-out';

export function plateCaseJson(head: object, a: PlateSolved, build: PlateBuild, excitationErrors: Record<string, string>, cautions: string[]): string {
  const r = a.plate;
  const s = a.screening;
  const errs = Object.entries(excitationErrors).map(([k, m]) => `${k}: ${m}`).join('; ');
  return toJson({
    ok: true,
    ...head,
    units: 'SI: m, kg, s, Pa, Hz',
    dry: { frequenciesHz: r.dry.frequenciesHz },
    wet: r.wet ? { frequenciesHz: r.wet.frequenciesHz, wetToDryRatio: r.wetToDryRatio } : null,
    method: r.method,
    validity: r.validity,
    errorEstimate: { basis: r.errorEstimate.basis, dryRelative: r.errorEstimate.dryRelative, wetRelative: r.wet ? r.errorEstimate.wetRelative : null },
    sloshing: r.sloshing,
    resonance: s
      ? {
          verdict: s.verdict,
          checks: s.modes.flatMap((m) => m.checks.map((k) => ({ mode: m.modeIndex + 1, excitation: k.label, frequencyBasis: k.frequencyBasis, verdict: k.verdict, marginPercent: k.marginPercent, source: k.source }))),
          separationMargin: s.separationMargin,
          notes: s.notes,
        }
      : null,
    resonanceNotRunBecause: s ? null : (a.screeningError ?? (errs || 'no machine and no sloshing to screen')),
    plate: build.plate,
    modelNotes: [...build.notes, ...r.notes],
    cautions,
  });
}
