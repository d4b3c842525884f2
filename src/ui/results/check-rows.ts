/**
 * The accessible text twin of the frequency chart: one row per mode and excitation check, the excitation
 * bands exactly as drawn, and the shedding numbers per mode. Sources are numbered once and listed under
 * the table, so long source texts do not repeat in every row.
 */
import type { MemberResult } from '../../physics/beam/result';
import type { CheckResult, ScreeningResult } from '../../physics/excitation/results';
import type { Verdict } from '../../physics/excitation/verdict';
import { formatHz, formatSig } from '../format/numbers';
import type { ChartBand } from './chart-bands';
import { type DisplayUnits, marginText, num, pct, plain, qty, sci, Z_DIGITS } from './display-units';
import type { ChartMode } from './FrequencyChart';

/** Numbered list of distinct source texts, in order of first use. */
export class SourceList {
  readonly items: string[] = [];
  /** 1-based number of a source, adding it if new. */
  number(source: string): number {
    const i = this.items.indexOf(source);
    if (i >= 0) return i + 1;
    this.items.push(source);
    return this.items.length;
  }
}

/** "0.292–1.32 Hz", a machinery line "20.0 Hz", the stem's one-sided band "below 36.4 Hz"; null → "—". */
export function bandText(band: CheckResult['bandHz']): string {
  if (!band) return '—';
  if (band.lowHz === band.highHz) return formatHz(band.lowHz);
  if (band.lowHz === 0) return `below ${formatHz(band.highHz)}`;
  return `${formatSig(band.lowHz, 3)}–${formatHz(band.highHz)}`;
}

export interface CheckRow {
  mode: number;
  label: string;
  /** "wet 0.606 Hz". */
  compared: string;
  verdict: Verdict;
  /** Signed margin in per cent (null where the check has none), for picking the governing row. */
  marginPercent: number | null;
  margin: string;
  band: string;
  /** Flow speed at which the check begins, or the shaft speed that hits the mode exactly; "—" if none. */
  critical: string;
  reason: string;
  source: number;
}

export function checkRows(s: ScreeningResult, units: DisplayUnits, sources: SourceList): CheckRow[] {
  const rows: CheckRow[] = [];
  for (const m of s.modes) {
    for (const c of m.checks) {
      const u = c.criticalSpeedMPerS;
      const critical =
        u !== null && Number.isFinite(u)
          ? qty(u, units.speed)
          : c.resonantShaftHz !== undefined
            ? `${plain(c.resonantShaftHz * 60, "", 3)} rpm shaft`
            : '—';
      rows.push({
        mode: m.modeIndex + 1,
        label: c.label,
        compared: `${c.frequencyBasis} ${formatHz(c.frequencyHz)}`,
        verdict: c.verdict,
        marginPercent: c.marginPercent,
        margin: marginText(c.marginPercent),
        band: bandText(c.bandHz),
        critical,
        reason: c.reason,
        source: sources.number(c.source),
      });
    }
  }
  return rows;
}

const SEVERITY: Readonly<Record<Verdict, number>> = { 'inside-band': 2, close: 1, clear: 0 };

/**
 * The governing row of each excitation: the worst verdict over the modes, and among equals the smallest
 * margin (then the lowest mode). For the printed record, where every row of every mode would not fit.
 */
export function governingRows(rows: readonly CheckRow[]): CheckRow[] {
  const best = new Map<string, CheckRow>();
  const margin = (r: CheckRow): number => (r.marginPercent === null ? Infinity : Math.abs(r.marginPercent));
  for (const r of rows) {
    const b = best.get(r.label);
    if (!b || SEVERITY[r.verdict] > SEVERITY[b.verdict] || (SEVERITY[r.verdict] === SEVERITY[b.verdict] && margin(r) < margin(b))) best.set(r.label, r);
  }
  return [...best.values()];
}

/** Bands as drawn on the chart (union over modes per excitation), as text. */
export function bandRows(bands: readonly ChartBand[]): { label: string; band: string }[] {
  return bands.map((b) => ({ label: b.label, band: bandText({ lowHz: b.lowHz, highHz: b.highHz }) }));
}

