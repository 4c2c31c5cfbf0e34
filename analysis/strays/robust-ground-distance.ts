import { chiSquare2Quantile, MAD_TO_SIGMA, MEAN_AD_TO_SIGMA, robustSpreadInPlace } from '@/analysis/statistics';

/** Keeps the robust correlation off ±1, so a line of shots still gives finite distances. */
const MAX_CORRELATION = 0.99;

/** The level whose χ²₂ quantile bounds a shot's squared robust distance before it is a stray. */
export const GROUND_STRAY_LEVEL = 0.999;
/** sqrt(χ²₂(0.999)) = sqrt(−2·ln 0.001) ≈ 3.717. */
export const GROUND_DISTANCE_LIMIT = Math.sqrt(chiSquare2Quantile(GROUND_STRAY_LEVEL));

/** Robust centre, scales and correlation of a group on the ground, and each shot's distance. */
export interface RobustGroundDistances {
  /** Coordinate-wise median. */
  centerOffline: number;
  centerCarry: number;
  /** 1.4826 · MAD (or √(π/2) · mean absolute deviation when MAD is 0), m. */
  scaleOffline: number;
  scaleCarry: number;
  /** Gnanadesikan–Kettenring correlation from the same robust scale, clamped to ±0.99. */
  correlation: number;
  /** Robust Mahalanobis distance of each shot (not squared), in input order; NaN where a value is missing. */
  distances: Float64Array;
}

function robustScale(values: Float64Array, n: number, scratch: Float64Array, madFloor = 0): { center: number; scale: number } {
  const spread = robustSpreadInPlace(values, n, scratch);
  if (madFloor > 0 && spread.mad < madFloor) return { center: spread.median, scale: MAD_TO_SIGMA * madFloor };
  const scale = spread.mad > 0 ? MAD_TO_SIGMA * spread.mad : MEAN_AD_TO_SIGMA * (spread.meanAbsoluteDeviation ?? 0);
  return { center: spread.median, scale };
}

/** Options of robustGroundDistances. */
export interface GroundDistanceOptions {
  /** Floor under the MAD of offline, m (clustered or rounded values never make the scale tiny). */
  madFloorOfflineM?: number;
  /** Floor under the MAD of carry, m. */
  madFloorCarryM?: number;
  /**
   * Count carry only when the shot is short of the centre: a long shot is never far off the
   * pattern for being long (one-sided, as a fitter reads it). Default false.
   */
  shortOnly?: boolean;
}

/**
 * Robust distance of each shot from the group's pattern on the ground. Centre: coordinate-wise
 * median. Scale: 1.4826·MAD per axis. Correlation: Gnanadesikan & Kettenring's identity
 * r = (s(u)² − s(v)²)/(s(u)² + s(v)²) with u, v the sum and difference of the standardised
 * axes and s the same MAD scale (Gnanadesikan & Kettenring, Biometrics 28:81–124, 1972).
 * Distance: d² = (x² − 2r·x·y + y²)/(1 − r²) in standardised units; compare with
 * GROUND_DISTANCE_LIMIT. Floors under the MADs (options) keep clustered values from making a
 * scale tiny; with `shortOnly` the carry part counts only for shots short of the centre. An axis
 * with no spread at all (and no floor) is left out of the distance. Medians make the result
 * independent of shot order. O(n) expected.
 * https://en.wikipedia.org/wiki/Robust_measures_of_scale
 * @example robustGroundDistances([0, 1, -1, 2, -2, 30], [150, 151, 149, 150, 152, 150]).distances[5] // => ≈ 13 (far right)
 */
export function robustGroundDistances(
  offlineM: ArrayLike<number>,
  carryM: ArrayLike<number>,
  options: GroundDistanceOptions = {},
): RobustGroundDistances {
  const length = Math.min(offlineM.length, carryM.length);
  const distances = new Float64Array(length).fill(Number.NaN);
  const x = new Float64Array(length);
  const y = new Float64Array(length);
  let n = 0;
  for (let i = 0; i < length; i++) {
    if (Number.isFinite(offlineM[i]) && Number.isFinite(carryM[i])) {
      x[n] = offlineM[i];
      y[n] = carryM[i];
      n++;
    }
  }
  if (n === 0) {
    return { centerOffline: Number.NaN, centerCarry: Number.NaN, scaleOffline: Number.NaN, scaleCarry: Number.NaN, correlation: 0, distances };
  }
  const scratch = new Float64Array(n);
  const work = new Float64Array(n);
  work.set(x.subarray(0, n));
  const ox = robustScale(work, n, scratch, options.madFloorOfflineM ?? 0);
  work.set(y.subarray(0, n));
  const oy = robustScale(work, n, scratch, options.madFloorCarryM ?? 0);
  const ix = ox.scale > 0 ? 1 / ox.scale : 0;
  const iy = oy.scale > 0 ? 1 / oy.scale : 0;

  let correlation = 0;
  if (ix > 0 && iy > 0) {
    for (let i = 0; i < n; i++) work[i] = (x[i] - ox.center) * ix + (y[i] - oy.center) * iy;
    const su = robustScale(work, n, scratch).scale;
    for (let i = 0; i < n; i++) work[i] = (x[i] - ox.center) * ix - (y[i] - oy.center) * iy;
    const sv = robustScale(work, n, scratch).scale;
    const total = su * su + sv * sv;
    if (total > 0) correlation = Math.max(-MAX_CORRELATION, Math.min(MAX_CORRELATION, (su * su - sv * sv) / total));
  }
  const oneMinusR2 = 1 - correlation * correlation;
  for (let i = 0; i < length; i++) {
    const a = offlineM[i];
    const b = carryM[i];
    if (!Number.isFinite(a) || !Number.isFinite(b)) continue;
    const u = (a - ox.center) * ix;
    const along = (b - oy.center) * iy;
    const v = options.shortOnly && along > 0 ? 0 : along;
    distances[i] = Math.sqrt(Math.max(0, (u * u - 2 * correlation * u * v + v * v) / oneMinusR2));
  }
  return { centerOffline: ox.center, centerCarry: oy.center, scaleOffline: ox.scale, scaleCarry: oy.scale, correlation, distances };
}
