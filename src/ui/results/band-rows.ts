/** Rows of the band table and the sensitivity table, as text (pure; the panel, the report and tests share them). */
import type { FormRange } from '../../forms/ranges';
import type { BandResult, SensitivityEntry } from '../../physics/uncertain';
import { formatQuantity } from '../../units';
import { formatHz } from '../format/numbers';

export interface BandRow {
  mode: number;
  dryLikely: string;
  dryRange: string;
  wetLikely: string;
  wetRange: string;
  method: string;
}

/** "0.42 – 0.87 Hz" (en dash, one unit). */
export function hzRange(low: number, high: number): string {
  return `${formatHz(low).replace(' Hz', '')} – ${formatHz(high)}`;
}

export function bandRows(band: BandResult): BandRow[] {
  return band.dry.modes.map((d, j) => {
    const w = band.wet?.modes[j];
    return {
      mode: d.mode,
      dryLikely: formatHz(d.likelyHz),
      dryRange: hzRange(d.lowHz, d.highHz),
      wetLikely: w ? formatHz(w.likelyHz) : '—',
      wetRange: w ? hzRange(w.lowHz, w.highHz) : '—',
      method: w && w.method !== d.method ? `dry ${d.method}, wet ${w.method}` : d.method,
    };
  });
}

export interface SensitivityRow {
  key: string;
  label: string;
  range: string;
  atLow: string;
  atHigh: string;
  swing: string;
  /** SI figures for the chart. */
  atLowHz: number;
  likelyHz: number;
  atHighHz: number;
}

/** One row per ranged input, largest swing first (the band's order), labelled in the user's units. */
export function sensitivityRows(entries: readonly SensitivityEntry[], ranges: readonly FormRange[]): SensitivityRow[] {
  return entries.map((s) => {
    const r = ranges.find((x) => x.key === s.path);
    const unit = r?.unit ?? '';
    const q = (v: number) => (r ? formatQuantity(v, unit) : String(v));
    return {
      key: s.path,
      label: r?.label ?? s.path,
      range: `${q(s.low)} to ${q(s.high)}`,
      atLow: formatHz(s.atLowHz),
      atHigh: formatHz(s.atHighHz),
      swing: formatHz(s.swingHz),
      atLowHz: s.atLowHz,
      likelyHz: s.likelyHz,
      atHighHz: s.atHighHz,
    };
  });
}
