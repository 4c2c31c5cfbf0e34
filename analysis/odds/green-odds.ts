import { discProbability } from './disc-probability';

/** n shots on the ground: their mean and sample covariance of (offline, carry). */
export interface GreenInput {
  n: number;
  mean: readonly [number, number];
  covariance: { xx: number; yy: number; xy: number };
  /** Centre of the green (offline, carry), m: usually on the target line at a target carry. */
  target: readonly [number, number];
  radiusM: number;
}

/**
 * The chance that the next shot lands on a green of radius R, from the predictive distribution
 * of n shots (n ≥ 3): a bivariate Student t with n − 2 degrees of freedom, centred on the mean,
 * with scale S·(n + 1)(n − 1)/(n(n − 2)) — the distribution whose ovals are the Hotelling
 * prediction ovals of the next shot (Chew, JASA 61, 1966), honest for few shots and the normal
 * as n grows. Numerical integration over the disc (discProbability), bounded cost.
 * @returns the probability, or null when the shots lie on a line (no area)
 * @throws RangeError when n < 3 or the radius is not positive
 * @example greenOdds({ n: 12, mean: [2, 150], covariance: { xx: 16, yy: 25, xy: 4 }, target: [0, 150], radiusM: 10.97 }) // => ≈ 0.8
 */
export function greenOdds(input: GreenInput): number | null {
  const { n, covariance: c } = input;
  if (!(n >= 3)) throw new RangeError('greenOdds needs at least three shots');
  const f = ((n + 1) * (n - 1)) / (n * (n - 2));
  const scale = { xx: c.xx * f, yy: c.yy * f, xy: c.xy * f };
  if (!(scale.xx * scale.yy - scale.xy * scale.xy > 1e-12 * Math.max(1, scale.xx * scale.yy))) return null;
  return discProbability({ centre: input.mean, scale, dof: n - 2, disc: input.target, radiusM: input.radiusM });
}
