import { fCdf } from './distributions';
import type { SampleMoments } from './welch-t-test';

/** F test of equal variances, A over B. */
export interface VarianceRatioResult {
  /** sA² / sB² (the F statistic). */
  f: number;
  df1: number;
  df2: number;
  /** Two-sided p value, 2·min(P(F ≤ f), P(F ≥ f)). */
  p: number;
}

/**
 * F test for equality of two variances: F = sA²/sB² with (nA − 1, nB − 1) degrees of freedom,
 * two-sided p from jstat's F distribution. Assumes roughly normal data (it is sensitive to
 * heavy tails; strays are dropped first for that reason). O(1).
 * https://www.itl.nist.gov/div898/handbook/eda/section3/eda359.htm (NIST e-Handbook §1.3.5.9)
 * @throws RangeError when a sample has fewer than 2 values or sB is 0
 * @example varianceRatioTest({ n: 240, mean: 689.0, sd: 65.54909 }, { n: 240, mean: 611.2, sd: 61.85425 }) // => f 1.123037, p 0.3704
 */
export function varianceRatioTest(a: SampleMoments, b: SampleMoments): VarianceRatioResult {
  if (a.n < 2 || b.n < 2) throw new RangeError('varianceRatioTest needs at least two values in each sample');
  if (!(b.sd > 0)) throw new RangeError('varianceRatioTest needs a spread in sample B');
  const f = (a.sd * a.sd) / (b.sd * b.sd);
  const df1 = a.n - 1;
  const df2 = b.n - 1;
  const lower = fCdf(f, df1, df2);
  const p = Math.min(1, 2 * Math.min(lower, 1 - lower));
  return { f, df1, df2, p };
}
