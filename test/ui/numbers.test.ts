import { describe, it, expect } from 'vitest';
import { formatSig, formatPercent, formatHz, formatPeriod } from '../../src/ui/format/numbers';

describe('number formatting', () => {
  it('keeps three significant figures across the range of member frequencies', () => {
    expect(formatSig(0.051234)).toBe('0.0512');
    expect(formatSig(1.23456)).toBe('1.23');
    expect(formatSig(12.3456)).toBe('12.3');
    expect(formatSig(123.456)).toBe('123');
    expect(formatSig(1234.56)).toBe('1230'); // integer digits rounded too: three figures claimed, three shown
    expect(formatSig(17438)).toBe('17400');
  });
  it('does not gain a digit when rounding carries over a power of ten', () => {
    expect(formatSig(9.996)).toBe('10.0');
    expect(formatSig(0.09996)).toBe('0.100');
  });
  it('uses a true minus sign and scientific notation outside the plain range', () => {
    expect(formatSig(-2.5)).toBe('\u22122.50');
    expect(formatSig(2.5e7)).toBe('2.50e7');
    expect(formatSig(2.5e-5)).toBe('2.50e-5');
  });
  it('shows a dash, never NaN or Infinity, for values that are not numbers', () => {
    expect(formatSig(NaN)).toBe('—');
    expect(formatSig(Infinity)).toBe('—');
    expect(formatPeriod(0)).toBe('—');
  });
  it('formats ratios as percentages, frequencies in Hz and periods in seconds', () => {
    expect(formatPercent(0.8734)).toBe('87.3 %');
    expect(formatHz(2.345)).toBe('2.35 Hz');
    expect(formatPeriod(4)).toBe('0.250 s');
  });
});
