import { medianInPlace } from './order-statistics';

/** 1.4826 ≈ 1/Φ⁻¹(0.75): the MAD times this estimates σ for normal data. */
export const MAD_TO_SIGMA = 1.4826;
/**
 * √(π/2) ≈ 1.253314: the mean absolute deviation times this estimates σ for normal data (the mean
 * deviation of a normal distribution is σ·√(2/π); Geary, Biometrika 27, 1935). The fallback scale
 * when the MAD is 0.
 */
export const MEAN_AD_TO_SIGMA = Math.sqrt(Math.PI / 2);

/** Median, raw median absolute deviation and mean absolute deviation about the median. */
export interface RobustSpread {
  median: number;
  /** median |x − median|, not rescaled (multiply by 1.4826 for a normal-consistent scale). */
  mad: number;
  /** mean |x − median|, the fallback scale; computed only when mad is 0, else null. */
  meanAbsoluteDeviation: number | null;
}

/**
 * Median, median absolute deviation (MAD) and mean absolute deviation about the median of
 * values[0..n). The mean absolute deviation is computed only when MAD is 0 (its sole use, as a
 * fallback scale), summed in sorted order, so no result depends on the order of the input.
 * O(n) expected (O(n log n) when MAD is 0). Uses `scratch` (length ≥ n) and reorders values.
 * https://en.wikipedia.org/wiki/Median_absolute_deviation
 * @throws RangeError when n < 1 or scratch is too short
 * @example robustSpreadInPlace(Float64Array.of(1, 1, 2, 2, 4, 6, 9)).mad // => 1
 */
export function robustSpreadInPlace(
  values: Float64Array,
  n = values.length,
  scratch: Float64Array = new Float64Array(n),
): RobustSpread {
  if (n < 1) throw new RangeError('robustSpreadInPlace needs at least one value');
  if (scratch.length < n) throw new RangeError('scratch is shorter than the values');
  const median = medianInPlace(values, n);
  for (let i = 0; i < n; i++) scratch[i] = Math.abs(values[i] - median);
  const mad = medianInPlace(scratch, n);
  let meanAbsoluteDeviation: number | null = null;
  if (mad === 0) {
    const sorted = scratch.subarray(0, n).sort();
    let sum = 0;
    for (let i = 0; i < n; i++) sum += sorted[i];
    meanAbsoluteDeviation = sum / n;
  }
  return { median, mad, meanAbsoluteDeviation };
}
