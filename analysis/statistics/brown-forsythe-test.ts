import { fCdf, studentTQuantile } from './distributions';
import { medianInPlace } from './order-statistics';

/** The Brown–Forsythe test of equal spread across groups. */
export interface BrownForsytheResult {
  /** The test statistic W (an F statistic on the absolute deviations from each group's median). */
  w: number;
  df1: number;
  df2: number;
  /** Upper-tail p value from F(df1, df2). */
  p: number;
  /** Mean absolute deviation from the group's median, per group (the spread being compared). */
  meanAbsoluteDeviations: number[];
}

function finite(values: ArrayLike<number>): Float64Array {
  const out = new Float64Array(values.length);
  let n = 0;
  for (let i = 0; i < values.length; i++) if (Number.isFinite(values[i])) out[n++] = values[i];
  return out.subarray(0, n);
}

/** z_ij = |y_ij − median_i| of one group. */
function absoluteDeviations(values: Float64Array): Float64Array {
  const median = medianInPlace(Float64Array.from(values), values.length);
  return values.map((v) => Math.abs(v - median));
}

/**
 * Brown–Forsythe test (Levene's test on deviations from the median): z_ij = |y_ij − median_i|,
 * W = ((N − k)/(k − 1))·Σ n_i(z̄_i − z̄)² / ΣΣ(z_ij − z̄_i)², p = P(F(k − 1, N − k) > W) by jstat.
 * Robust to the skewed, heavy-tailed spreads of real data, where the F test of variances is not.
 * Brown & Forsythe, "Robust tests for the equality of variances", JASA 69 (1974) 364–367;
 * NIST/SEMATECH e-Handbook §1.3.5.10. Non-finite values are skipped. O(N) expected.
 * https://www.itl.nist.gov/div898/handbook/eda/section3/eda35a.htm
 * @throws RangeError with fewer than 2 groups, a group of fewer than 2 values, or no spread at all
 * @example brownForsytheTest(gearBatches).w // => 1.705910 (NIST's GEAR data, 10 batches of 10)
 */
export function brownForsytheTest(groups: readonly ArrayLike<number>[]): BrownForsytheResult {
  const k = groups.length;
  if (k < 2) throw new RangeError('brownForsytheTest needs at least two groups');
  const z = groups.map((g) => {
    const values = finite(g);
    if (values.length < 2) throw new RangeError('brownForsytheTest needs at least two values in every group');
    return absoluteDeviations(values);
  });
  let total = 0;
  let sum = 0;
  const means = z.map((zi) => {
    let s = 0;
    for (let j = 0; j < zi.length; j++) s += zi[j];
    total += zi.length;
    sum += s;
    return s / zi.length;
  });
  const grand = sum / total;
  let between = 0;
  let within = 0;
  z.forEach((zi, i) => {
    between += zi.length * (means[i] - grand) ** 2;
    for (let j = 0; j < zi.length; j++) within += (zi[j] - means[i]) ** 2;
  });
  if (!(within > 0)) throw new RangeError('brownForsytheTest needs some spread in the deviations');
  const df1 = k - 1;
  const df2 = total - k;
  const w = (df2 / df1) * (between / within);
  return { w, df1, df2, p: 1 - fCdf(w, df1, df2), meanAbsoluteDeviations: means };
}

/** Two groups' spreads compared as the Brown–Forsythe test does, with an interval. */
export interface SpreadDifference extends BrownForsytheResult {
  /** Mean absolute deviation from the median of A less B's. */
  diff: number;
  /** Its confidence interval (pooled t on the absolute deviations; excludes 0 exactly when p < 1 − level). */
  ci: [number, number];
  /** The pooled sd of the absolute deviations, per shot. */
  pooledSd: number;
  nA: number;
  nB: number;
}

/**
 * The spread of A against B as the Brown–Forsythe test sees it: the difference of the mean
 * absolute deviations from each group's median, with its confidence interval from the pooled
 * two-sample t on those deviations. For two groups W = t², so the interval excludes 0 exactly
 * when the test's p is below 1 − level. O(n) expected.
 * @throws RangeError as brownForsytheTest, or when level is not in (0, 1)
 * @example spreadDifference(offlineA, offlineB).ci // => [1.2, 6.8] (A spreads more)
 */
export function spreadDifference(a: ArrayLike<number>, b: ArrayLike<number>, level = 0.95): SpreadDifference {
  if (!(level > 0 && level < 1)) throw new RangeError('spreadDifference: level must lie in (0, 1)');
  const test = brownForsytheTest([a, b]);
  const nA = finite(a).length;
  const nB = finite(b).length;
  const [zA, zB] = test.meanAbsoluteDeviations;
  const pooledVariance = test.df2 > 0 ? withinVariance([a, b]) : Number.NaN;
  const pooledSd = Math.sqrt(pooledVariance);
  const se = pooledSd * Math.sqrt(1 / nA + 1 / nB);
  const half = studentTQuantile(0.5 + level / 2, nA + nB - 2) * se;
  const diff = zA - zB;
  return { ...test, diff, ci: [diff - half, diff + half], pooledSd, nA, nB };
}

/** The pooled within-group variance of the absolute deviations from the medians. */
function withinVariance(groups: readonly ArrayLike<number>[]): number {
  let within = 0;
  let total = 0;
  for (const g of groups) {
    const zi = absoluteDeviations(finite(g));
    let s = 0;
    for (let j = 0; j < zi.length; j++) s += zi[j];
    const m = s / zi.length;
    for (let j = 0; j < zi.length; j++) within += (zi[j] - m) ** 2;
    total += zi.length;
  }
  return within / (total - groups.length);
}
