/**
 * The pile's practical inputs: head restraint, depth to fixity from the soil type (Davisson & Robinson), scour
 * and axial load (P-Δ).
 */
import { describe, expect, it } from 'vitest';
import { solveMember } from '../../src/physics/beam';
import { buildPileModel, type PileInput } from '../../src/kinds/pile/build';
import { SOIL_PRESETS } from '../../src/physics/practice/soil-presets';
import { expectClose } from '../helpers/expect-close';
import { landmark } from './helpers';

const E = 210e9;
const RHO = 7850;
const D = 0.61;
const T = 0.012;
const DI = D - 2 * T;
const EI = (E * Math.PI * (D ** 4 - DI ** 4)) / 64;
const M = (RHO * Math.PI * (D ** 2 - DI ** 2)) / 4;

/** A dry, sealed pile (no water), Euler–Bernoulli, so the classical beam results apply exactly. */
function dryPile(extra: Partial<PileInput>): PileInput {
  return {
    outerDiameterM: D,
    wallThicknessM: T,
    youngsModulusPa: E,
    materialDensityKgPerM3: RHO,
    waterDepthM: 0,
    topAboveStillWaterM: 20,
    foundation: { kind: 'fixity', depthBelowMudlineM: 0 },
    flooded: false,
    liquidDensityKgPerM3: 1025,
    beamTheory: 'euler-bernoulli',
    ...extra,
  };
}

function f1(input: PileInput): number {
  const out = solveMember(buildPileModel(input).model);
  if (!out.ok) throw new Error(out.message);
  return out.result.dry.modes[0].frequencyHz;
}

/** f = λ²/(2π L²) √(EI/m), classical Euler–Bernoulli beam. */
const beamHz = (lambda: number, l: number) => ((lambda * lambda) / (2 * Math.PI * l * l)) * Math.sqrt(EI / M);

describe('pile head restraint', () => {
  it('a head held against rotation gives the clamped–sliding beam of λ1 = 2.36502', () => {
    // R.D. Blevins, Formulas for Natural Frequency and Mode Shape, Table 8-1 (clamped–sliding): λ1 = 2.36502.
    // FE mesh converged to 0.05 % (solver default): rtol 1e-3.
    expectClose(f1(dryPile({ head: { kind: 'held' } })), beamHz(2.36502, 20), { rtol: 1e-3, label: 'held head f1' });
    // The same pile with a free head is the cantilever, λ1 = 1.87510 (Blevins, Table 8-1, clamped–free).
    expectClose(f1(dryPile({})), beamHz(1.8751, 20), { rtol: 1e-3, label: 'free head f1' });
  });

  it('a rotational spring at the head lies between the free and the held head, and tends to each', () => {
    const free = f1(dryPile({}));
    const held = f1(dryPile({ head: { kind: 'held' } }));
    const soft = f1(dryPile({ head: { kind: 'spring', rotationalStiffnessNmPerRad: 1e3 } }));
    const mid = f1(dryPile({ head: { kind: 'spring', rotationalStiffnessNmPerRad: EI / 20 } }));
    const stiff = f1(dryPile({ head: { kind: 'spring', rotationalStiffnessNmPerRad: 1e6 * EI } }));
    expect(mid).toBeGreaterThan(free);
    expect(mid).toBeLessThan(held);
    // Limits (classical): a very soft spring is the free head, a very stiff one the held head; 0.1 %.
    expectClose(soft, free, { rtol: 1e-3, label: 'soft spring → free' });
    expectClose(stiff, held, { rtol: 1e-3, label: 'stiff spring → held' });
  });
});

