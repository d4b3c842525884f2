import { describe, expect, it } from 'vitest';
import { solveSection, validateSectionInput, type SectionInput } from '../../../src/physics/section';
import { SECTION_PRESETS } from '../../../src/ui/section/presets';
import { readSectionForm } from '../../../src/ui/section/read-form';
import { expectClose } from '../../helpers/expect-close';

function presetInput(id: string): SectionInput {
  const p = SECTION_PRESETS.find((q) => q.id === id);
  if (!p) throw new Error(`no preset ${id}`);
  const r = readSectionForm(p.make());
  if (!r.input) throw new Error(`preset ${id} does not read: ${JSON.stringify(r.errors)}`);
  return r.input;
}

function solved(id: string) {
  const o = solveSection(presetInput(id), { skipErrorEstimate: true });
  if (!o.ok) throw new Error(o.message);
  return o.result;
}

describe('section presets', () => {
  it('offers the seven starting sections the brief names, in order', () => {
    expect(SECTION_PRESETS.map((p) => p.label)).toEqual([
      'Circle in open water',
      'Square',
      'Flat plate',
      'Stem in a pipe (annulus)',
      'Pile near the seabed',
      'Two piles side by side',
      'Half-immersed float',
    ]);
  });

  it('each reads without a message into an input the solver accepts', () => {
    for (const p of SECTION_PRESETS) {
      const r = readSectionForm(p.make());
      expect(r.errors, p.id).toEqual({});
      expect(r.input, p.id).not.toBeNull();
      expect(() => validateSectionInput(r.input!), p.id).not.toThrow();
    }
  });

  it('gives each preset fresh body ids, so two loads never share list keys', () => {
    const a = SECTION_PRESETS[5].make().bodies.map((b) => b.id);
    const b = SECTION_PRESETS[5].make().bodies.map((b) => b.id);
    expect(new Set([...a, ...b]).size).toBe(4);
  });

  it('stem in a pipe: Ca of the concentric annulus', () => {
    // Fritz (ASME J. Eng. Industry 94, 1972): Ca = (R2² + R1²)/(R2² − R1²) = (50² + 12.5²)/(50² − 12.5²) = 1.13333.
    // 1e-3: the solver's accuracy goal for the annulus at default resolution is 0.1 %.
    expectClose(solved('annulus').bodies[0].caX, (50 ** 2 + 12.5 ** 2) / (50 ** 2 - 12.5 ** 2), { rtol: 1e-3, label: 'annulus Ca' });
  });

  it('half-immersed float: heave Ca of one half in the high-frequency limit', () => {
    // Korotkin, Added Masses of Ship Structures (2009), ch. 5: half-immersed circle in heave with φ = 0 on the
    // surface, Ca = 0.5 on ρπR² (the wetted half-width is R). 1e-3: the solver's goal for circles.
    expectClose(solved('float').bodies[0].caY, 0.5, { rtol: 1e-3, label: 'half-immersed float heave Ca' });
  });

  it('flat plate: heave Ca between the zero-thickness plate and a 10 : 1 rectangle', () => {
    // Zero thickness: Ca = 1 (classical, Lamb). Width/thickness 10: Ca = 1.14 (DNV-RP-C205 App. D table, from
    // memory, docs/sources.md §S3). The preset's 1000 × 10 mm plate is far thinner, so it lies between, near 1.
    const ca = solved('plate').bodies[0].caY;
    expect(ca).toBeGreaterThan(1);
    expect(ca).toBeLessThan(1.14);
  });

  it('two piles side by side are coupled, symmetrically', () => {
    const r = solved('pair');
    const m = r.addedMass;
    expect(m).toHaveLength(6);
    // Mirror symmetry about x = 0: equal diagonal terms; a non-zero coupling between the two x motions.
    expectClose(m[3][3], m[0][0], { rtol: 1e-9, label: 'equal sway terms' });
    expect(Math.abs(m[0][3])).toBeGreaterThan(0.01 * m[0][0]);
  });
});
