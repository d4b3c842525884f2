import { describe, expect, it } from 'vitest';
import { effectiveTension, hydrostaticPressurePa } from '../../../src/physics/practice/effective-tension';
import { davissonRobinsonFixity } from '../../../src/physics/practice/fixity';
import { SOIL_PRESETS, TON_PER_FT3_IN_N_PER_M3 } from '../../../src/physics/practice/soil-presets';
import { waterProperties } from '../../../src/physics/practice/liquid-properties';
import { crossFlowAmplitudeRatio, MODE_FACTOR, stabilityParameter } from '../../../src/physics/practice/severity';
import { expectClose } from '../../helpers/expect-close';

describe('effective tension (Sparks 1984: T_eff = T_wall − p_i A_i + p_e A_e)', () => {
  it('100 bar inside a 247.5 mm bore takes 481 kN off a 60 kN wall tension (hand-worked)', () => {
    // Hand-worked: A_i = π/4 · 0.2475² = 0.0481107 m²; p_i A_i = 1e7 · 0.0481107 = 481 107 N.
    const r = effectiveTension({ wallTensionN: 60e3, internalPressurePa: 100e5, externalPressurePa: 0, outerDiameterM: 0.2731, innerDiameterM: 0.2475 });
    expectClose(r.internalPressureTermN, 481_107, { rtol: 1e-5, label: 'p_i A_i' }); // hand arithmetic to 6 figures
    expectClose(r.effectiveTensionN, 60e3 - 481_107, { rtol: 1e-5, label: 'T_eff' });
  });

  it('equal pressure inside and out on a thin wall leaves about the wall tension plus p times the steel area', () => {
    // Sparks (1984): with p_i = p_e = p, T_eff = T_wall + p (A_e − A_i) = T_wall + p A_steel.
    const p = hydrostaticPressurePa(1025, 100);
    const r = effectiveTension({ wallTensionN: 1e5, internalPressurePa: p, externalPressurePa: p, outerDiameterM: 0.5, innerDiameterM: 0.46 });
    const aSteel = (Math.PI / 4) * (0.5 ** 2 - 0.46 ** 2);
    expectClose(r.effectiveTensionN, 1e5 + p * aSteel, { rtol: 1e-12, label: 'T_eff with equal pressures' });
    // ρ g h with standard gravity 9.80665 m/s² (CGPM 1901): 1025 · 9.80665 · 100.
    expectClose(p, 1025 * 9.80665 * 100, { rtol: 1e-15, label: 'hydrostatic pressure' });
  });

  it('a bore as large as the outer diameter is refused with the limit named', () => {
    expect(() => effectiveTension({ wallTensionN: 0, internalPressurePa: 0, externalPressurePa: 0, outerDiameterM: 0.3, innerDiameterM: 0.3 })).toThrow(
      'innerDiameterM must be ≥ 0 and below the outer diameter (0.3 m), got 0.3',
    );
  });
});

