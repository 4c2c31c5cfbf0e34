/** Count, mean and sample variance of a run of values. */
export interface MeanVariance {
  n: number;
  mean: number;
  /** Bessel-corrected (n − 1) variance; NaN when n < 2. */
  variance: number;
}

/**
 * Mean and sample variance by the corrected two-pass algorithm: the mean first, then the sum of
 * squared deviations less the rounding error of the first pass, (Σd)²/n. Stable on data with a
 * large mean and a tiny spread (NIST StRD NumAcc3). O(n), two passes, no allocation.
 * Chan, Golub & LeVeque, "Algorithms for computing the sample variance", Am. Stat. 37 (1983), eq. 1.7.
 * https://en.wikipedia.org/wiki/Algorithms_for_calculating_variance#Two-pass_algorithm
 * @param start first index (default 0); @param end one past the last index (default length)
 * @throws RangeError when the run is empty
 * @example meanVariance([2, 4, 4, 4, 5, 5, 7, 9]) // => { n: 8, mean: 5, variance: 4.571… }
 */
export function meanVariance(values: ArrayLike<number>, start = 0, end = values.length): MeanVariance {
  const n = end - start;
  if (n <= 0) throw new RangeError('meanVariance needs at least one value');
  let sum = 0;
  for (let i = start; i < end; i++) sum += values[i];
  const mean = sum / n;
  if (n < 2) return { n, mean, variance: Number.NaN };
  let squares = 0;
  let deviations = 0;
  for (let i = start; i < end; i++) {
    const d = values[i] - mean;
    squares += d * d;
    deviations += d;
  }
  const variance = (squares - (deviations * deviations) / n) / (n - 1);
  return { n, mean, variance: variance > 0 ? variance : 0 };
}
