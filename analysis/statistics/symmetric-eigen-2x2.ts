/** Eigen decomposition of a symmetric 2×2 matrix [[a, b], [b, c]]. */
export interface SymmetricEigen2 {
  /** The larger eigenvalue. */
  major: number;
  /** The smaller eigenvalue. */
  minor: number;
  /**
   * Angle of the major eigenvector from the first axis toward the second, in (−90, 90] degrees.
   * 0 when the matrix is a multiple of the identity (every direction is an eigenvector).
   */
  majorAngleDeg: number;
}

/**
 * Closed-form eigen decomposition of the symmetric matrix [[a, b], [b, c]]:
 * λ = (a + c)/2 ± hypot((a − c)/2, b), major axis at ½·atan2(2b, a − c) from the first axis.
 * O(1). https://en.wikipedia.org/wiki/Eigenvalue_algorithm#2%C3%972_matrices
 * @throws RangeError when an entry is not finite
 * @example eigenSymmetric2x2(0.025, 0.0075, 0.007) // => { major: 0.0277154, minor: 0.0042846, majorAngleDeg: 19.903 }
 */
export function eigenSymmetric2x2(a: number, b: number, c: number): SymmetricEigen2 {
  if (!Number.isFinite(a) || !Number.isFinite(b) || !Number.isFinite(c)) {
    throw new RangeError('eigenSymmetric2x2 needs finite entries');
  }
  const mean = (a + c) / 2;
  const radius = Math.hypot((a - c) / 2, b);
  const major = mean + radius;
  const minor = mean - radius;
  let majorAngleDeg = radius === 0 ? 0 : (0.5 * Math.atan2(2 * b, a - c) * 180) / Math.PI;
  if (majorAngleDeg <= -90) majorAngleDeg += 180;
  return { major, minor, majorAngleDeg };
}
