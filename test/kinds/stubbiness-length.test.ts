import { describe, expect, it } from 'vitest';
import { stubbinessLengthM } from '../../src/kinds/common/theory';

/** Half-wavelengths of classical mode shapes: a span between supports bends over at most its length, a cantilever overhang over about twice it. */
describe('the length that decides stubbiness', () => {
  it('is the member length with supports only at the ends', () => {
    expect(stubbinessLengthM(40, [0, 40])).toBe(40);
    expect(stubbinessLengthM(40, [0])).toBe(40);
  });

  it('is the shortest span between supports', () => {
    expect(stubbinessLengthM(40, [0, 10, 12, 40])).toBe(2);
  });

  it('counts a free overhang as twice its length (a cantilever bends over a quarter-wave)', () => {
    expect(stubbinessLengthM(40, [0, 38])).toBe(4);
  });
});
