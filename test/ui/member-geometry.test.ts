import { describe, it, expect } from 'vitest';
import { zToY, segmentRects, shapePoints, outerWidthM, landmarkLabels } from '../../src/ui/plots/member-geometry';
import type { MemberModel } from '../../src/physics/beam/model';

const box = { widthPx: 200, heightPx: 420, padPx: 10 };
const model: MemberModel = {
  lengthM: 20,
  segments: [
    { fromM: 0, toM: 10, section: { shape: 'tube', outerDiameterM: 1, wallThicknessM: 0.02 }, youngsModulusPa: 210e9, densityKgPerM3: 7850 },
    { fromM: 10, toM: 20, section: { shape: 'rod', diameterM: 0.01 }, youngsModulusPa: 210e9, densityKgPerM3: 7850, coating: { thicknessM: 0.05, densityKgPerM3: 1325 } },
  ],
  supports: [{ atM: 0, kind: 'clamped' }],
};

describe('member schematic geometry', () => {
  it('puts z = 0 at the bottom and the top of the member at the top margin', () => {
    expect(zToY(0, 20, box)).toBe(410);
    expect(zToY(20, 20, box)).toBe(10);
    expect(zToY(10, 20, box)).toBe(210);
  });
  it('draws widths to the vertical scale, but never thinner than the minimum', () => {
    const [a, b] = segmentRects(model, box, 100);
    expect(a.width).toBeCloseTo(20, 10); // 1 m at 400 px / 20 m = 20 px
    expect(b.width).toBe(6); // 0.01 m would be 0.2 px: held at the 6 px minimum
    expect(a.coatPx).toBe(0);
    expect(b.coatPx).toBe(2); // 0.05 m × 20 px/m = 1 px, held at the 2 px minimum so growth shows
  });
  it('takes the plate thickness as the drawn width of a plate strip bending across it', () => {
    expect(outerWidthM({ shape: 'plate-strip', widthM: 1.5, thicknessM: 0.012 })).toBe(0.012);
  });
  it('scales a mode shape so its largest displacement reaches the amplitude', () => {
    const pts = shapePoints([0, 10, 20], [0, -0.25, 0.5], 20, box, 100, 80).split(' ');
    expect(pts).toEqual(['100.0,410.0', '60.0,210.0', '180.0,10.0']);
  });
  it('pushes close landmark labels apart and leaves out those beyond the member', () => {
    const labels = landmarkLabels(
      [
        { label: 'Top', zM: 20 },
        { label: 'Water surface', zM: 19.9 },
        { label: 'Mudline', zM: 5 },
        { label: 'Tank floor', zM: -0.5 },
      ],
      20,
      box,
    );
    expect(labels.map((l) => l.label)).toEqual(['Top', 'Water surface', 'Mudline']);
    for (let i = 1; i < labels.length; i++) expect(labels[i].yText - labels[i - 1].yText).toBeGreaterThanOrEqual(12);
    expect(labels[2].yLine).toBe(zToY(5, 20, box)); // the line stays at its true level
  });
});
