/**
 * What drives the band: for each ranged input, the lowest wet frequency (dry when there is no liquid) with
 * that input at its low end, likely value and high end and every other input at its likely value, ordered
 * by the size of its swing (largest first), so a surveyor sees which input is worth measuring on site.
 * Uses the axis settings the band already solved: no extra solves.
 */
import type { AxisResult, SensitivityEntry } from './band-types';
import type { ResolvedRange } from './ranges';

export function sensitivityFromAxes(ranges: readonly ResolvedRange[], axes: readonly AxisResult[]): SensitivityEntry[] {
  const entries = axes.map((axis, i): SensitivityEntry => {
    const r = ranges[i];
    const basis = axis.wetHz ? 'wet' : 'dry';
    const series = (axis.wetHz ?? axis.dryHz).map((modes) => modes[0]);
    const at = (v: number) => series[axis.values.indexOf(v)];
    return {
      path: r.path,
      basis,
      low: r.low,
      likely: r.likely,
      high: r.high,
      atLowHz: at(r.low),
      likelyHz: at(r.likely),
      atHighHz: at(r.high),
      swingHz: Math.max(...series) - Math.min(...series),
      direction: (axis.wetHz ? axis.direction.wet! : axis.direction.dry)[0],
    };
  });
  return entries.sort((a, b) => b.swingHz - a.swingHz);
}
