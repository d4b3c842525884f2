import { describe, expect, it } from 'vitest';
import { newBody, openWater, type BodyForm, type SectionForm } from '../../../src/ui/section/form';
import { readPoints, readSectionForm } from '../../../src/ui/section/read-form';
import { expectClose } from '../../helpers/expect-close';

const form = (bodies: BodyForm[], surround = openWater(), density = '1025'): SectionForm => ({ density, bodies, surround });
const errorsOf = (f: SectionForm) => readSectionForm(f).errors;

describe('reading the section form into a solver input', () => {
  it('turns millimetres into metres and keeps the centre', () => {
    const r = readSectionForm(form([newBody('circle', { diameter: '610', x: '-1200', y: '300' })]));
    expect(r.errors).toEqual({});
    expect(r.input).toEqual({ liquidDensityKgPerM3: 1025, bodies: [{ shape: 'circle', diameterM: 0.61, centerM: [-1.2, 0.3] }] });
  });

  it('reads typed units: inches, metres and a density in lb/ft³', () => {
    const r = readSectionForm(form([newBody('rectangle', { width: '24 in', height: '0.3 m', angle: '30' })], openWater(), '64 lb/ft^3'));
    const b = r.input!.bodies[0];
    if (b.shape !== 'rectangle') throw new Error('expected a rectangle');
    // 1 in = 25.4 mm exactly (international inch, 1959).
    expectClose(b.widthM, 0.6096, { rtol: 1e-12, label: 'width from inches' });
    expectClose(b.heightM, 0.3, { rtol: 1e-12, label: 'height from metres' });
    expectClose(b.angleDeg!, 30, { rtol: 1e-12, label: 'angle in degrees' });
    // 1 lb/ft³ = 0.45359237 kg / 0.3048³ m³ = 16.0185 kg/m³ (exact definitions).
    expectClose(r.input!.liquidDensityKgPerM3, (64 * 0.45359237) / 0.3048 ** 3, { rtol: 1e-12, label: 'density' });
  });

  it('takes an empty centre, angle or corner radius as 0 and leaves sharp corners out of the input', () => {
    const r = readSectionForm(form([newBody('rectangle', { x: '', y: '', angle: '', cornerRadius: '' })]));
    expect(r.input!.bodies[0]).toEqual({ shape: 'rectangle', widthM: 0.5, heightM: 0.5, centerM: [0, 0], angleDeg: 0 });
  });

  it('places polygon points relative to the centre, which is the rotation reference', () => {
    const r = readSectionForm(form([newBody('polygon', { points: '0 300, -200 0, 0 -300, 200 0', x: '1000', y: '-500', angle: '15' })]));
    const b = r.input!.bodies[0];
    if (b.shape !== 'polygon') throw new Error('expected a polygon');
    expect(b.centerM).toEqual([1, -0.5]);
    expect(b.angleDeg).toBe(15);
    const expected = [
      [1, -0.2],
      [0.8, -0.5],
      [1, -0.8],
      [1.2, -0.5],
    ];
    // Sums of mm values converted to m: equal to round-off.
    b.pointsM.forEach((p, k) => {
      expectClose(p[0], expected[k][0], { atol: 1e-15, label: `point ${k} x` });
      expectClose(p[1], expected[k][1], { atol: 1e-15, label: `point ${k} y` });
    });
  });

  it('builds walls, a free surface and an enclosure with normals into the liquid', () => {
    const s = openWater({
      wallBelow: true,
      wallBelowDistance: '900',
      wallBeside: true,
      wallBesideSide: 'left',
      wallBesideDistance: '2000',
      enclosure: 'rectangle',
      enclosureWidth: '6000',
      enclosureHeight: '4000',
      enclosureY: '500',
    });
    const r = readSectionForm(form([newBody('circle')], s));
    expect(r.errors).toEqual({});
    expect(r.input!.boundaries).toEqual([
      { kind: 'wall', pointM: [0, -0.9], normal: [0, 1] },
      { kind: 'wall', pointM: [-2, 0], normal: [1, 0] },
      { kind: 'enclosure', shape: 'rectangle', widthM: 6, heightM: 4, centerM: [0, 0.5] },
    ]);
    expect(r.boundaryNames).toEqual(['the wall below', 'the wall to the left', 'the enclosure']);
    const surface = readSectionForm(form([newBody('circle', { diameter: '1000' })], openWater({ freeSurface: true, freeSurfaceDistance: '0' })));
    expect(surface.input!.boundaries).toEqual([{ kind: 'free-surface', pointM: [0, 0], normal: [0, -1] }]);
  });
});

