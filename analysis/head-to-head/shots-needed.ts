import { normalQuantile } from '@/analysis/statistics';

/** Inputs for a sample-size estimate of a difference between two builds. */
export interface ShotsNeededInput {
  nA: number;
  nB: number;
  sdA: number;
  sdB: number;
  /** The observed difference of means, taken as the difference to detect. */
  diff: number;
}

/**
 * About how many shots each build needs so that a two-sided test at level alpha detects the
 * observed difference with the given power: n = 2·(z₁₋α/₂ + z_power)²·s²/d² per build, s² the
 * pooled variance (normal approximation; about Lehr's 16·s²/d² at α 0.05 and power 0.8).
 * Returns how many more shots per build that is beyond those already hit (the smaller group's
 * count), at least 0; null when the difference is 0 (no size settles it). O(1).
 * Lehr, "Sixteen s-squared over d-squared", Statistics in Medicine 11:1099–1102 (1992).
 * @throws RangeError when a group has fewer than 2 shots, or alpha/power are not in (0, 1)
 * @example moreShotsNeeded({ nA: 10, nB: 10, sdA: 5, sdB: 5, diff: 2 }) // => 89 (99 per build in all)
 */
export function moreShotsNeeded(input: ShotsNeededInput, options: { alpha?: number; power?: number } = {}): number | null {
  const alpha = options.alpha ?? 0.05;
  const power = options.power ?? 0.8;
  const { nA, nB, sdA, sdB, diff } = input;
  if (nA < 2 || nB < 2) throw new RangeError('moreShotsNeeded needs at least two shots in each group');
  if (diff === 0 || !Number.isFinite(diff)) return null;
  const pooledVariance = ((nA - 1) * sdA * sdA + (nB - 1) * sdB * sdB) / (nA + nB - 2);
  const z = normalQuantile(1 - alpha / 2) + normalQuantile(power);
  const perBuild = Math.ceil((2 * z * z * pooledVariance) / (diff * diff));
  return Math.max(0, perBuild - Math.min(nA, nB));
}