describe('depth to fixity (Davisson & Robinson 1965)', () => {
  it('constant modulus: L_f = 1.4 (EI/k)^¼, hand-worked for EI = 1e9 N·m², k = 6.7 MN/m²', () => {
    // (1e9 / 6.7e6)^0.25 = 149.25^0.25 = 3.4953 m; × 1.4 = 4.8934 m (hand-worked, 5 figures).
    const r = davissonRobinsonFixity(1e9, { kind: 'constant', modulusNPerM2: 6.7e6 }, 30);
    expectClose(r.stiffnessLengthM, 3.4953, { rtol: 2e-5, label: 'R' });
    expectClose(r.depthM, 4.8934, { rtol: 2e-5, label: 'L_f' });
    expect(r.longEnough).toBe(true);
  });

  it('modulus rising with depth: L_f = 1.8 (EI/n_h)^⅕, hand-worked for EI = 1e9 N·m², n_h = 4.4 MN/m³', () => {
    // (1e9 / 4.4e6)^0.2 = 227.27^0.2 = 2.9600 m; × 1.8 = 5.3280 m (hand-worked, 5 figures).
    const r = davissonRobinsonFixity(1e9, { kind: 'linear', gradientNPerM3: 4.4e6 }, 8);
    expectClose(r.stiffnessLengthM, 2.96, { rtol: 1e-4, label: 'T' });
    expectClose(r.depthM, 5.328, { rtol: 1e-4, label: 'L_f' });
    expect(r.longEnough).toBe(false); // 8 m < 4 T = 11.8 m: the method's long-pile assumption fails
  });

  it('sand presets follow Terzaghi (1955) in tons per cubic foot (NIST SP 811: lbf, ft)', () => {
    expectClose(TON_PER_FT3_IN_N_PER_M3, 314_160, { rtol: 1e-4, label: '1 ton/ft³ in N/m³' }); // 8896.44 N / 0.0283168 m³
    const m = SOIL_PRESETS['medium-sand'].modulus;
    expect(m.kind).toBe('linear');
    if (m.kind === 'linear') expectClose(m.gradientNPerM3, 4.398e6, { rtol: 1e-3, label: 'medium sand n_h' });
  });
});

describe('water properties against temperature (CRC Handbook table values)', () => {
  it('reproduces the table at its nodes and interpolates between them', () => {
    expectClose(waterProperties(20).densityKgPerM3, 998.2, { rtol: 1e-12, label: 'ρ at 20 °C' });
    expectClose(waterProperties(60).kinematicViscosityM2PerS, 0.475e-6, { rtol: 1e-12, label: 'ν at 60 °C' });
    // Midway between 20 and 40 °C: (1.004 + 0.658)/2 = 0.831 mm²/s (linear interpolation, not a table value).
    expectClose(waterProperties(30).kinematicViscosityM2PerS, 0.831e-6, { rtol: 1e-12, label: 'ν at 30 °C' });
  });

  it('refuses temperatures outside the table rather than extrapolating', () => {
    expect(() => waterProperties(90)).toThrow('temperatureC must be within 10–60 °C');
  });
});

describe('severity of a lock-in (DNV-RP-C205 §9 stability parameter; Blevins 1990 §3.4 amplitude fit)', () => {
  it('K_S = 4π m_e ζ / (ρ D²), hand-worked for a 0.762 m pile', () => {
    // 4π · 1500 · 0.005 / (1025 · 0.762²) = 94.248 / 595.16 = 0.15836 (hand-worked).
    expectClose(stabilityParameter(1500, 0.005, 1025, 0.762), 0.15836, { rtol: 1e-4, label: 'K_S' });
  });

  it('the amplitude fit gives A/D ≈ 1.36 for an undamped rigid cylinder at St = 0.2 and falls as damping rises', () => {
    // Blevins' fit evaluated by hand at δ_r = 0, St = 0.2, γ = 1:
    // 0.07 / (1.9 · 0.04) = 0.92105; √(0.3 + 0.72 / 0.38) = √2.19474 = 1.48147; product 1.36451.
    expectClose(crossFlowAmplitudeRatio(0, 0.2, MODE_FACTOR.rigid), 1.36451, { rtol: 1e-5, label: 'A/D at δ_r = 0' });
    // At δ_r = 10: 0.07 / (11.9 · 0.04) = 0.147059; √(0.3 + 0.72 / 2.38) = √0.602521 = 0.776222; product 0.114150.
    expectClose(crossFlowAmplitudeRatio(10, 0.2, MODE_FACTOR.rigid), 0.11415, { rtol: 1e-4, label: 'A/D at δ_r = 10' });
    expect(crossFlowAmplitudeRatio(1, 0.2, MODE_FACTOR.cantilever)).toBeGreaterThan(crossFlowAmplitudeRatio(1, 0.2, MODE_FACTOR.rigid));
  });
});
