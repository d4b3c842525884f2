/**
 * The added mass of several bodies moving in a chosen pattern, from the full added-mass matrix M (3 degrees of
 * freedom per body: x, y, rotation). With body velocities v (unit speed, signs by pattern) along one direction,
 * the liquid's force on body k is −(M v)_k per unit acceleration, so the added mass body k feels is
 * (M v)_k / v_k, and the pattern's total is vᵀ M v (twice the liquid's kinetic energy at unit speed; classical
 * potential-flow result, J. N. Newman, Marine Hydrodynamics, MIT Press 1977, chapter 4, added mass).
 */
export type MotionPattern = 'together' | 'opposition' | 'alone';
export type MotionAxis = 'x' | 'y';

export interface PatternMass {
  /** Added mass each body feels in the pattern, kg/m (per metre of length), in body order. */
  perBody: number[];
  /** vᵀ M v: the pattern's total added mass, kg/m ('alone': the sum of the bodies' own terms). */
  total: number;
}

/** Sign of body k's speed: all +1 together; alternating +1, −1 in opposition (neighbours in body order). */
function sign(pattern: MotionPattern, k: number): number {
  return pattern === 'opposition' && k % 2 === 1 ? -1 : 1;
}

export function patternAddedMass(matrix: readonly (readonly number[])[], pattern: MotionPattern, axis: MotionAxis): PatternMass {
  const n = Math.floor(matrix.length / 3);
  const d = axis === 'x' ? 0 : 1;
  const perBody: number[] = [];
  let total = 0;
  for (let k = 0; k < n; k++) {
    const i = 3 * k + d;
    if (pattern === 'alone') {
      perBody.push(matrix[i][i]); // the others held still: the body's own diagonal term
      total += matrix[i][i];
      continue;
    }
    let force = 0;
    for (let j = 0; j < n; j++) force += matrix[i][3 * j + d] * sign(pattern, j);
    perBody.push(force / sign(pattern, k));
    total += sign(pattern, k) * force;
  }
  return { perBody, total };
}
