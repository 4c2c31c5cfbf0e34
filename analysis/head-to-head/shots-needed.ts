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

/** Inputs for the shots that would settle a field's verdict. */
export interface SettleInput {
  nA: number;
  nB: number;
  sdA: number;
  sdB: number;
  /** The observed difference of means. */
  diff: number;
  /** The field's margin (same unit as diff). */
  margin: number;
}

/**
 * About how many more shots per build would settle an unclear verdict, assuming the observed
 * difference and spreads hold: the 95% interval must either clear 0 (room |d|) or fit inside
 * ±margin (room margin − |d|), whichever needs fewer shots; per build n = (z₀.₉₇₅ + z_power)²·
 * (sA² + sB²)/room² (normal approximation, as Lehr's rule), less the shots already hit (the
 * smaller group), at least 1. The room is never below margin/2, so the answer is finite. O(1).
 * Lehr, "Sixteen s-squared over d-squared", Statistics in Medicine 11:1099–1102 (1992).
 * @throws RangeError when a group has fewer than 2 shots or the margin is not positive
 * @example shotsToSettle({ nA: 10, nB: 10, sdA: 8, sdB: 8, diff: 1, margin: 2.74 }) // => 316
 */
export function shotsToSettle(input: SettleInput, options: { power?: number } = {}): number {
  const { nA, nB, sdA, sdB, diff, margin } = input;
  if (nA < 2 || nB < 2) throw new RangeError('shotsToSettle needs at least two shots in each group');
  if (!(margin > 0)) throw new RangeError('shotsToSettle needs a positive margin');
  const d = Math.abs(diff);
  const room = Math.max(d, margin - d);
  const z = normalQuantile(0.975) + normalQuantile(options.power ?? 0.8);
  const perBuild = Math.ceil((z * z * (sdA * sdA + sdB * sdB)) / (room * room));
  return Math.max(1, perBuild - Math.min(nA, nB));
}
