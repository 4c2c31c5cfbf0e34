import { chiSquare2Quantile, fQuantile2 } from '@/analysis/statistics';

/**
 * Squared scale k² of a descriptive oval: the χ² quantile with 2 degrees of freedom,
 * −2·ln(1 − level). The oval {d : dᵀ S⁻¹ d ≤ k²} then holds `level` of a bivariate normal
 * whose covariance is S. O(1).
 * https://en.wikipedia.org/wiki/Multivariate_normal_distribution#Geometric_interpretation
 * @throws RangeError when level is not in (0, 1)
 * @example descriptiveScale2(0.95) // => 5.991465
 */
export function descriptiveScale2(level: number): number {
  return chiSquare2Quantile(level);
}

/**
 * Squared scale k² of a prediction oval for the next shot from n shots (Hotelling):
 * k² = 2(n − 1)(n + 1) / (n(n − 2)) · F(2, n − 2; level). Wider than the descriptive oval for
 * small groups, tending to it as n grows. O(1).
 * Chew, "Confidence, prediction and tolerance regions for the multivariate normal
 * distribution", JASA 61 (1966): https://doi.org/10.1080/01621459.1966.10480892
 * @throws RangeError when n < 3 or level is not in (0, 1)
 * @example predictionScale2(10, 0.95) // => 11.036
 */
export function predictionScale2(n: number, level: number): number {
  if (!(n >= 3)) throw new RangeError('predictionScale2 needs at least 3 shots');
  return ((2 * (n - 1) * (n + 1)) / (n * (n - 2))) * fQuantile2(n - 2, level);
}
