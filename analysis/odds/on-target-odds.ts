import { meanVariance, sampleCovariance2 } from '@/analysis/statistics';
import { YARD_M as YD } from '@/analysis/units';
import { fairwayOdds } from './fairway-odds';
import { greenOdds } from './green-odds';

/**
 * Default targets (common practice, no source): a 30 yd fairway and a green of 12 yd radius;
 * a shop's owner may set others and the fitter may change them on the page.
 */
export const DEFAULT_FAIRWAY_WIDTH_M = 30 * YD;
export const DEFAULT_GREEN_RADIUS_M = 12 * YD;

/** The chances of a group's next shot. JSON-able; canonical units. */
export interface OnTargetOdds {
  /** Inside a fairway of this width around the target line; p null with fewer than 2 shots with offline. */
  fairway: { widthM: number; p: number | null };
  /** On a green of this radius on the target line at carryM; p null with fewer than 3 shots with both. */
  green: { radiusM: number; carryM: number | null; p: number | null };
}

/** What the odds are asked for. */
export interface OddsTargets {
  fairwayWidthM: number;
  greenRadiusM: number;
  /** The green's carry; null: no target (then no green odds). */
  targetCarryM: number | null;
}

/**
 * On-target odds of a group from its kept shots' offline and carry (aligned, NaN = missing):
 * fairway from the offline of every shot that has one (Student t predictive), green from the
 * shots with both (bivariate t predictive). O(n) + O(DISC_NODES).
 * @throws RangeError when a width or radius is not positive
 * @example onTargetOdds(offline, carry, { fairwayWidthM: 27.432, greenRadiusM: 10.973, targetCarryM: 150 }).green.p
 */
export function onTargetOdds(offlineM: ArrayLike<number>, carryM: ArrayLike<number>, targets: OddsTargets): OnTargetOdds {
  if (!(targets.fairwayWidthM > 0) || !(targets.greenRadiusM > 0)) throw new RangeError('onTargetOdds: widths and radii must be positive');
  const length = Math.min(offlineM.length, carryM.length);
  const across = new Float64Array(offlineM.length);
  let nx = 0;
  for (let i = 0; i < offlineM.length; i++) if (Number.isFinite(offlineM[i])) across[nx++] = offlineM[i];
  let fairway: number | null = null;
  if (nx >= 2) {
    const mv = meanVariance(across.subarray(0, nx));
    fairway = fairwayOdds({ n: nx, meanM: mv.mean, sdM: Math.sqrt(mv.variance), widthM: targets.fairwayWidthM });
  }
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
  let green: number | null = null;
  if (n >= 3 && targets.targetCarryM !== null && Number.isFinite(targets.targetCarryM)) {
    const c = sampleCovariance2(x, y, n);
    green = greenOdds({ n, mean: [c.meanX, c.meanY], covariance: { xx: c.xx, yy: c.yy, xy: c.xy }, target: [0, targets.targetCarryM], radiusM: targets.greenRadiusM });
  }
  return {
    fairway: { widthM: targets.fairwayWidthM, p: fairway },
    green: { radiusM: targets.greenRadiusM, carryM: targets.targetCarryM, p: green },
  };
}