describe('depth to fixity from the soil type (Davisson & Robinson)', () => {
  for (const soil of ['stiff-clay', 'medium-sand'] as const) {
    it(`the equivalent cantilever in ${soil} has nearly the f1 of the same pile on subgrade springs (independent FE)`, () => {
      const preset = SOIL_PRESETS[soil];
      const embedded = 25;
      const cantilever = buildPileModel(dryPile({ foundation: { kind: 'fixity-soil', soil, embeddedLengthM: embedded } }));
      expect(cantilever.notes.join(' ')).toMatch(/Davisson & Robinson/);
      const springs =
        preset.modulus.kind === 'constant'
          ? dryPile({ foundation: { kind: 'soil-springs', embeddedLengthM: embedded, modulusNPerM2: preset.modulus.modulusNPerM2 } })
          : dryPile({ foundation: { kind: 'soil-springs-linear', embeddedLengthM: embedded, modulusGradientNPerM3: preset.modulus.gradientNPerM3 } });
      const fEq = f1(dryPile({ foundation: { kind: 'fixity-soil', soil, embeddedLengthM: embedded } }));
      const fSprings = f1(springs);
      // The depth to fixity (M.T. Davisson & K.E. Robinson, 6th ICSMFE, 1965) is an approximation fitted for
      // buckling and head deflection, not for frequency: agreement within 10 % is what the method can give
      // (cross-check against the member model on Winkler springs, an independent FE route).
      expectClose(fEq, fSprings, { rtol: 0.1, label: `${soil}: equivalent cantilever vs springs` });
      // Measured: stiff clay L_f = 3.32 m, f1 1.1255 vs 1.1202 Hz (+0.5 %); medium sand L_f = 3.91 m, 1.0709 vs 1.1171 Hz (−4.1 %).
    });
  }

  it('puts the fixity point at 1.4 (EI/k)^¼ below the mudline in stiff clay (hand-worked)', () => {
    // k = 67 × 100 kPa = 6.7 MN/m² (Davisson, Highway Research Record 333, 1970); EI = 210e9·π/64·(0.61⁴ − 0.586⁴)
    // = 2.11709e8 N·m²; R = (EI/k)^¼ = (31.5983 m⁴)^¼ = 2.37092 m; L_f = 1.4 R = 3.31928 m (hand-worked).
    const b = buildPileModel(dryPile({ foundation: { kind: 'fixity-soil', soil: 'stiff-clay' } }));
    // Hand value to 6 figures: rtol 1e-5.
    expectClose(landmark(b, 'mudline'), 3.31928, { rtol: 1e-5, label: 'L_f' });
  });
});

describe('scour and axial load', () => {
  it('scour moves the mudline and the soil springs down and leaves the water in the hole', () => {
    const springs = { kind: 'soil-springs' as const, embeddedLengthM: 15, modulusNPerM2: 5e6 };
    const b = buildPileModel(dryPile({ waterDepthM: 8, topAboveStillWaterM: 3, foundation: springs, scourDepthM: 2 }));
    // Toe at 0; scoured mudline at 15 − 2 = 13 m; original mudline 15 m; still water 23 m; top 26 m.
    expect(b.model.lengthM).toBe(26);
    expect(b.model.soilSprings).toEqual([{ fromM: 0, toM: 13, modulusNPerM2: 5e6 }]);
    expect(b.model.liquid).toMatchObject({ fromM: 13, toM: 23 });
    expect(landmark(b, 'mudline', 'Mudline')).toBe(13);
    expect(landmark(b, 'mudline', 'Mudline before scour')).toBe(15);
    // With a fixity depth, the fixity point stays the same depth below the scoured mudline: the pile grows by the scour.
    const fixed = buildPileModel(dryPile({ waterDepthM: 8, topAboveStillWaterM: 3, foundation: { kind: 'fixity', depthBelowMudlineM: 3.66 }, scourDepthM: 2 }));
    expectClose(fixed.model.lengthM, 3.66 + 2 + 8 + 3, { rtol: 1e-12, label: 'length with scour' });
    expect(f1(dryPile({ scourDepthM: 2 }))).toBeLessThan(f1(dryPile({})));
  });

  it('axial compression lowers f1 as Galef’s f = f0 √(1 − P/P_cr) for the cantilever', () => {
    // P_cr = π² EI / (4 L²) for a clamped–free column (classical Euler). Galef's relation (A.E. Galef, "Bending
    // frequencies of compressed beams", J. Acoust. Soc. Am. 44 (1968) 643) is exact for pinned ends and within
    // about 1–2 % for a cantilever at P = 0.3 P_cr (from memory): rtol 0.03.
    const pcr = (Math.PI ** 2 * EI) / (4 * 20 * 20);
    const loaded = buildPileModel(dryPile({ axialCompressionN: 0.3 * pcr }));
    expect(loaded.model.tensionN).toBeCloseTo(-0.3 * pcr, 6);
    expectClose(f1(dryPile({ axialCompressionN: 0.3 * pcr })), f1(dryPile({})) * Math.sqrt(0.7), { rtol: 0.03, label: 'f1 at 0.3 P_cr' });
  });
});
