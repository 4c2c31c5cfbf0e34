import { MEAN_AD_TO_SIGMA, robustSpreadInPlace } from '@/analysis/statistics';

/** Iglewicz & Hoaglin's cut-off: |M| above this marks a likely outlier. */
export const MODIFIED_Z_LIMIT = 3.5;

/** 0.6745 ≈ Φ⁻¹(0.75): makes MAD a normal-consistent scale in the modified z-score. */
const MAD_FACTOR = 0.6745;
/**
 * Used when MAD is 0: M = (x − median) / (√(π/2) · mean absolute deviation); √(π/2) ≈ 1.253314
 * makes the mean absolute deviation a normal-consistent scale (Geary, Biometrika 27, 1935). The
 * fallback is IBM's (Cognos Analytics 11.1 documentation, "Modified z score").
 */
const MEAN_AD_FACTOR = MEAN_AD_TO_SIGMA;

/** Modified z-scores of a list, with the median and scales used. */
export interface ModifiedZScores {
  median: number;
  mad: number;
  /**
   * Which scale divided: 'mad', 'floor' (the MAD was below the floor given), 'meanAbsoluteDeviation'
   * (MAD was 0 and no floor was given) or 'none' (all values equal).
   */
  scale: 'mad' | 'floor' | 'meanAbsoluteDeviation' | 'none';
  /** The MAD-equivalent scale the scores were divided by (0.6745 / factor; 0 for 'none'). */
  madUsed: number;
  /** One score per input value, in input order; NaN where the value was not finite. */
  scores: Float64Array;
}

/**
 * Modified z-scores M = 0.6745·(x − median)/MAD (Iglewicz & Hoaglin, "How to Detect and Handle
 * Outliers", ASQC 1993; NIST/SEMATECH e-Handbook §1.3.5.17); flag |M| > 3.5.
 * `madFloor` (≥ 0, or a function of the median giving it) puts a floor under the MAD: clustered or rounded values (over half the shots
 * at one reading) otherwise make the MAD tiny and every other value an "outlier". Without a
 * floor, when MAD is 0 the mean absolute deviation scales instead, and when that is 0 too every
 * score is 0: no division by zero. Non-finite values are skipped and score NaN. Scores do not
 * depend on the order of the values. O(n) expected.
 * https://www.itl.nist.gov/div898/handbook/eda/section3/eda35h.htm
 * @throws RangeError when madFloor is negative or not finite
 * @example modifiedZScores([148, 150, 147, 149, 112]).scores[4] // => −24.3 (median 148, MAD 1)
 * @example modifiedZScores([1.37, 1.37, 1.37, 1.4], 0.01).scores[3] // => 2.02 (MAD 0, floor 0.01)
 */
export function modifiedZScores(values: ArrayLike<number>, floor: number | ((median: number) => number) = 0): ModifiedZScores {
  const scores = new Float64Array(values.length).fill(Number.NaN);
  const finite = new Float64Array(values.length);
  let n = 0;
  for (let i = 0; i < values.length; i++) if (Number.isFinite(values[i])) finite[n++] = values[i];
  if (n === 0) return { median: Number.NaN, mad: Number.NaN, scale: 'none', madUsed: Number.NaN, scores };
  const spread = robustSpreadInPlace(finite, n);
  const madFloor = typeof floor === 'function' ? floor(spread.median) : floor;
  if (!(madFloor >= 0) || !Number.isFinite(madFloor)) throw new RangeError('modifiedZScores: the MAD floor must be a finite number ≥ 0');
  let factor = 0;
  let scale: ModifiedZScores['scale'] = 'none';
  if (madFloor > 0 && spread.mad < madFloor) {
    factor = MAD_FACTOR / madFloor;
    scale = 'floor';
  } else if (spread.mad > 0) {
    factor = MAD_FACTOR / spread.mad;
    scale = 'mad';
  } else if (spread.meanAbsoluteDeviation !== null && spread.meanAbsoluteDeviation > 0) {
    factor = 1 / (MEAN_AD_FACTOR * spread.meanAbsoluteDeviation);
    scale = 'meanAbsoluteDeviation';
  }
  for (let i = 0; i < values.length; i++) {
    const x = values[i];
    if (Number.isFinite(x)) scores[i] = (x - spread.median) * factor;
  }
  return { median: spread.median, mad: spread.mad, scale, madUsed: factor > 0 ? MAD_FACTOR / factor : 0, scores };
}
