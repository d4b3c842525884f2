/**
 * The summary at the top of the Results screen and the Report, as plain sentences built from the result:
 * the case verdict with the mode and excitation that drive it and its margin, the lowest dry and wet
 * frequencies, and the flow speed at which lock-in would begin. Nothing here is computed anew except
 * picking and wording; every number comes from the member result or the screening result.
 */
import type { MemberKind } from '../../case';
import { kindOf } from '../../kinds/registry';
import type { CheckResult, ScreeningResult } from '../../physics/excitation/results';
import { VERDICT_WORDS, type Verdict } from '../../physics/excitation/verdict';
import type { UnitSystem } from '../../units';
import type { BeamSolved, CaseAnswer } from '../../app/solve-case';
import { formatHz, formatSig } from '../format/numbers';
import { displayUnits, marginText, pct, qty, zText } from './display-units';

type Failed = Extract<CaseAnswer, { ok: false }>;
type Solved = BeamSolved;

/** What the flow past the member is called for each kind, in the surveyor's words. */
export function flowWord(kind: MemberKind): string {
  return kindOf(kind).flowWord;
}

/** A failed solve in plain words: a short title and what to do. The solver's own message is kept at the end. */
export function failureText(answer: Failed): { title: string; text: string } {
  switch (answer.reason) {
    case 'buckles':
      return {
        title: 'The member buckles',
        text: `This member buckles under the given compression, so it has no natural frequencies: reduce the compression (top load or weight) or add supports. Solver: ${answer.message}.`,
      };
    case 'mechanism':
      return {
        title: 'The member is not held',
        text: `This member can move as a rigid body: add a support or fix an end. Solver: ${answer.message}.`,
      };
    case 'not-converged':
      return { title: 'The frequencies did not converge', text: `Check the inputs for extreme values. Solver: ${answer.message}.` };
    case 'section-solver-failed':
      return {
        title: 'The added-mass section solver failed',
        text: `Check the confinement inputs (gap to a wall, caisson or pipe size). Solver: ${answer.message}.`,
      };
    case 'invalid-input':
      return { title: 'The inputs could not be used', text: answer.message };
    case 'basis-ill-conditioned':
    case 'added-mass-not-positive':
      return { title: 'The plate solver failed', text: `Check the plate’s sizes and the liquid inputs for extreme values. Solver: ${answer.message}.` };
  }
}

/** The check that drives the case verdict, with its mode number (1-based); null when nothing was checked. */
export function drivingCheck(s: ScreeningResult): { mode: number; check: CheckResult } | null {
  const d = s.driver;
  if (!d) return null;
  const check = s.modes[d.modeIndex]?.checks[d.checkIndex];
  return check ? { mode: d.modeIndex + 1, check } : null;
}

/** "54.0 % inside the band", "38.1 % outside the band (±20 % required)", "cannot reach this mode". */
export function marginPhrase(check: Pick<CheckResult, 'verdict' | 'marginPercent'>, separation: number): string {
  const m = check.marginPercent;
  if (m === null) return 'this excitation cannot reach the mode';
  const required = `±${pct(separation)} required`;
  if (check.verdict === 'inside-band') return m === 0 ? `on the edge of the band (${required})` : `${formatSig(-m, 3)} % inside the band`;
  return `margin ${marginText(m)} outside the band (${required})`;
}

/** The sentence about the speed at which a shedding check begins; null when the check has none. */
export function onsetSentence(kind: MemberKind, system: UnitSystem, s: ScreeningResult, mode: number, check: CheckResult, speedUnit?: string): string | null {
  const u = check.criticalSpeedMPerS;
  const point = s.modes[mode - 1]?.shedding ?? null;
  if (u === null || !Number.isFinite(u) || point === null) return null;
  const units = { ...displayUnits(system), ...(speedUnit ? { speed: speedUnit } : {}) };
  const word = flowWord(kind);
  const at = `at ${zText(point.atZM, units)}, where mode ${mode} moves most under the liquid`;
  const now = `the ${word} there is ${qty(point.flowSpeedMPerS, units.speed)}`;
  if (check.kind === 'in-line-viv' || check.kind === 'cross-flow-viv') {
    const verb = check.verdict === 'inside-band' ? 'begins' : 'would begin';
    return `${capital(check.label)} lock-in ${verb} at a ${word} of ${qty(u, units.speed)} ${at}; ${now}.`;
  }
  if (check.kind === 'stem-frequency-ratio') {
    return `The ${check.label} limit is reached at a ${word} of ${qty(u, units.speed)} ${at}; ${now}.`;
  }
  return null;
}

