import { describe, expect, it } from 'vitest';
import { parseMemberModel, solveMember, type MemberModel } from '../../../src/physics/beam';
import { sectionAt } from '../../../src/physics/beam/section-props';
import { signedArea } from '../../../src/physics/section/polygon';
import { hSection, shapeOf, type HSection, type HSectionAxis } from '../../../src/physics/shapes';
import { expectClose } from '../../helpers/expect-close';

// An invented rolled-H-like section: flanges 300 × 20 mm, clear web 260 × 12 mm, overall depth 300 mm.
const B = 0.3;
const TF = 0.02;
const D = 0.26;
const TW = 0.012;
const H = D + 2 * TF;

function section(axis: HSectionAxis): HSection {
  return hSection({ flangeWidthM: B, flangeThicknessM: TF, webDepthM: D, webThicknessM: TW, axis });
}

/** A uniform steel H pile segment, E = 210 GPa, ρ = 7850 kg/m³ (common steel values). */
function segment(axis: HSectionAxis, extra: Record<string, unknown> = {}) {
  return { fromM: 0, toM: 12, section: section(axis), youngsModulusPa: 210e9, densityKgPerM3: 7850, ...extra };
}

describe('H-section properties by parts', () => {
  // Hand-worked, classical by parts (W.C. Young and R.G. Budynas, Roark's Formulas for Stress and Strain,
  // 7th ed., Appendix A, properties of plane areas, from memory):
  //   A = 2·0.3·0.02 + 0.26·0.012 = 0.01512 m²
  //   I_strong = (0.3·0.3³ − 0.288·0.26³)/12 = (0.0081 − 0.005061888)/12 = 2.53176e-4 m⁴
  //     (cross-check by the parallel-axis theorem: flanges 2·(0.3·0.02³/12 + 0.006·0.14²) = 2.356e-4,
  //      web 0.012·0.26³/12 = 1.7576e-5, sum 2.53176e-4)
  //   I_weak = (2·0.02·0.3³ + 0.26·0.012³)/12 = 9.003744e-5 m⁴
  // With E = 1 and ρ = 1 the station properties are I and A themselves. Tolerance: rounding only (1e-12).
  const unit = { youngsModulusPa: 1, densityKgPerM3: 1, fromM: 0, toM: 1 };

  it('has the area and strong-axis second moment worked out by hand', () => {
    const p = sectionAt({ ...unit, section: section('strong') }, 0);
    expectClose(p.structureKgPerM, 0.01512, { rtol: 1e-12, label: 'A' });
    expectClose(p.eiNm2, 2.53176e-4, { rtol: 1e-12, label: 'I strong' });
    // Moving along the web: the flow meets the flange width; the depth along the motion is the overall depth.
    expectClose(p.outerWidthM, B, { rtol: 1e-12, label: 'width across the motion' });
    expectClose(p.depthM, H, { rtol: 1e-12, label: 'depth along the motion' });
  });

  it('has the weak-axis second moment worked out by hand, and the overall depth across the motion', () => {
    const p = sectionAt({ ...unit, section: section('weak') }, 0);
    expectClose(p.structureKgPerM, 0.01512, { rtol: 1e-12, label: 'A' });
    expectClose(p.eiNm2, 9.003744e-5, { rtol: 1e-12, label: 'I weak' });
    expectClose(p.outerWidthM, H, { rtol: 1e-12, label: 'width across the motion' });
    expectClose(p.depthM, B, { rtol: 1e-12, label: 'depth along the motion' });
  });

  it('gives the section solver an outline whose area is the section area (cross-check by the shoelace formula)', () => {
    for (const axis of ['strong', 'weak'] as const) {
      const body = shapeOf(section(axis)).solverBody(section(axis), 0);
      if (body.shape !== 'polygon') throw new Error(`expected a polygon outline, got ${body.shape}`);
      const flat = new Float64Array(body.pointsM.flat());
      expectClose(Math.abs(signedArea(flat)), 0.01512, { rtol: 1e-12, label: `outline area, ${axis} axis` });
    }
  });

  it('counts a coating as the offset outline: perimeter × c plus 4 c² for 8 convex and 4 re-entrant right-angle corners', () => {
    // Offset polygon with sharp corners (classical): ΔA = P c + c² Σ ±tan(90°/2) = P c + (8 − 4) c².
    // P = 4b + 4t_f + 2d − 2t_w = 1.2 + 0.08 + 0.52 − 0.024 = 1.776 m; c = 0.05 m -> ΔA = 0.0888 + 0.01 = 0.0988 m².
    const p = sectionAt({ ...unit, section: section('strong'), coating: { thicknessM: 0.05, densityKgPerM3: 1 } }, 0);
    expectClose(p.coatingKgPerM, 0.0988, { rtol: 1e-12, label: 'coating area' });
    expectClose(p.displacedAreaM2, 0.01512 + 0.0988, { rtol: 1e-12, label: 'displaced area' });
    expectClose(p.outerWidthM, B + 0.1, { rtol: 1e-12, label: 'width across the motion with coating' });
  });
});

