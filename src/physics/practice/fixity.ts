/**
 * Depth to effective fixity of a laterally loaded pile below the mudline, from the soil's subgrade modulus:
 * M.T. Davisson and K.E. Robinson, "Bending and buckling of partially embedded piles", Proc. 6th Int. Conf. Soil
 * Mechanics and Foundation Engineering, Montreal (1965), vol. 2, 243–246 (docs/sources.md §S9).
 *   - modulus constant with depth (stiff over-consolidated clay), k in N/m²:  R = (EI/k)^(1/4),  L_f ≈ 1.4 R
 *   - modulus rising linearly with depth (sand, normally consolidated clay), k = n_h·z:  T = (EI/n_h)^(1/5),
 *     L_f ≈ 1.8 T
 * The equivalent cantilever is clamped at L_f below the mudline. The method holds for long (flexible) piles:
 * embedded length at least about 4 R or 4 T; `longEnough` says whether the pile is.
 */

export type SubgradeModulus =
  /** Constant with depth, N/m² (force per length of pile per metre of deflection). */
  | { kind: 'constant'; modulusNPerM2: number }
  /** Rising linearly from zero at the mudline, N/m³. */
  | { kind: 'linear'; gradientNPerM3: number };

export interface FixityDepth {
  depthM: number;
  /** Relative stiffness length: R (constant modulus) or T (linear modulus), m. */
  stiffnessLengthM: number;
  /** Embedded length is at least 4 stiffness lengths, as the method assumes. */
  longEnough: boolean;
  method: string;
}

/** Davisson & Robinson's depth to fixity; throws RangeError for non-positive input. */
export function davissonRobinsonFixity(bendingStiffnessNm2: number, soil: SubgradeModulus, embeddedLengthM: number): FixityDepth {
  if (!(bendingStiffnessNm2 > 0 && Number.isFinite(bendingStiffnessNm2))) throw new RangeError(`bendingStiffnessNm2 must be a finite number > 0, got ${bendingStiffnessNm2}`);
  if (!(embeddedLengthM > 0 && Number.isFinite(embeddedLengthM))) throw new RangeError(`embeddedLengthM must be a finite number > 0, got ${embeddedLengthM}`);
  if (soil.kind === 'constant') {
    if (!(soil.modulusNPerM2 > 0 && Number.isFinite(soil.modulusNPerM2))) throw new RangeError(`modulusNPerM2 must be a finite number > 0, got ${soil.modulusNPerM2}`);
    const r = Math.pow(bendingStiffnessNm2 / soil.modulusNPerM2, 0.25);
    return { depthM: 1.4 * r, stiffnessLengthM: r, longEnough: embeddedLengthM >= 4 * r, method: 'Davisson & Robinson (1965), constant modulus: L_f = 1.4 (EI/k)^¼' };
  }
  if (!(soil.gradientNPerM3 > 0 && Number.isFinite(soil.gradientNPerM3))) throw new RangeError(`gradientNPerM3 must be a finite number > 0, got ${soil.gradientNPerM3}`);
  const t = Math.pow(bendingStiffnessNm2 / soil.gradientNPerM3, 0.2);
  return { depthM: 1.8 * t, stiffnessLengthM: t, longEnough: embeddedLengthM >= 4 * t, method: 'Davisson & Robinson (1965), modulus rising with depth: L_f = 1.8 (EI/n_h)^⅕' };
}
