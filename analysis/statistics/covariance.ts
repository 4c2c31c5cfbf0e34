/** Means and sample covariance matrix [[xx, xy], [xy, yy]] of paired values. */
export interface Covariance2 {
  n: number;
  meanX: number;
  meanY: number;
  /** Sample (n − 1) variance of x. */
  xx: number;
  /** Sample (n − 1) covariance of x and y. */
  xy: number;
  /** Sample (n − 1) variance of y. */
  yy: number;
}

/**
 * Means and sample covariance of paired values x[i], y[i], i < n, by two passes (means first,
 * then products of deviations less the first pass's rounding error). O(n).
 * NIST/SEMATECH e-Handbook of Statistical Methods, §6.5.4.1 (mean vector and covariance matrix):
 * https://www.itl.nist.gov/div898/handbook/pmc/section5/pmc541.htm
 * @param n how many leading pairs to use (default the shorter length)
 * @throws RangeError when n < 2
 * @example sampleCovariance2([4.0, 4.2, 3.9, 4.3, 4.1], [2.0, 2.1, 2.0, 2.1, 2.2]).xy // => 0.0075
 */
export function sampleCovariance2(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  n = Math.min(x.length, y.length),
): Covariance2 {
  if (n < 2) throw new RangeError('sampleCovariance2 needs at least two pairs');
  let sx = 0;
  let sy = 0;
  for (let i = 0; i < n; i++) {
    sx += x[i];
    sy += y[i];
  }
  const meanX = sx / n;
  const meanY = sy / n;
  let dx = 0;
  let dy = 0;
  let xx = 0;
  let xy = 0;
  let yy = 0;
  for (let i = 0; i < n; i++) {
    const a = x[i] - meanX;
    const b = y[i] - meanY;
    dx += a;
    dy += b;
    xx += a * a;
    xy += a * b;
    yy += b * b;
  }
  const m = n - 1;
  return {
    n,
    meanX,
    meanY,
    xx: Math.max(0, (xx - (dx * dx) / n) / m),
    xy: (xy - (dx * dy) / n) / m,
    yy: Math.max(0, (yy - (dy * dy) / n) / m),
  };
}