describe('messages beside the fields', () => {
  it('names what a size field expected', () => {
    const b = newBody('circle', { diameter: '' });
    expect(errorsOf(form([b]))).toEqual({ [`body.${b.id}.diameter`]: 'enter a length such as 610 mm or 24 in' });
    const c = newBody('ellipse', { width: '-5' });
    expect(errorsOf(form([c]))).toEqual({ [`body.${c.id}.width`]: 'must be more than 0, got -5' });
    const d = newBody('plate', { thickness: '10 kg' });
    expect(errorsOf(form([d]))).toEqual({ [`body.${d.id}.thickness`]: 'expected a length such as 610 mm or 24 in, got a mass (10 kg)' });
  });

  it('bounds the corner radius by half the smaller side, in mm', () => {
    const b = newBody('rectangle', { width: '400', height: '200', cornerRadius: '120' });
    expect(errorsOf(form([b]))).toEqual({ [`body.${b.id}.cornerRadius`]: 'must be at most half the smaller side (100 mm)' });
    const c = newBody('rectangle', { cornerRadius: '-1' });
    expect(errorsOf(form([c]))).toEqual({ [`body.${c.id}.cornerRadius`]: 'must be 0 or more, got -1' });
  });

  it('says which polygon point does not read', () => {
    expect(readPoints('0 300, -200, 0 -300')).toEqual({ ok: false, message: 'point 2 ("-200"): write two numbers in mm, x then y, such as 120 -40' });
    expect(readPoints('0 0, 10 0')).toEqual({ ok: false, message: 'list at least 3 points "x y" separated by commas, got 2' });
    const bad = readPoints('0 0; 10 abc; 0 10');
    expect(bad.ok).toBe(false);
    expect(!bad.ok && bad.message).toMatch(/^point 2 \("10 abc"\): "abc" is not a unit Wetmode knows/);
    // Semicolons separate points, so decimal commas may be used.
    expect(readPoints('0 0; 12,5 0; 0 10')).toEqual({ ok: true, pointsM: [[0, 0], [0.0125, 0], [0, 0.01]] });
  });

  it('checks the density and the enclosure size', () => {
    expect(errorsOf(form([newBody('circle')], openWater(), '0'))).toEqual({ density: 'must be more than 0, got 0' });
    expect(errorsOf(form([newBody('circle')], openWater({ enclosure: 'circle', enclosureDiameter: '0' })))).toEqual({
      'surround.enclosureDiameter': 'must be more than 0, got 0',
    });
  });

  it('asks for at least one body', () => {
    expect(readSectionForm(form([]))).toMatchObject({ input: null, errors: { bodies: 'add at least one body' } });
  });

  it('solves nothing while any field has a message', () => {
    const r = readSectionForm(form([newBody('circle'), newBody('circle', { x: '2000', diameter: 'abc' })]));
    expect(r.input).toBeNull();
  });
});

describe('geometry checks in the editor’s words', () => {
  it('puts an overlap beside the first body it names, counting from 1', () => {
    const a = newBody('circle', { diameter: '1000' });
    const b = newBody('circle', { diameter: '1000', x: '500' });
    expect(errorsOf(form([a, b]))).toEqual({ [`body.${a.id}`]: 'Body 1 and body 2 overlap or touch; bodies must be apart' });
  });

  it('numbers the edges and points of a self-intersecting outline as typed', () => {
    const p = newBody('polygon', { points: '0 0, 100 100, 100 0, 0 100' });
    expect(errorsOf(form([p]))).toEqual({
      [`body.${p.id}`]: 'The outline of body 1 is self-intersecting: edge 1 (points 1–2) crosses edge 3 (points 3–4)',
    });
  });

  it('names a body outside its enclosure', () => {
    const b = newBody('circle', { diameter: '25', x: '45' });
    expect(errorsOf(form([b], openWater({ enclosure: 'circle', enclosureDiameter: '100' })))).toEqual({
      [`body.${b.id}`]: 'Body 1 touches or crosses the enclosure; a body standing on the tank floor needs a wall boundary along the floor',
    });
  });

  it('explains why a wall below and a free surface above need an enclosure', () => {
    const e = errorsOf(form([newBody('circle')], openWater({ wallBelow: true, freeSurface: true })));
    expect(e).toEqual({
      'surround.wallBelowDistance':
        'The wall below and the free surface are not perpendicular: without an enclosure two straight boundaries must cross at right angles (parallel or oblique pairs need an infinite image series); add an enclosure to close the region',
    });
  });
});
