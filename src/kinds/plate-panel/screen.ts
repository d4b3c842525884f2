/**
 * Resonance screening of a plate panel: every reported mode against the machinery orders (the shared
 * machinery rule, ±margin, src/physics/excitation/machinery.ts) and, across a tank, the wet modes against the
 * tank's lowest sloshing frequencies (the nearest one per mode): near those the "no sloshing" (pressure-release surface) assumption of
 * the wet solve fails and the liquid's waves can drive the plate. Pure; numbers come from the plate result.
 */
import { DEFAULT_LIMITS } from '../../physics/excitation';
import { sig } from '../../physics/excitation/format';
import { machineryCheck, machineryLines } from '../../physics/excitation/machinery';
import type { SourcedLimit } from '../../physics/excitation/types';
import { classifyFrequency, type Verdict, worstIndex } from '../../physics/excitation/verdict';
import type { PlateResult, SloshingMode } from '../../physics/plate';
import type { PlateExcitation } from './excitation';

/** Linear sloshing of a rectangular tank (docs/sources.md §S11). */
export const SLOSHING_SOURCE = 'H.N. Abramson (ed.), The Dynamic Behavior of Liquids in Moving Containers, NASA SP-106, 1966 (linear sloshing, rectangular tank)';

export interface PlateCheck {
  kind: 'machinery' | 'sloshing';
  label: string;
  frequencyBasis: 'wet' | 'dry';
  frequencyHz: number;
  verdict: Verdict;
  /** Signed separation, % of the forcing frequency (> 0 outside the band), as for every check (verdict.ts). */
  marginPercent: number;
  bandHz: { lowHz: number; highHz: number };
  reason: string;
  source: string;
}

export interface PlateModeScreening {
  modeIndex: number;
  /** Wet frequency (dry without liquid). */
  frequencyHz: number;
  checks: PlateCheck[];
  verdict: Verdict;
}

export interface PlateScreening {
  verdict: Verdict;
  /** The mode and check that give the case verdict; null when nothing was checked. */
  driver: { modeIndex: number; checkIndex: number } | null;
  modes: PlateModeScreening[];
  separationMargin: SourcedLimit;
  notes: string[];
}

function sloshingCheck(s: SloshingMode, frequencyHz: number, margin: SourcedLimit): PlateCheck {
  const f = s.frequencyHz;
  const { verdict, marginPercent } = classifyFrequency(frequencyHz, { lowHz: f, highHz: f }, margin.value);
  const side = verdict === 'inside-band' ? 'at' : frequencyHz > f ? 'above' : 'below';
  return {
    kind: 'sloshing',
    label: `sloshing: ${s.description}`,
    frequencyBasis: 'wet',
    frequencyHz,
    verdict,
    marginPercent,
    bandHz: { lowHz: f, highHz: f },
    reason: `wet f_n = ${sig(frequencyHz)} Hz ${side} sloshing ${sig(f)} Hz${verdict === 'inside-band' ? '' : ` by ${sig(Math.abs(marginPercent))} %`}; ±${sig(100 * margin.value)} % required, and near it the wet frequency does not hold`,
    source: SLOSHING_SOURCE,
  };
}

/** Screens the plate's modes; null when there is nothing to screen against (no machine, no sloshing). */
export function screenPlate(result: PlateResult, excitation: PlateExcitation): PlateScreening | null {
  const margin: SourcedLimit = excitation.separationMargin !== undefined ? { value: excitation.separationMargin, source: 'entered by user' } : DEFAULT_LIMITS.separationMargin;
  const lines = excitation.machinery.flatMap((m, i) => machineryLines(m, i));
  const sloshing = result.wet ? (result.sloshing ?? []) : [];
  if (lines.length === 0 && sloshing.length === 0) return null;
  const set = result.wet ?? result.dry;
  const basis = result.wet ? 'wet' : 'dry';
  const alsoDry = result.wet !== null && excitation.machineryAgainst === 'wet-and-dry';
  const modes: PlateModeScreening[] = set.frequenciesHz.map((f, modeIndex) => {
    const checks: PlateCheck[] = [];
    const machine = (line: (typeof lines)[number], hz: number, b: 'wet' | 'dry'): PlateCheck => {
      const c = machineryCheck(line, hz, b, margin);
      return { kind: 'machinery', label: c.label, frequencyBasis: b, frequencyHz: hz, verdict: c.verdict, marginPercent: c.marginPercent ?? 0, bandHz: c.bandHz!, reason: c.reason, source: c.source };
    };
    for (const line of lines) checks.push(machine(line, f, basis));
    const dryF = result.dry.frequenciesHz[modeIndex];
    if (alsoDry && dryF !== undefined) for (const line of lines) checks.push(machine(line, dryF, 'dry'));
    // Only the nearest sloshing frequency per mode: the others are further away, so they cannot decide its verdict.
    const slosh = sloshing.map((sl) => sloshingCheck(sl, f, margin));
    const nearest = worstIndex(slosh);
    if (nearest >= 0) checks.push(slosh[nearest]);
    const w = worstIndex(checks);
    return { modeIndex, frequencyHz: f, checks, verdict: w < 0 ? 'clear' : checks[w].verdict };
  });
  const perMode = modes.map((m) => {
    const w = worstIndex(m.checks);
    return w < 0 ? { verdict: 'clear' as Verdict, marginPercent: null } : m.checks[w];
  });
  const worstMode = worstIndex(perMode);
  const checkIndex = worstMode < 0 ? -1 : worstIndex(modes[worstMode].checks);
  const notes: string[] = [];
  if (sloshing.length > 0) notes.push(`The tank's lowest sloshing frequencies are screened as excitations: near them the wet frequencies, which assume no sloshing, do not hold (${SLOSHING_SOURCE}).`);
  if (lines.length === 0) notes.push('No machine entered: machinery orders not screened.');
  return {
    verdict: checkIndex < 0 ? 'clear' : modes[worstMode].checks[checkIndex].verdict,
    driver: checkIndex < 0 ? null : { modeIndex: worstMode, checkIndex },
    modes,
    separationMargin: margin,
    notes,
  };
}
