import { quickselect } from 'simple-statistics';

/** Minimum, quartiles (linear interpolation, R type 7) and maximum. */
export interface OrderStatistics {
  min: number;
  q1: number;
  median: number;
  q3: number;
  max: number;
}

// simple-statistics types quickselect for number[]; it only indexes and swaps, so a
// Float64Array works the same.
const quickselectTyped = quickselect as unknown as (values: Float64Array, k: number, left: number, right: number) => void;

/** Put the k-th smallest of values[left..right] at k. quickselect reads right = 0 as "the whole
 * array", so a range of one value is left alone here. */
function select(values: Float64Array, k: number, left: number, right: number): void {
  if (right > left) quickselectTyped(values, k, left, right);
}

/** Smallest value in values[from..to] (inclusive). */
function minimumIn(values: Float64Array, from: number, to: number): number {
  let m = values[from];
  for (let i = from + 1; i <= to; i++) if (values[i] < m) m = values[i];
  return m;
}

/** Largest value in values[from..to] (inclusive). */
function maximumIn(values: Float64Array, from: number, to: number): number {
  let m = values[from];
  for (let i = from + 1; i <= to; i++) if (values[i] > m) m = values[i];
  return m;
}

/**
 * Type-7 quantile at p of values[0..n) once values[k] holds the k-th smallest value and all
 * larger indices hold values ≥ it (a partition from a selection). hi is the last index of that
 * partition, so the next order statistic is the minimum of (k, hi].
 */
function quantileAfterSelect(values: Float64Array, n: number, p: number, k: number, hi: number): number {
  const h = (n - 1) * p;
  const fraction = h - k;
  if (fraction === 0 || k >= hi) return values[k];
  const next = minimumIn(values, k + 1, hi);
  return values[k] + fraction * (next - values[k]);
}

/**
 * Minimum, first quartile, median, third quartile and maximum of values[0..n), by three
 * selections (Floyd–Rivest, simple-statistics' quickselect) instead of a sort: O(n) expected.
 * Quantiles interpolate linearly between order statistics (Hyndman & Fan 1996, type 7; R's
 * default, simple-statistics' quantileSorted). Reorders values in place.
 * https://simple-statistics.github.io/docs/#quickselect
 * @param n how many leading values to use (default all)
 * @throws RangeError when n < 1
 * @example orderStatisticsInPlace(Float64Array.of(5, 1, 4, 2, 3)) // => { min: 1, q1: 2, median: 3, q3: 4, max: 5 }
 */
export function orderStatisticsInPlace(values: Float64Array, n = values.length): OrderStatistics {
  if (n < 1) throw new RangeError('orderStatisticsInPlace needs at least one value');
  const last = n - 1;
  if (n === 1) return { min: values[0], q1: values[0], median: values[0], q3: values[0], max: values[0] };
  const kMedian = Math.floor(last * 0.5);
  select(values, kMedian, 0, last);
  const median = quantileAfterSelect(values, n, 0.5, kMedian, last);
  const kQ1 = Math.floor(last * 0.25);
  if (kQ1 < kMedian) select(values, kQ1, 0, kMedian - 1);
  const q1 = quantileAfterSelect(values, n, 0.25, kQ1, kQ1 < kMedian ? kMedian : last);
  const kQ3 = Math.floor(last * 0.75);
  if (kQ3 > kMedian) select(values, kQ3, kMedian + 1, last);
  const q3 = quantileAfterSelect(values, n, 0.75, kQ3, last);
  const min = kQ1 > 0 ? minimumIn(values, 0, kQ1) : values[0];
  const max = maximumIn(values, kQ3, last);
  return { min, q1, median, q3, max };
}

/**
 * Median of values[0..n) by selection (type 7: the mean of the two middle values when n is
 * even). O(n) expected. Reorders values in place.
 * @throws RangeError when n < 1
 * @example medianInPlace(Float64Array.of(3, 1, 2, 10)) // => 2.5
 */
export function medianInPlace(values: Float64Array, n = values.length): number {
  if (n < 1) throw new RangeError('medianInPlace needs at least one value');
  const last = n - 1;
  const k = Math.floor(last * 0.5);
  select(values, k, 0, last);
  return quantileAfterSelect(values, n, 0.5, k, last);
}
