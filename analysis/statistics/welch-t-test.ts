import { studentTCdf, studentTQuantile } from './distributions';

/** n, mean and sample standard deviation of one sample. */
export interface SampleMoments {
  n: number;
  mean: number;
  sd: number;
}

/** Welch's unequal-variance t-test of A − B. */
export interface WelchResult {
  /** meanA − meanB */
  diff: number;
  /** Standard error of the difference, sqrt(sA²/nA + sB²/nB). */
  se: number;
  t: number;
  /** Welch–Satterthwaite degrees of freedom (not whole in general). */
  df: number;
  /** Two-sided p value. */
  p: number;
  /** Confidence interval of the difference at `level`. */
  ci: [number, number];
  level: number;
}

/**
 * Welch's two-sample t-test and confidence interval for the difference of means, from each
 * sample's n, mean and sd: t = (x̄A − x̄B)/se, df by Welch–Satterthwaite, p two-sided from
 * Student's t (jstat). O(1).
 * https://www.itl.nist.gov/div898/handbook/eda/section3/eda353.htm (NIST e-Handbook §1.3.5.3)
 * @throws RangeError when a sample has fewer than 2 values, when both sds are 0, or when
 *   level is not in (0, 1)
 * @example welchTTest({ n: 4, mean: 25, sd: 0.8185 }, { n: 8, mean: 21, sd: 4.2083 }) // => t 2.5922, df 7.9925, p 0.0320
 */
export function welchTTest(a: SampleMoments, b: SampleMoments, level = 0.95): WelchResult {
  if (a.n < 2 || b.n < 2) throw new RangeError('welchTTest needs at least two values in each sample');
  if (!(level > 0 && level < 1)) throw new RangeError('welchTTest: level must lie in (0, 1)');
  const va = (a.sd * a.sd) / a.n;
  const vb = (b.sd * b.sd) / b.n;
  const se2 = va + vb;
  if (!(se2 > 0)) throw new RangeError('welchTTest needs a spread in at least one sample');
  const se = Math.sqrt(se2);
  const diff = a.mean - b.mean;
  const t = diff / se;
  const df = (se2 * se2) / ((va * va) / (a.n - 1) + (vb * vb) / (b.n - 1));
  const p = Math.min(1, 2 * studentTCdf(-Math.abs(t), df));
  const half = studentTQuantile(0.5 + level / 2, df) * se;
  return { diff, se, t, df, p, ci: [diff - half, diff + half], level };
}
