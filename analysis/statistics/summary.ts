import { meanVariance } from './mean-variance';
import { orderStatisticsInPlace } from './order-statistics';

/** Summary of one field in one group. JSON-able; `sd` is null when n < 2. */
export interface FieldSummary {
  n: number;
  mean: number;
  sd: number | null;
  median: number;
  min: number;
  max: number;
  q1: number;
  q3: number;
}

/**
 * Summary of values[0..n): count, mean, sample standard deviation (corrected two-pass), median,
 * extremes and quartiles (type 7). O(n) expected: two passes and three selections.
 * Reorders values in place (use `summarize` to keep the input as it is).
 * @param n how many leading values to use (default all)
 * @throws RangeError when n < 1
 * @example summarizeInPlace(Float64Array.of(1, 2, 3, 4)).q1 // => 1.75
 */
export function summarizeInPlace(values: Float64Array, n = values.length): FieldSummary {
  const { mean, variance } = meanVariance(values, 0, n);
  const order = orderStatisticsInPlace(values, n);
  return {
    n,
    mean,
    sd: n < 2 ? null : Math.sqrt(variance),
    median: order.median,
    min: order.min,
    max: order.max,
    q1: order.q1,
    q3: order.q3,
  };
}

/**
 * Summary (count, mean, sample sd, median, extremes, type-7 quartiles) of the finite values in
 * a list; NaN and ±Infinity are skipped as missing. O(n) expected, one copy.
 * https://www.itl.nist.gov/div898/strd/univ/homepage.html (accuracy reference)
 * @throws RangeError when no value is finite
 * @example summarize([10000001, 10000003, 10000002]) // => { n: 3, mean: 10000002, sd: 1, … }
 */
export function summarize(values: ArrayLike<number>): FieldSummary {
  const copy = new Float64Array(values.length);
  let n = 0;
  for (let i = 0; i < values.length; i++) {
    const x = values[i];
    if (Number.isFinite(x)) copy[n++] = x;
  }
  if (n === 0) throw new RangeError('summarize needs at least one finite value');
  return summarizeInPlace(copy, n);
}
