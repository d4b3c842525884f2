/**
 * H-section (I-beam, H pile): two flanges of width b and thickness t_f joined by a web of clear depth d
 * (between the flanges) and thickness t_w; overall depth h = d + 2 t_f. `axis` says which way it bends:
 * 'strong' — about the axis parallel to the flanges, the member moving along the web (depth along the motion);
 * 'weak' — about the web's axis, the member moving along the flanges (flange width along the motion).
 *
 * Section properties by parts (classical; e.g. W.C. Young and R.G. Budynas, Roark's Formulas for Stress and
 * Strain, 7th ed., Appendix A, properties of plane areas, from memory): A = 2 b t_f + d t_w;
 * I_strong = (b h³ − (b − t_w) d³) / 12 (outer rectangle less the two side voids);
 * I_weak = (2 t_f b³ + d t_w³) / 12 (flanges and web about their common centre line). Root fillets are left
 * out (a rolled section is a few per cent stiffer).
 * Shear area (Timoshenko option; common practice, from memory): strong axis the web over the overall depth,
 * h t_w; weak axis the two flanges as rectangles, (5/6)·2 b t_f (the rectangle's 5/6, classical).
 * Coating or growth of thickness c is grown outwards as a sharp-cornered H of b + 2c, t_f + 2c, t_w + 2c and
 * clear web d − 2c (its area and second moment less the bare ones); the sharp corners overstate the coating
 * by (4 − π) c² at each of the 8 convex corners, small while c ≪ b.
 * No closed-form added mass is used: the outline goes to the section solver, in open liquid too. The flow
 * sees a rectangle of the width across the motion (flange width, or overall depth for the weak axis).
 */
import type { Vec2 } from '../section/types';
import { lerp } from './shear';
import type { SectionAt, ShapeDescription } from './types';

export type HSectionAxis = 'strong' | 'weak';
export const H_SECTION_AXES: readonly HSectionAxis[] = ['strong', 'weak'];

export interface HSection {
  shape: 'h-section';
  flangeWidthM: number;
  flangeThicknessM: number;
  /** Clear depth of the web between the flanges, m. */
  webDepthM: number;
  webThicknessM: number;
  axis: HSectionAxis;
}

export function hSection(dims: Omit<HSection, 'shape'>): HSection {
  return { shape: 'h-section', ...dims };
}

/** Area, second moment about the bending axis, and sizes across and along the motion of an H of these parts. */
export function hParts(b: number, tf: number, d: number, tw: number, axis: HSectionAxis): { areaM2: number; secondMomentM4: number; acrossM: number; alongM: number } {
  const h = d + 2 * tf;
  const areaM2 = 2 * b * tf + d * tw;
  if (axis === 'strong') return { areaM2, secondMomentM4: (b * h ** 3 - (b - tw) * d ** 3) / 12, acrossM: b, alongM: h };
  return { areaM2, secondMomentM4: (2 * tf * b ** 3 + d * tw ** 3) / 12, acrossM: h, alongM: b };
}

/** The H grown outwards by c (coating): flanges and web thicker, clear web shorter (never below 0). */
function grown(s: HSection, c: number): [number, number, number, number] {
  const h = s.webDepthM + 2 * s.flangeThicknessM;
  const dIn = Math.max(s.webDepthM - 2 * c, 0);
  return [s.flangeWidthM + 2 * c, (h + 2 * c - dIn) / 2, dIn, s.webThicknessM + 2 * c];
}

/** Outline corners, counter-clockwise, with u along the web (depth) and v along the flanges. */
function outlineUV(b: number, tf: number, d: number, tw: number): Vec2[] {
  const hh = d / 2 + tf;
  const hd = d / 2;
  const hb = b / 2;
  const hw = tw / 2;
  return [
    [-hh, -hb], [-hd, -hb], [-hd, -hw], [hd, -hw], [hd, -hb], [hh, -hb],
    [hh, hb], [hd, hb], [hd, hw], [-hd, hw], [-hd, hb], [-hh, hb],
  ];
}

export const H_SECTION: ShapeDescription<HSection> = {
  id: 'h-section',
  dimensions: ['flangeWidthM', 'flangeThicknessM', 'webDepthM', 'webThicknessM'],
  choices: { axis: H_SECTION_AXES },
  check: (s) => (s.webThicknessM < s.flangeWidthM ? null : { field: 'webThicknessM', expected: `less than flangeWidthM (${s.flangeWidthM} m)`, got: s.webThicknessM }),
  holdsContents: false,
  props(s, m): SectionAt {
    const bare = hParts(s.flangeWidthM, s.flangeThicknessM, s.webDepthM, s.webThicknessM, s.axis);
    const [bo, tfo, dO, two] = grown(s, m.coatingM);
    const outer = hParts(bo, tfo, dO, two, s.axis);
    const h = s.webDepthM + 2 * s.flangeThicknessM;
    const shearArea = s.axis === 'strong' ? h * s.webThicknessM : (5 / 6) * 2 * s.flangeWidthM * s.flangeThicknessM;
    const rho = m.densityKgPerM3;
    const rhoC = m.coatingDensityKgPerM3;
    return {
      eiNm2: m.youngsModulusPa * bare.secondMomentM4,
      structureKgPerM: rho * bare.areaM2,
      contentsKgPerM: 0,
      coatingKgPerM: rhoC * (outer.areaM2 - bare.areaM2),
      outerWidthM: outer.acrossM,
      referenceAreaM2: Math.PI * (outer.acrossM / 2) ** 2,
      displacedAreaM2: outer.areaM2,
      depthM: bare.alongM,
      shearStiffnessN: m.shearModulusPa * shearArea,
      rotaryInertiaKgM: rho * bare.secondMomentM4 + rhoC * (outer.secondMomentM4 - bare.secondMomentM4),
    };
  },
  lerp: (a, b, t) =>
    hSection({
      flangeWidthM: lerp(a.flangeWidthM, b.flangeWidthM, t),
      flangeThicknessM: lerp(a.flangeThicknessM, b.flangeThicknessM, t),
      webDepthM: lerp(a.webDepthM, b.webDepthM, t),
      webThicknessM: lerp(a.webThicknessM, b.webThicknessM, t),
      axis: a.axis,
    }),
  depthM: (s) => hParts(s.flangeWidthM, s.flangeThicknessM, s.webDepthM, s.webThicknessM, s.axis).alongM,
  solverBody(s, c) {
    const uv = outlineUV(...grown(s, c));
    // Strong axis: the web (u) lies along the motion x. Weak axis: the flanges (v) lie along x; the
    // reflection v -> x, u -> y reverses the winding, which the section solver accepts either way.
    return { shape: 'polygon', pointsM: uv.map(([u, v]): Vec2 => (s.axis === 'strong' ? [u, v] : [v, u])) };
  },
  flowSection: (p) => ({ kind: 'rectangle', widthAcrossFlowM: p.outerWidthM, depthAlongFlowM: p.depthM }),
  closedForm: null,
  perforable: false,
  endEffectBasis: null,
  caReferenceArea: 'π (w/2)², w = width across the motion including coating (flange width; overall depth for the weak axis)',
  wetWarning: () => null,
};
