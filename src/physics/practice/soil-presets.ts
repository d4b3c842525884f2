/**
 * Soil presets for the lateral subgrade modulus of a pile, each with its basis. Values are indicative for
 * screening only: a site investigation governs.
 *   - Sands (submerged) and soft normally consolidated clay: modulus rising with depth, n_h (N/m³), from
 *     K. Terzaghi, "Evaluation of coefficients of subgrade reaction", Géotechnique 5 (1955) 297–326, Table for
 *     submerged sand: loose 4, medium 14, dense 34 tons/ft³ (1 ton/ft³ = 2000 lbf/ft³ = 314.16 kN/m³).
 *     Soft normally consolidated clay: n_h about 0.35 MN/m³ (order 0.1–0.6 MN/m³, as commonly quoted after
 *     Terzaghi 1955 and Davisson 1970).
 *   - Stiff over-consolidated clay: constant modulus k ≈ 67 s_u (M.T. Davisson, "Lateral load capacity of
 *     piles", Highway Research Record 333 (1970) 104–112), here with s_u = 100 kPa.
 */
import type { SubgradeModulus } from './fixity';

export type SoilPresetId = 'soft-clay' | 'stiff-clay' | 'loose-sand' | 'medium-sand' | 'dense-sand';

export interface SoilPreset {
  id: SoilPresetId;
  label: string;
  modulus: SubgradeModulus;
  source: string;
}

/** One short ton-force per cubic foot in N/m³: 2000 lbf × 4.4482216152605 N / (0.3048 m)³. */
export const TON_PER_FT3_IN_N_PER_M3 = (2000 * 4.4482216152605) / 0.3048 ** 3;

const TERZAGHI = 'Terzaghi, Géotechnique 5 (1955), submerged sand';

export const SOIL_PRESETS: Readonly<Record<SoilPresetId, SoilPreset>> = {
  'soft-clay': { id: 'soft-clay', label: 'Soft clay (normally consolidated)', modulus: { kind: 'linear', gradientNPerM3: 0.35e6 }, source: 'n_h ≈ 0.35 MN/m³, after Terzaghi (1955) and Davisson (1970)' },
  'stiff-clay': { id: 'stiff-clay', label: 'Stiff clay (over-consolidated, s_u ≈ 100 kPa)', modulus: { kind: 'constant', modulusNPerM2: 67 * 100e3 }, source: 'k ≈ 67 s_u, Davisson, Highway Research Record 333 (1970)' },
  'loose-sand': { id: 'loose-sand', label: 'Loose sand (submerged)', modulus: { kind: 'linear', gradientNPerM3: 4 * TON_PER_FT3_IN_N_PER_M3 }, source: `n_h = 4 tons/ft³, ${TERZAGHI}` },
  'medium-sand': { id: 'medium-sand', label: 'Medium dense sand (submerged)', modulus: { kind: 'linear', gradientNPerM3: 14 * TON_PER_FT3_IN_N_PER_M3 }, source: `n_h = 14 tons/ft³, ${TERZAGHI}` },
  'dense-sand': { id: 'dense-sand', label: 'Dense sand (submerged)', modulus: { kind: 'linear', gradientNPerM3: 34 * TON_PER_FT3_IN_N_PER_M3 }, source: `n_h = 34 tons/ft³, ${TERZAGHI}` },
};