/** Mode lines of the chart from the member result: the same numbers as the modes table. Dry only: dry drawn solid. */
export function chartModes(member: MemberResult): ChartMode[] {
  return member.dry.modes.map((d, i) => {
    const w = member.wet?.modes[i];
    return w ? { index: d.mode, dryHz: d.frequencyHz, wetHz: w.frequencyHz } : { index: d.mode, wetHz: d.frequencyHz };
  });
}

export interface SheddingRow {
  mode: number;
  /** Null when the mode has no submerged length; `why` then says so. */
  cells: {
    at: string;
    speed: string;
    size: string;
    reynolds: string;
    strouhal: string;
    sheddingHz: string;
    reducedVelocity: string;
    stability: string;
    effectiveMass: string;
  } | null;
  why: string | null;
  /** Source number of the Strouhal value. */
  source: number | null;
}

export function sheddingRows(s: ScreeningResult, units: DisplayUnits, sources: SourceList): SheddingRow[] {
  return s.modes.map((m) => {
    const p = m.shedding;
    if (!p) return { mode: m.modeIndex + 1, cells: null, why: m.notSubmergedReason ?? 'not submerged', source: null };
    const st = p.strouhal;
    const stBand = st.low === st.high ? '' : ` (${num(st.low)}–${num(st.high)})`;
    return {
      mode: m.modeIndex + 1,
      cells: {
        at: plain(p.atZM, units.length, Z_DIGITS),
        speed: qty(p.flowSpeedMPerS, units.speed),
        size: qty(p.characteristicSizeM, units.size),
        reynolds: plain(p.reynoldsNumber, '', 3),
        strouhal: `${num(st.value)}${stBand}, ${st.regime}`,
        sheddingHz: formatHz(p.sheddingFrequencyHz),
        reducedVelocity: num(p.reducedVelocity),
        stability: num(p.stabilityParameter),
        effectiveMass: qty(p.effectiveMassKgPerM, units.massPerLength),
      },
      why: null,
      source: sources.number(st.source),
    };
  });
}

/** A limit as its source states it, without trailing zeros: 4.5, 16, 1.8. */
function lim(x: number): string {
  return plain(x, '');
}

/** The limits, damping and liquid used, each with its source. */
export function limitRows(s: ScreeningResult, units: DisplayUnits): { name: string; value: string; source: string }[] {
  const L = s.limits;
  const rows = [
    { name: 'In-line VIV range', value: `${lim(L.inLineReducedVelocity.min)} ≤ V_R ≤ ${lim(L.inLineReducedVelocity.max)}`, source: L.inLineReducedVelocity.source },
    { name: 'In-line VIV only when', value: `K_S ≤ ${lim(L.inLineStabilityMax.value)}`, source: L.inLineStabilityMax.source },
    { name: 'Cross-flow VIV range', value: `${lim(L.crossFlowReducedVelocity.min)} ≤ V_R ≤ ${lim(L.crossFlowReducedVelocity.max)}`, source: L.crossFlowReducedVelocity.source },
  ];
  if (s.modes.some((m) => m.checks.some((c) => c.kind === 'stem-frequency-ratio'))) {
    rows.push({ name: 'Stem screen', value: `f_s / f_n ≤ ${lim(L.stemFrequencyRatioMax.value)}`, source: L.stemFrequencyRatioMax.source });
  }
  rows.push(
    { name: 'Frequency separation', value: `±${pct(L.separationMargin.value)}`, source: L.separationMargin.source },
    { name: 'Damping ratio ζ', value: `${pct(s.damping.ratio)} of critical`, source: s.damping.source },
    {
      name: 'Liquid',
      value: `ρ = ${qty(s.liquid.densityKgPerM3, units.density, 4)}, ν = ${sci(s.liquid.kinematicViscosityM2PerS, units.viscosity)}`,
      source: s.liquid.source,
    },
  );
  return rows;
}
