import { studentTCdf } from '@/analysis/statistics';

/** The next shot's offline from n shots: a Student t with n − 1 degrees of freedom. */
export interface FairwayInput {
  /** Shots the mean and sd come from (at least 2). */
  n: number;
  meanM: number;
  sdM: number;
  /** Width of the corridor, centred on the target line (offline 0) unless centreM is given, m. */
  widthM: number;
  centreM?: number;
}

/**
 * The chance that the next shot finishes inside a corridor of width W (a fairway) around the
 * target line, from the predictive distribution of n shots: the next offline is
 * mean + sd·√(1 + 1/n)·T with T a Student t of n − 1 degrees of freedom (honest for small n;
 * the normal distribution as n grows). P = F((c + W/2 − mean)/s′) − F((c − W/2 − mean)/s′).
 * O(1).
 * https://en.wikipedia.org/wiki/Prediction_interval#Unknown_mean,_unknown_variance
 * @throws RangeError when n < 2, the sd is negative or the width not positive
 * @example fairwayOdds({ n: 10, meanM: 0, sdM: 9.144, widthM: 27.432 }) // => 0.85
 */
export function fairwayOdds(input: FairwayInput): number {
  const { n, meanM, sdM, widthM } = input;
  if (!(n >= 2)) throw new RangeError('fairwayOdds needs at least two shots');
  if (!(sdM >= 0) || !Number.isFinite(sdM)) throw new RangeError('fairwayOdds: the sd must be a number ≥ 0');
  if (!(widthM > 0) || !Number.isFinite(widthM)) throw new RangeError('fairwayOdds: the width must be positive');
  const centre = input.centreM ?? 0;
  const lo = centre - widthM / 2 - meanM;
  const hi = centre + widthM / 2 - meanM;
  const scale = sdM * Math.sqrt(1 + 1 / n);
  if (scale === 0) return lo <= 0 && hi >= 0 ? 1 : 0;
  const p = studentTCdf(hi / scale, n - 1) - studentTCdf(lo / scale, n - 1);
  return Math.min(1, Math.max(0, p));
}
