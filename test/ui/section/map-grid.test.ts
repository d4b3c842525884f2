import { describe, expect, it } from 'vitest';
import type { SectionInput } from '../../../src/physics/section';
import { MAP_CELLS, MAX_ASPECT, mapView } from '../../../src/ui/section/map-grid';
import { expectClose } from '../../helpers/expect-close';

const circle = (boundaries?: SectionInput['boundaries']): SectionInput => ({
  liquidDensityKgPerM3: 1025,
  bodies: [{ shape: 'circle', diameterM: 1 }],
  ...(boundaries ? { boundaries } : {}),
});

function checkCells(v: ReturnType<typeof mapView>) {
  const { box, grid, cell } = v;
  // Whole square cells tile the box and the grid points are their centres (round-off tolerance).
  expectClose(box[2] - box[0], grid.nx * cell, { rtol: 1e-12, label: 'box width = nx cells' });
  expectClose(box[3] - box[1], grid.ny * cell, { rtol: 1e-12, label: 'box height = ny cells' });
  expectClose(grid.x0, box[0] + cell / 2, { rtol: 1e-12, atol: 1e-15, label: 'first x at a cell centre' });
  expectClose(grid.y1, box[3] - cell / 2, { rtol: 1e-12, atol: 1e-15, label: 'last y at a cell centre' });
  expect(Math.max(grid.nx, grid.ny)).toBe(MAP_CELLS);
}

describe('the drawn and mapped region', () => {
  it('spans three body sizes across a body in open water, in 80 square cells', () => {
    // The view's own rule (three body sizes, 80 cells): a design choice, no source; exact arithmetic for a 1 m circle.
    const v = mapView(circle());
    checkCells(v);
    expect(v.grid.nx).toBe(80);
    expect(v.grid.ny).toBe(80);
    expectClose(v.box[2] - v.box[0], 3, { rtol: 1e-12, label: 'width, m' });
    expectClose(v.box[0], -1.5, { rtol: 1e-12, label: 'left edge, m' });
  });

  it('does not depend on where the section sits', () => {
    // Translation invariance (property test): the box moves with the body, exactly.
    const a = mapView(circle());
    const b = mapView({ ...circle(), bodies: [{ shape: 'circle', diameterM: 1, centerM: [10, -4] }] });
    expect(b.grid.nx).toBe(a.grid.nx);
    expectClose(b.box[0] - a.box[0], 10, { rtol: 1e-12, label: 'shifted by x' });
    expectClose(b.box[1] - a.box[1], -4, { rtol: 1e-12, label: 'shifted by y' });
  });

  it('shows a whole enclosure with a small margin', () => {
    const v = mapView(circle([{ kind: 'enclosure', shape: 'circle', diameterM: 4, centerM: [0.5, 0] }]));
    checkCells(v);
    expect(v.box[0]).toBeLessThan(-1.5);
    expect(v.box[2]).toBeGreaterThan(2.5);
    // Margin 4 % of the enclosure each side, then whole cells: under 5 % of 4 m.
    expect(v.box[2] - v.box[0]).toBeLessThan(4 * 1.1);
  });

  it('caps a huge enclosure at four body sizes from the bodies', () => {
    const v = mapView(circle([{ kind: 'enclosure', shape: 'circle', diameterM: 100 }]));
    expectClose(v.box[2] - v.box[0], 9, { rtol: 0.02, label: 'capped width (cells round it)' });
  });

  it('brings a nearby seabed into view and keeps only a thin strip below it', () => {
    const v = mapView(circle([{ kind: 'wall', pointM: [0, -1.8], normal: [0, 1] }]));
    checkCells(v);
    expect(v.box[1]).toBeLessThan(-1.8);
    expect(v.box[1]).toBeGreaterThan(-1.8 - 0.25);
  });

  it('trims the dry side above a free surface through the body', () => {
    const v = mapView(circle([{ kind: 'free-surface', pointM: [0, 0], normal: [0, -1] }]));
    checkCells(v);
    expect(v.box[3]).toBeGreaterThan(0);
    expect(v.box[3]).toBeLessThan(0.25);
    expect(v.box[1]).toBeLessThan(-1.4);
  });

  it('leaves out a wall too far away to matter', () => {
    const far = mapView(circle([{ kind: 'wall', pointM: [0, -20], normal: [0, 1] }]));
    const open = mapView(circle());
    expect(far.box).toEqual(open.box);
  });

  it('keeps a long row of bodies from turning into a thin strip', () => {
    const row: SectionInput = {
      liquidDensityKgPerM3: 1025,
      bodies: Array.from({ length: 6 }, (_, k) => ({ shape: 'circle' as const, diameterM: 0.5, centerM: [k * 2, 0] as const })),
    };
    const v = mapView(row);
    checkCells(v);
    const w = v.box[2] - v.box[0], h = v.box[3] - v.box[1];
    // Whole cells may add up to one cell to the short side.
    expect(w / h).toBeLessThanOrEqual(MAX_ASPECT + 0.05);
  });
});