/** Among all checks with an onset speed, the one with the lowest (the first of equals); null if none. */
export function lowestOnset(s: ScreeningResult): { mode: number; check: CheckResult } | null {
  let best: { mode: number; check: CheckResult } | null = null;
  for (const m of s.modes) {
    for (const c of m.checks) {
      const u = c.criticalSpeedMPerS;
      if (u === null || !Number.isFinite(u)) continue;
      if (best === null || u < best.check.criticalSpeedMPerS!) best = { mode: m.modeIndex + 1, check: c };
    }
  }
  return best;
}

function capital(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

export interface Summary {
  /** Case verdict; null when no screening ran (frequencies only). */
  verdict: Verdict | null;
  /** "Mode 1 against in-line VIV (wet 0.606 Hz): inside band, 54.0 % inside the band." */
  verdictLine: string | null;
  /** Lock-in onset of the driving check, or the lowest onset of any check, in words. */
  onsetLine: string | null;
  /** How severe lock-in of the driving mode would be: Scruton number and an indicative A/D; null when not shedding. */
  severityLine: string | null;
  /** "Lowest dry frequency 0.638 Hz; lowest wet frequency 0.606 Hz (wet/dry 0.950)." */
  frequencyLine: string;
  /** Why there is no verdict, or why the wet frequencies are missing. */
  notes: string[];
}

export function summarise(kind: MemberKind, system: UnitSystem, answer: Solved, speedUnit?: string): Summary {
  const { member, screening } = answer;
  const dry = member.dry.frequenciesHz[0];
  const wet = member.wet?.frequenciesHz[0];
  const ratio = member.wetToDryRatio?.[0];
  const frequencyLine =
    wet === undefined
      ? `Lowest dry frequency ${formatHz(dry)}; no wet frequency.`
      : `Lowest dry frequency ${formatHz(dry)}; lowest wet frequency ${formatHz(wet)}${ratio !== undefined ? ` (wet/dry ${formatSig(ratio, 3)})` : ''}.`;
  const notes: string[] = [];
  if (member.wetOmittedBecause) notes.push(`No wet frequencies: ${member.wetOmittedBecause}.`);
  if (!screening) {
    notes.push(
      answer.screeningError
        ? `Resonance screening could not run: ${answer.screeningError}. The frequencies are still good.`
        : 'Frequencies only: no resonance inputs yet (current or flow speed, waves, machine). Enter them on the Member screen to get a verdict.',
    );
    return { verdict: null, verdictLine: null, onsetLine: null, severityLine: null, frequencyLine, notes };
  }
  const driving = drivingCheck(screening);
  if (!driving) {
    notes.push('Nothing was screened: no mode had a check.');
    return { verdict: screening.verdict, verdictLine: null, onsetLine: null, severityLine: null, frequencyLine, notes };
  }
  const { mode, check } = driving;
  const basis = `${check.frequencyBasis} ${formatHz(check.frequencyHz)}`;
  const verdictLine = `Mode ${mode} against ${check.label} (${basis}): ${VERDICT_WORDS[check.verdict]}, ${marginPhrase(check, screening.limits.separationMargin.value)}.`;
  let onsetLine = onsetSentence(kind, system, screening, mode, check, speedUnit);
  if (onsetLine === null) {
    const low = lowestOnset(screening);
    const sentence = low && onsetSentence(kind, system, screening, low.mode, low.check, speedUnit);
    if (low && sentence) onsetLine = `Lowest onset of any shedding check (mode ${low.mode}): ${sentence}`;
  }
  return { verdict: screening.verdict, verdictLine, onsetLine, severityLine: severitySentence(screening), frequencyLine, notes };
}

/** "Indicative cross-flow amplitude at lock-in, mode 1: A/D ≈ 0.52 (Scruton number K_S = 0.101, …)". */
export function severitySentence(s: ScreeningResult): string | null {
  const v = s.severity;
  if (!v) return null;
  const when = s.verdict === 'inside-band' ? 'at lock-in' : 'if it locked in';
  return (
    `Indicative cross-flow amplitude ${when}, mode ${v.modeIndex + 1}: A/D ≈ ${formatSig(v.amplitudeRatio, 2)} ` +
    `(Scruton number K_S = ${formatSig(v.stabilityParameter, 3)} with ζ = ${formatSig(v.dampingRatio * 100, 2)} % structural damping, mode factor γ = ${formatSig(v.modeFactor, 3)}, St = ${formatSig(v.strouhal, 2)}; ` +
    'R.D. Blevins, Flow-Induced Vibration, 1990, §3.4). Indicative only, not a response prediction.'
  );
}
