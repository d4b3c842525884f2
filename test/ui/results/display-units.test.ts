import { describe, expect, it } from 'vitest';
import { displayUnits, marginText, pct, plain, qty, rangeText, zText } from '../../../src/ui/results/display-units';

// Conversions: 1 ft = 0.3048 m and 1 lb = 0.45359237 kg exactly (international yard and pound, 1959).
const si = displayUnits('si');
const us = displayUnits('us');

describe('numbers in the case’s units', () => {
  it('shows mass per length in kg/m or lb/ft', () => {
    expect(qty(258.255, si.massPerLength)).toBe('258 kg/m');
    // 258.255 kg/m × 0.3048 / 0.45359237 = 173.54 lb/ft
    expect(qty(258.255, us.massPerLength)).toBe('174 lb/ft');
    expect(plain(258.255, us.massPerLength)).toBe('174');
  });

  it('shows elevations with four significant figures so nearby levels stay apart', () => {
    expect(zText(15.872, si)).toBe('15.87 m');
    // 15.872 / 0.3048 = 52.07 ft
    expect(zText(15.872, us)).toBe('52.07 ft');
    // 4.572 m is exactly 15 ft
    expect(rangeText(4.572, 15.872, us.length)).toBe('15–52.07 ft');
    expect(rangeText(4.572, 15.872, si.length, 4, false)).toBe('4.572–15.87');
  });

  it('shows speeds in m/s or ft/s', () => {
    expect(qty(1.2, si.speed)).toBe('1.2 m/s');
    // 1.2 / 0.3048 = 3.937 ft/s
    expect(qty(1.2, us.speed)).toBe('3.94 ft/s');
  });

  it('signs margins and keeps three significant figures', () => {
    expect(marginText(38.0916)).toBe('+38.1 %');
    expect(marginText(-53.9695)).toBe('\u221254.0 %');
    expect(marginText(0)).toBe('0 %');
    expect(marginText(null)).toBe('—');
    expect(marginText(35866.2)).toBe('+35900 %');
  });

  it('states limits as per cents without trailing zeros', () => {
    expect(pct(0.2)).toBe('20 %');
    expect(pct(0.005)).toBe('0.5 %');
  });

  it('never prints NaN or Infinity', () => {
    expect(qty(Number.NaN, si.speed)).toBe('—');
    expect(plain(Number.POSITIVE_INFINITY, si.length)).toBe('—');
    expect(marginText(Number.NaN)).toBe('—');
  });
});
