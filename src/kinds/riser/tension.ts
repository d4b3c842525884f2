/**
 * The top tension the riser's bending uses: the entered tension as is when it is the effective tension, or
 * Sparks' effective tension from a wall (load-cell) tension and the pressures at the top:
 *   T_eff = T_wall − p_i·A_i + p_e·A_e
 * (R. Sparks, "The influence of tension, pressure and weight on pipe and riser deformations and stresses",
 * ASME J. Energy Resources Technology 106 (1984) 46), p_e the hydrostatic pressure of the outside water at the
 * top (0 when the top is above the water). Below the top the engine lowers it by the effective (submerged)
 * weight, the same view of effective tension.
 */
import { effectiveTension, hydrostaticPressurePa } from '../../physics/practice/effective-tension';
import type { RiserInput } from './build';

export interface RiserTopTension {
  /** Tension given to the member model at the top, N (negative = compression). */
  effectiveN: number;
  /** The breakdown when the entered tension was a wall tension; null when it was entered as effective. */
  fromWall: { wallN: number; internalTermN: number; externalTermN: number; internalPressurePa: number; externalPressurePa: number } | null;
}

export function riserTopTension(r: RiserInput): RiserTopTension {
  const t = r.topTensionN ?? 0;
  if ((r.tensionBasis ?? 'effective') === 'effective') return { effectiveN: t, fromWall: null };
  const pe = hydrostaticPressurePa(r.liquidDensityKgPerM3, r.liquidToM - r.lengthM);
  const pi = r.internalPressurePa ?? 0;
  const e = effectiveTension({
    wallTensionN: t,
    internalPressurePa: pi,
    externalPressurePa: pe,
    outerDiameterM: r.outerDiameterM,
    innerDiameterM: r.outerDiameterM - 2 * r.wallThicknessM,
  });
  return {
    effectiveN: e.effectiveTensionN,
    fromWall: { wallN: t, internalTermN: e.internalPressureTermN, externalTermN: e.externalPressureTermN, internalPressurePa: pi, externalPressurePa: pe },
  };
}

/** "123 kN (27.7 kip)": the note is shown in either unit system. */
export function forceWords(n: number): string {
  const kn = n / 1000;
  const kip = n / 4448.2216152605;
  const f = (x: number) => String(Number(x.toPrecision(3)));
  return `${f(kn)} kN (${f(kip)} kip)`;
}

/** The note that says which tension was used, for the assumptions and the report. */
export function tensionNote(t: RiserTopTension, varies: boolean): string {
  const along = varies ? ' at the top, falling downwards by the submerged weight' : ', constant along the riser';
  if (!t.fromWall) return `Tension used: ${forceWords(t.effectiveN)} effective tension${along} (entered as effective tension).`;
  const w = t.fromWall;
  return (
    `Tension used: ${forceWords(t.effectiveN)} effective tension${along}, from the wall tension ${forceWords(w.wallN)} ` +
    `− p_i·A_i ${forceWords(w.internalTermN)} + p_e·A_e ${forceWords(w.externalTermN)} (Sparks' effective tension, ASME J. Energy Resources Technology 106, 1984).`
  );
}
