/** A base-10 logarithmic axis for the frequency chart: value <-> pixel, and "nice" tick values. */

export interface LogAxis {
  minHz: number;
  maxHz: number;
  fromPx: number;
  toPx: number;
}

/** An axis spanning whole decades around every given value (ignoring non-positive or non-finite ones). */
export function logAxisFor(values: readonly number[], fromPx: number, toPx: number): LogAxis {
  const good = values.filter((v) => Number.isFinite(v) && v > 0);
  if (good.length === 0) return { minHz: 0.1, maxHz: 100, fromPx, toPx };
  const lo = Math.min(...good);
  const hi = Math.max(...good);
  let minHz = 10 ** Math.floor(Math.log10(lo));
  let maxHz = 10 ** Math.ceil(Math.log10(hi));
  if (maxHz <= minHz) maxHz = minHz * 10;
  if (maxHz / minHz < 100) {
    // at least two decades, so bands on either side of a mode stay readable
    minHz = Math.min(minHz, maxHz / 100);
  }
  return { minHz, maxHz, fromPx, toPx };
}

export function toPx(axis: LogAxis, hz: number): number {
  const clamped = Math.min(axis.maxHz, Math.max(axis.minHz, hz));
  const t = Math.log10(clamped / axis.minHz) / Math.log10(axis.maxHz / axis.minHz);
  return axis.fromPx + t * (axis.toPx - axis.fromPx);
}

/** Tick values at 1, 2 and 5 times each power of ten within the axis. */
export function logTicks(axis: LogAxis): { hz: number; major: boolean }[] {
  const ticks: { hz: number; major: boolean }[] = [];
  for (let p = Math.round(Math.log10(axis.minHz)); 10 ** p <= axis.maxHz * 1.0001; p++) {
    for (const m of [1, 2, 5]) {
      const hz = m * 10 ** p;
      if (hz >= axis.minHz * 0.9999 && hz <= axis.maxHz * 1.0001) ticks.push({ hz, major: m === 1 });
    }
  }
  return ticks;
}
