/**
 * Machinery orders: shaft orders f = k · n and blade-pass orders f = j · blades · n, n the shaft speed in Hz (classical),
 * each screened with the frequency separation margin (±20 % by default, common practice).
 * A variable-speed machine (shaftSpeedMaxHz given) drives a band per order instead of a line.
 */
import { sig } from './format';
import type { CheckResult } from './results';
import type { Machine, SourcedLimit } from './types';
import { classifyFrequency } from './verdict';

export const DEFAULT_SHAFT_ORDERS: readonly number[] = [1, 2];
export const DEFAULT_BLADE_PASS_ORDERS: readonly number[] = [1];

/** One forcing line (or band) of a machine. */
export interface MachineryLine {
  label: string;
  /** Shaft-frequency multiple: k for shaft order k, j · blades for blade-pass order j. */
  multipleOfShaft: number;
  lowHz: number;
  highHz: number;
}

/** The forcing lines of a machine, shaft orders first, then blade-pass orders. */
export function machineryLines(machine: Machine, index: number): MachineryLine[] {
  const name = machine.label ?? `machine ${index + 1}`;
  const hzLow = machine.shaftSpeedHz;
  const hzHigh = machine.shaftSpeedMaxHz ?? machine.shaftSpeedHz;
  const lines: MachineryLine[] = [];
  const add = (label: string, multiple: number): void => {
    lines.push({ label, multipleOfShaft: multiple, lowHz: multiple * hzLow, highHz: multiple * hzHigh });
  };
  for (const k of machine.shaftOrders ?? DEFAULT_SHAFT_ORDERS) add(`${name} ${sig(k)}× shaft`, k);
  if (machine.bladeCount !== undefined) {
    for (const j of machine.bladePassOrders ?? DEFAULT_BLADE_PASS_ORDERS) {
      add(`${name} blade pass ${sig(j)}× (${machine.bladeCount} blades)`, j * machine.bladeCount);
    }
  }
  return lines;
}

export function machineryCheck(
  line: MachineryLine,
  frequencyHz: number,
  frequencyBasis: 'wet' | 'dry',
  margin: SourcedLimit,
): CheckResult {
  const { verdict, marginPercent } = classifyFrequency(frequencyHz, line, margin.value);
  const forcing = line.lowHz === line.highHz ? `${sig(line.lowHz)} Hz` : `${sig(line.lowHz)}–${sig(line.highHz)} Hz`;
  const side = verdict === 'inside-band' ? 'at' : frequencyHz > line.highHz ? 'above' : 'below';
  const pct = verdict === 'inside-band' ? '' : ` by ${sig(Math.abs(marginPercent))} %`;
  return {
    kind: 'machinery',
    label: frequencyBasis === 'dry' ? `${line.label} (dry)` : line.label,
    frequencyBasis,
    frequencyHz,
    verdict,
    marginPercent,
    bandHz: { lowHz: line.lowHz, highHz: line.highHz },
    criticalSpeedMPerS: null,
    resonantShaftHz: frequencyHz / line.multipleOfShaft,
    reason: `${frequencyBasis} f_n = ${sig(frequencyHz)} Hz ${side} forcing ${forcing}${pct}; ±${sig(100 * margin.value)} % required`,
    source: margin.source,
  };
}