describe('an H pile in the beam engine', () => {
  it('is read from member JSON, and a web thicker than the flanges are wide is refused by name', () => {
    const model = parseMemberModel({ lengthM: 12, segments: [segment('strong')], supports: [{ atM: 0, kind: 'clamped' }] });
    expect(model.segments[0].section).toEqual(section('strong'));
    const bad = { ...segment('strong'), section: { ...section('strong'), webThicknessM: 0.4 } };
    expect(() => parseMemberModel({ lengthM: 12, segments: [bad], supports: [{ atM: 0, kind: 'clamped' }] })).toThrow(
      'segments[0].section.webThicknessM must be less than flangeWidthM (0.3 m), got 0.4',
    );
    const noAxis = { ...segment('strong'), section: { ...section('strong'), axis: 'diagonal' } };
    expect(() => parseMemberModel({ lengthM: 12, segments: [noAxis], supports: [{ atM: 0, kind: 'clamped' }] })).toThrow(
      'segments[0].section.axis must be one of "strong", "weak", got "diagonal"',
    );
  });

  it('has the dry cantilever frequency f1 = 1.875104² / (2π L²) √(EI / m) on both axes', () => {
    // Euler–Bernoulli cantilever (classical; Blevins, Formulas for Natural Frequency and Mode Shape, Table 8-1).
    // The engine refines its mesh to 1e-4 in frequency by default (its own tolerance), so 1e-4 here.
    for (const [axis, i] of [['strong', 2.53176e-4], ['weak', 9.003744e-5]] as const) {
      const out = solveMember({ lengthM: 12, segments: [segment(axis)], supports: [{ atM: 0, kind: 'clamped' }] });
      if (!out.ok) throw new Error(out.message);
      const f1 = (1.875104 ** 2 / (2 * Math.PI * 144)) * Math.sqrt((210e9 * i) / (7850 * 0.01512));
      expectClose(out.result.dry.frequenciesHz[0], f1, { rtol: 1e-4, label: `f1 ${axis} axis` });
    }
  });

  it('takes its added mass from the section solver in open water, within the bounds its flange and enclosing square set', () => {
    const model: MemberModel = {
      lengthM: 12,
      segments: [segment('strong')],
      supports: [{ atM: 0, kind: 'clamped' }],
      liquid: { densityKgPerM3: 1025, fromM: 0, toM: 12 },
    };
    const out = solveMember(model);
    if (!out.ok) throw new Error(out.message);
    const zone = out.result.zones[0];
    expect(zone.addedMassMethod).toBe('section solver');
    // A plausibility range, not a published value. The virtual mass (added mass plus displaced liquid) of a body
    // grows when the body grows (Pólya and Szegő, Isoperimetric Inequalities in Mathematical Physics, 1951,
    // from memory), so the H lies between one flange alone (a flat plate of width b: Ca = 1 on π (b/2)², Lamb,
    // classical) and the enclosing 300 × 300 mm square (Ca = 1.51, DNV-RP-H103 Table A-1, from memory, plus its
    // own area b·h). In units of ρ π (b/2)²:
    const ref = (Math.PI * B * B) / 4;
    const virtual = zone.addedMassCoefficientCa! + 0.01512 / ref;
    expect(virtual).toBeGreaterThan(1);
    expect(virtual).toBeLessThan(1.51 + (B * H) / ref);
    expect(out.result.wet!.frequenciesHz[0]).toBeLessThan(out.result.dry.frequenciesHz[0]);
  });
});
