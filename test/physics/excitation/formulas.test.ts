import { describe, it } from 'vitest';
import {
  reducedVelocity,
  reynoldsNumber,
  sheddingFrequencyHz,
  speedForReducedVelocity,
  stabilityParameter,
} from '../../../src/physics/excitation/formulas';
import { expectClose } from '../../helpers/expect-close';

// Tolerances: these are single closed-form evaluations, so only floating-point rounding (≈1e-16) separates them
// from the hand values; rtol 1e-12 leaves room for a few operations, and hand values quoted to 6 figures use 1e-6.

describe('dimensionless groups of vortex shedding', () => {
  it('Reynolds number of a 1 m pile in 1 m/s current with ν = 1e-6 m²/s is 10⁶', () => {
    // Re = U·D/ν, classical.
    expectClose(reynoldsNumber(1, 1, 1e-6), 1e6, { rtol: 1e-12, label: 'Re' });
  });

  it('shedding frequency of a 20 mm stem at 2 m/s with St = 0.2 is 20 Hz', () => {
    // f_s = St·U/D, classical Strouhal relation: 0.2 × 2 / 0.02 = 20 Hz (hand calculation).
    expectClose(sheddingFrequencyHz(0.2, 2, 0.02), 20, { rtol: 1e-12, label: 'f_s' });
  });

  it('reduced velocity is U / (f_n D) and inverts to the speed for a given V_R', () => {
    // V_R = U/(f_n D), DNV-RP-C205 §9: 1.5 / (0.5 × 1.2) = 2.5 (hand calculation).
    expectClose(reducedVelocity(1.5, 0.5, 1.2), 2.5, { rtol: 1e-12, label: 'V_R' });
    for (const vr of [1.0, 3.0, 4.5, 16]) {
      const u = speedForReducedVelocity(vr, 0.37, 0.61);
      expectClose(reducedVelocity(u, 0.37, 0.61), vr, { rtol: 1e-12, label: `round trip V_R = ${vr}` });
    }
  });

  it('stability parameter K_S = 4π m_e ζ / (ρ D²) matches a hand calculation', () => {
    // DNV-RP-C205 §9: m_e = 500 kg/m, ζ = 0.01, ρ = 1025, D = 0.5 m:
    // 4π·500·0.01 = 62.8319; ρD² = 256.25; K_S = 0.245197 (hand calculation, 6 figures).
    expectClose(stabilityParameter(500, 0.01, 1025, 0.5), 0.245197, { rtol: 2e-6, label: 'K_S' });
  });

  it('K_S is linear in mass and damping and falls as 1/D² (property)', () => {
    const k0 = stabilityParameter(800, 0.004, 1025, 0.8);
    expectClose(stabilityParameter(1600, 0.004, 1025, 0.8), 2 * k0, { rtol: 1e-12, label: 'double mass' });
    expectClose(stabilityParameter(800, 0.012, 1025, 0.8), 3 * k0, { rtol: 1e-12, label: 'triple damping' });
    expectClose(stabilityParameter(800, 0.004, 1025, 1.6), k0 / 4, { rtol: 1e-12, label: 'double D' });
  });
});
