import { jStat } from 'jstat';

function checkProbability(p: number, name: string): void {
  if (!(p > 0 && p < 1)) throw new RangeError(`${name}: probability must lie in (0, 1), got ${p}`);
}

function checkDegrees(df: number, name: string): void {
  if (!(df > 0) || !Number.isFinite(df)) throw new RangeError(`${name}: degrees of freedom must be positive, got ${df}`);
}

/**
 * Quantile of the χ² distribution with 2 degrees of freedom, closed form −2·ln(1 − p)
 * (an exponential with mean 2). O(1).
 * https://en.wikipedia.org/wiki/Chi-squared_distribution
 * @throws RangeError when p is not in (0, 1)
 * @example chiSquare2Quantile(0.95) // => 5.991464547
 */
export function chiSquare2Quantile(p: number): number {
  checkProbability(p, 'chiSquare2Quantile');
  return -2 * Math.log1p(-p);
}

/**
 * Quantile of the F distribution with 2 numerator and m denominator degrees of freedom,
 * closed form (m/2)·((1 − p)^(−2/m) − 1). O(1).
 * https://en.wikipedia.org/wiki/F-distribution
 * @throws RangeError when p is not in (0, 1) or m ≤ 0
 * @example fQuantile2(8, 0.95) // => 4.458970
 */
export function fQuantile2(m: number, p: number): number {
  checkProbability(p, 'fQuantile2');
  checkDegrees(m, 'fQuantile2');
  return (m / 2) * Math.expm1((-2 / m) * Math.log1p(-p));
}

/**
 * Cumulative distribution of Student's t with df degrees of freedom (df need not be whole), by
 * jstat's incomplete beta function. O(1).
 * https://jstat.github.io/distributions.html#jStat.studentt
 * @throws RangeError when df ≤ 0
 * @example studentTCdf(-2.5922, 7.9925) // => 0.016
 */
export function studentTCdf(t: number, df: number): number {
  checkDegrees(df, 'studentTCdf');
  if (t === Number.POSITIVE_INFINITY) return 1;
  if (t === Number.NEGATIVE_INFINITY) return 0;
  return jStat.studentt.cdf(t, df);
}

/**
 * Quantile of Student's t with df degrees of freedom (jstat). O(1).
 * https://jstat.github.io/distributions.html#jStat.studentt
 * @throws RangeError when p is not in (0, 1) or df ≤ 0
 * @example studentTQuantile(0.975, 10) // => 2.228139
 */
export function studentTQuantile(p: number, df: number): number {
  checkProbability(p, 'studentTQuantile');
  checkDegrees(df, 'studentTQuantile');
  return jStat.studentt.inv(p, df);
}

/**
 * Cumulative distribution of F with df1 and df2 degrees of freedom (jstat). O(1).
 * https://jstat.github.io/distributions.html#jStat.centralF
 * @throws RangeError when a df ≤ 0
 * @example fCdf(1.123037, 239, 239) // => 0.814808
 */
export function fCdf(x: number, df1: number, df2: number): number {
  checkDegrees(df1, 'fCdf');
  checkDegrees(df2, 'fCdf');
  if (x <= 0) return 0;
  if (x === Number.POSITIVE_INFINITY) return 1;
  return jStat.centralF.cdf(x, df1, df2);
}

/**
 * Quantile of the standard normal distribution (jstat). O(1).
 * https://jstat.github.io/distributions.html#jStat.normal
 * @throws RangeError when p is not in (0, 1)
 * @example normalQuantile(0.975) // => 1.959964
 */
export function normalQuantile(p: number): number {
  checkProbability(p, 'normalQuantile');
  return jStat.normal.inv(p, 0, 1);
}
