import { describe, expect, it } from 'vitest';
import { solveMember } from '../../../src/physics/beam';
import { HIGH_FREQUENCY_HZ, highFrequencyWarning } from '../../../src/physics/beam/warnings';

/** A cantilever steel rod in air; only which side of the 5 kHz line its first frequency falls is checked. */
function rod(lengthM: number, diameterM: number) {
  return {
    lengthM,
    segments: [{ fromM: 0, toM: lengthM, section: { shape: 'rod' as const, diameterM }, youngsModulusPa: 210e9, densityKgPerM3: 7850 }],
    supports: [{ atM: 0, kind: 'clamped' as const }],
  };
}

describe('frequencies above what the beam model represents', () => {
  it('flags a lowest frequency above 5 kHz, naming the frequency and the limit', () => {
    expect(highFrequencyWarning(7.3e5)).toBe(
      'The lowest frequency, 7.30e+5 Hz, is above 5000 Hz: outside what the beam model represents (local shell and acoustic behaviour take over); check the sizes and their units.',
    );
    expect(highFrequencyWarning(HIGH_FREQUENCY_HZ)).toBeNull();
    expect(highFrequencyWarning(12)).toBeNull();
  });

  it('a 10 mm long, 2 mm rod (first bending mode about 14 kHz, classical cantilever formula) carries the warning; a 1 m rod does not', () => {
    const short = solveMember(rod(0.01, 0.002) as never);
    const long = solveMember(rod(1, 0.02) as never);
    if (!short.ok || !long.ok) throw new Error('both rods must solve');
    expect(short.result.warnings.some((w) => w.includes('above 5000 Hz'))).toBe(true);
    expect(long.result.warnings.some((w) => w.includes('above 5000 Hz'))).toBe(false);
  });
});
