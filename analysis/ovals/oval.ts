import { eigenSymmetric2x2, sampleCovariance2 } from '@/analysis/statistics';
import type { Covariance2 } from '@/analysis/statistics';
import { descriptiveScale2, predictionScale2 } from './oval-scale';

/** A dispersion oval on the ground: x = offline (+ right), y = carry, metres. JSON-able. */
export interface Oval {
  level: number;
  centerOffline: number;
  centerCarry: number;
  /** Half the long axis, m. */
  semiMajor: number;
  /** Half the short axis, m. */
  semiMinor: number;
  /** Long axis measured from the carry axis toward the right (+offline), in (−90, 90]. */
  angleDeg: number;
  /** π · semiMajor · semiMinor, m². */
  area: number;
}

/** Which oval: one that describes the shots, or one that predicts where the next shot lands. */
export type OvalKind = 'descriptive' | 'prediction';

/**
 * The oval {d : dᵀ S⁻¹ d ≤ scale2} around a centre, S the covariance of (offline, carry):
 * semi-axes sqrt(scale2 · λ) from the closed-form eigen decomposition of S. O(1).
 * @throws RangeError when scale2 is negative or not finite
 * @example ovalFromCovariance({ n: 5, meanX: 0, meanY: 150, xx: 9, xy: 0, yy: 4 }, 5.991, 0.95).semiMajor // => 7.343
 */
export function ovalFromCovariance(moments: Covariance2, scale2: number, level: number): Oval {
  if (!(scale2 >= 0) || !Number.isFinite(scale2)) throw new RangeError('ovalFromCovariance: scale must be finite and ≥ 0');
  const eigen = eigenSymmetric2x2(moments.xx, moments.xy, moments.yy);
  const semiMajor = Math.sqrt(scale2 * Math.max(0, eigen.major));
  const semiMinor = Math.sqrt(scale2 * Math.max(0, eigen.minor));
  // eigen.majorAngleDeg is from the offline axis toward carry; the oval's angle is from carry toward offline.
  let angleDeg = semiMajor === semiMinor ? 0 : 90 - eigen.majorAngleDeg;
  if (angleDeg > 90) angleDeg -= 180;
  return {
    level,
    centerOffline: moments.meanX,
    centerCarry: moments.meanY,
    semiMajor,
    semiMinor,
    angleDeg,
    area: Math.PI * semiMajor * semiMinor,
  };
}

/**
 * The descriptive or prediction oval of shots on the ground from their offline and carry
 * (paired by index; the first n pairs). Descriptive: k² = χ²₂(level), prediction: Hotelling's
 * k² (see `predictionScale2`). O(n).
 * @param n how many leading pairs to use (default the shorter length)
 * @throws RangeError when fewer than 3 pairs, or level is not in (0, 1)
 * @example groundOval([-3, 1, 4, 0, -2], [150, 148, 153, 151, 147]) // => { level: 0.95, centerOffline: 0, centerCarry: 149.8, … }
 */
export function groundOval(
  offlineM: ArrayLike<number>,
  carryM: ArrayLike<number>,
  options: { level?: number; kind?: OvalKind; n?: number } = {},
): Oval {
  const level = options.level ?? 0.95;
  const n = options.n ?? Math.min(offlineM.length, carryM.length);
  if (n < 3) throw new RangeError('groundOval needs at least 3 shots with offline and carry');
  const moments = sampleCovariance2(offlineM, carryM, n);
  return ovalFromMoments(moments, level, options.kind ?? 'descriptive');
}

/**
 * The descriptive or prediction oval from already-computed means and covariance. O(1).
 * @throws RangeError when moments.n < 3 or level is not in (0, 1)
 * @example ovalFromMoments({ n: 10, meanX: 0, meanY: 150, xx: 1, xy: 0, yy: 1 }, 0.95, 'prediction').semiMajor // => 3.322
 */
export function ovalFromMoments(moments: Covariance2, level: number, kind: OvalKind): Oval {
  if (moments.n < 3) throw new RangeError('an oval needs at least 3 shots');
  const scale2 = kind === 'prediction' ? predictionScale2(moments.n, level) : descriptiveScale2(level);
  return ovalFromCovariance(moments, scale2, level);
}
