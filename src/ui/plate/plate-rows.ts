/**
 * Rows of the plate's frequency table, as text: dry and wet frequency per mode, the wet/dry ratio against the
 * dry mode each wet mode resembles most, and the error estimates. Pure wording; numbers come from the result.
 */
import type { PlateResult } from '../../physics/plate';
import { formatHz, formatSig } from '../format/numbers';

export interface PlateModeRow {
  mode: number;
  dry: string;
  wet: string;
  ratio: string;
  dryError: string;
  wetError: string;
}

/** "0.12 %"; "under 0.01 %" for changes below what the table can show. */
export function errorText(relative: number | undefined): string {
  if (relative === undefined || !Number.isFinite(relative)) return '—';
  const p = relative * 100;
  return p < 0.01 ? 'under 0.01 %' : `${formatSig(p, 2)} %`;
}

export function plateModeRows(r: PlateResult): PlateModeRow[] {
  const n = Math.max(r.dry.frequenciesHz.length, r.wet?.frequenciesHz.length ?? 0);
  const rows: PlateModeRow[] = [];
  for (let i = 0; i < n; i++) {
    const dry = r.dry.frequenciesHz[i];
    const wet = r.wet?.frequenciesHz[i];
    rows.push({
      mode: i + 1,
      dry: dry !== undefined ? formatHz(dry) : '—',
      wet: wet !== undefined ? formatHz(wet) : '—',
      ratio: r.wet && r.wetToDryRatio[i] !== undefined ? formatSig(r.wetToDryRatio[i], 3) : '—',
      dryError: errorText(r.errorEstimate.dryRelative[i]),
      wetError: r.wet ? errorText(r.errorEstimate.wetRelative[i]) : '—',
    });
  }
  return rows;
}
