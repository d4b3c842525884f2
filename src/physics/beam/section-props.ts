/**
 * Cross-section properties of a member segment at a point along it, for bending in the plane of
 * lateral motion. A linear taper interpolates the section's dimensions (not its properties) between
 * `section` and `endSection`, so EI follows D⁴ and mass follows D² along the segment.
 */
import type { MemberSection, MemberSegment } from './model';

/** Properties at one station, SI units. */
export interface SectionAt {
  /** Bending stiffness E·I (plate strip: D·width with D = E t³ / (12 (1 − ν²))), N·m². */
  eiNm2: number;
  /** Mass per metre of the structure (steel), kg/m. */
  structureKgPerM: number;
  /** Mass per metre of the contents of a tube, kg/m. */
  contentsKgPerM: number;
  /** Mass per metre of coating or marine growth, kg/m. */
  coatingKgPerM: number;
  /** Outer width across the motion including coating (tube/rod: diameter; plate strip: width), m. */
  outerWidthM: number;
  /** Reference area for the added-mass coefficient, π (outerWidth/2)², m². */
  referenceAreaM2: number;
  /** Outer area of the section including coating (displaced liquid per metre / density), m². */
  displacedAreaM2: number;
  /** Section depth in the direction of motion (tube/rod: diameter; plate strip: thickness), m. */
  depthM: number;
  /** Shear stiffness κ G A of the structure, N (Timoshenko option). */
  shearStiffnessN: number;
  /** Rotary inertia per metre of structure, contents and coating rotating with the section, kg·m²/m. */
  rotaryInertiaKgM: number;
}

/**
 * Timoshenko shear coefficients from G.R. Cowper, "The shear coefficient in Timoshenko's beam theory",
 * J. Appl. Mech. 33 (1966) 335 (docs/sources.md §S1.7): hollow circle with m = d_i/D
 * κ = 6(1+ν)(1+m²)² / ((7+6ν)(1+m²)² + (20+12ν)m²) (solid circle at m = 0), rectangle κ = 10(1+ν)/(12+11ν).
 */
export function cowperCircle(nu: number, ratio: number): number {
  const q = (1 + ratio * ratio) ** 2;
  return (6 * (1 + nu) * q) / ((7 + 6 * nu) * q + (20 + 12 * nu) * ratio * ratio);
}

export function cowperRectangle(nu: number): number {
  return (10 * (1 + nu)) / (12 + 11 * nu);
}

export const DEFAULT_POISSON_RATIO = 0.3;

function lerp(a: number, b: number, t: number): number {
  return a + (b - a) * t;
}

/** Dimensions of the section at fraction t ∈ [0, 1] of the segment (linear taper). */
export function interpolateSection(seg: MemberSegment, t: number): MemberSection {
  const s = seg.section;
  const e = seg.endSection;
  if (!e || t === 0) return s;
  if (s.shape === 'tube' && e.shape === 'tube') {
    return { shape: 'tube', outerDiameterM: lerp(s.outerDiameterM, e.outerDiameterM, t), wallThicknessM: lerp(s.wallThicknessM, e.wallThicknessM, t) };
  }
  if (s.shape === 'rod' && e.shape === 'rod') return { shape: 'rod', diameterM: lerp(s.diameterM, e.diameterM, t) };
  if (s.shape === 'plate-strip' && e.shape === 'plate-strip') {
    return { shape: 'plate-strip', widthM: lerp(s.widthM, e.widthM, t), thicknessM: lerp(s.thicknessM, e.thicknessM, t) };
  }
  throw new RangeError(`endSection.shape must match section.shape (${s.shape}), got ${e.shape}`);
}

/** Properties of a segment at fraction t ∈ [0, 1] of its length. */
export function sectionAt(seg: MemberSegment, t: number): SectionAt {
  const sec = interpolateSection(seg, t);
  const e = seg.youngsModulusPa;
  const rho = seg.densityKgPerM3;
  const c = seg.coating?.thicknessM ?? 0;
  const rhoC = seg.coating?.densityKgPerM3 ?? 0;
  const rhoIn = seg.contentsDensityKgPerM3 ?? 0;
  const nu = seg.poissonRatio ?? DEFAULT_POISSON_RATIO;
  const g = e / (2 * (1 + nu));
  if (sec.shape === 'plate-strip') {
    const { widthM: w, thicknessM: th } = sec;
    // Plate strip bending about its thin axis: flexural rigidity D = E t³ / (12 (1 − ν²)) per unit width (classical plate theory).
    const ei = ((e * th * th * th) / (12 * (1 - nu * nu))) * w;
    const wo = w + 2 * c;
    const to = th + 2 * c;
    return {
      eiNm2: ei,
      structureKgPerM: rho * w * th,
      contentsKgPerM: 0,
      coatingKgPerM: rhoC * (wo * to - w * th),
      outerWidthM: wo,
      referenceAreaM2: Math.PI * (wo / 2) ** 2,
      displacedAreaM2: wo * to,
      depthM: th,
      shearStiffnessN: cowperRectangle(nu) * g * w * th,
      // Second moments about the bending axis: plate w t³/12, coating (w_o t_o³ − w t³)/12.
      rotaryInertiaKgM: (rho * w * th ** 3) / 12 + (rhoC * (wo * to ** 3 - w * th ** 3)) / 12,
    };
  }
  const d = sec.shape === 'tube' ? sec.outerDiameterM : sec.diameterM;
  const di = sec.shape === 'tube' ? d - 2 * sec.wallThicknessM : 0;
  const d2 = d * d;
  const di2 = di * di;
  const dOut = d + 2 * c;
  const areaOut = (Math.PI / 4) * dOut * dOut;
  const i64 = (x: number) => (Math.PI / 64) * x ** 4;
  return {
    eiNm2: e * (Math.PI / 64) * (d2 * d2 - di2 * di2),
    structureKgPerM: rho * (Math.PI / 4) * (d2 - di2),
    contentsKgPerM: rhoIn * (Math.PI / 4) * di2,
    coatingKgPerM: rhoC * (areaOut - (Math.PI / 4) * d2),
    outerWidthM: dOut,
    referenceAreaM2: areaOut,
    displacedAreaM2: areaOut,
    depthM: d,
    shearStiffnessN: cowperCircle(nu, di / d) * g * (Math.PI / 4) * (d2 - di2),
    rotaryInertiaKgM: rho * (i64(d) - i64(di)) + rhoIn * i64(di) + rhoC * (i64(dOut) - i64(d)),
  };
}

/** Total dry mass per metre (structure + contents + coating), kg/m. */
export function dryMassPerM(p: SectionAt): number {
  return p.structureKgPerM + p.contentsKgPerM + p.coatingKgPerM;
}
