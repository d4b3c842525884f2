/**
 * Rows of the modes table (1…N): dry and wet frequency, wet/dry ratio, period, and the share of the
 * mode's kinetic energy carried by the liquid. Numbers as in the member result; text with three significant figures.
 */
import type { MemberResult } from '../../physics/beam/result';
import { formatHz, formatPercent, formatSig } from '../format/numbers';

export interface ModeRow {
  mode: number;
  dryHz: number;
  wetHz: number | null;
  /** f_wet / f_dry as reported by the engine. */
  ratio: number | null;
  /** Period of the wet mode (of the dry mode when there is no liquid), s. */
  periodS: number;
  /** Share of kinetic energy in the liquid, 0..1; null when dry only. */
  liquidShare: number | null;
}

export function modeRows(member: MemberResult): ModeRow[] {
  return member.dry.modes.map((d, i) => {
    const w = member.wet?.modes[i];
    return {
      mode: d.mode,
      dryHz: d.frequencyHz,
      wetHz: w ? w.frequencyHz : null,
      ratio: member.wetToDryRatio?.[i] ?? null,
      periodS: w ? w.periodS : d.periodS,
      liquidShare: w?.liquidKineticEnergyShare ?? null,
    };
  });
}

export interface ModeCells {
  mode: string;
  dry: string;
  wet: string;
  ratio: string;
  period: string;
  liquidShare: string;
}

export function modeCells(r: ModeRow): ModeCells {
  return {
    mode: String(r.mode),
    dry: formatHz(r.dryHz),
    wet: r.wetHz === null ? '—' : formatHz(r.wetHz),
    ratio: r.ratio === null ? '—' : formatSig(r.ratio, 3),
    period: `${formatSig(r.periodS, 3)} s`,
    liquidShare: r.liquidShare === null ? '—' : formatPercent(r.liquidShare),
  };
}
