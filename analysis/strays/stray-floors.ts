/**
 * Floors under the robust scales of the stray rules. A monitor writes values at a fixed
 * resolution and a consistent player repeats a reading often, so over half a group can share one
 * value: the MAD then collapses (to 0.0015 in a hybrid group whose smash factors read 1.37 six
 * times) and every other shot, good ones included, looks far off. Each floor is the MAD below
 * which a real group's spread is not believed: the larger of the field's meaningful resolution
 * and the spread of a very consistent player. Common practice, no source (from memory; our
 * choices, stated here and in DEVELOPERS.md):
 * - smash factor: 0.01 (monitors write it to 0.01, and a consistent player's smash factor
 *   varies by about that shot to shot);
 * - ball speed: 1% of the group's median (about 1.5 mph for a 150 mph drive), at least 1 mph
 *   (0.447 m/s);
 * - carry: 1.5% of the group's median (about 3.5 yd for a 230 yd drive, 2 yd for a 140 yd
 *   7-iron), at least 1.5 m: a very consistent player's carry varies by about 2.5% (sd);
 * - launch angle: 1°, the spread of a very consistent player's launch (sd about 1.5°);
 * - offline (the ground rule): 1.5% of the group's median carry, at least 1 m.
 * With the modified z-score limit 3.5, a shot is then a mishit only when it is at least
 * 3.5/0.6745 ≈ 5.2 floors worse than the group: smash 0.052 below, ball speed 5.2% below, carry
 * 7.8% short, launch 5.2° off.
 */
export const STRAY_FLOORS = {
  smashFactor: { absolute: 0.01, ofMedian: 0 },
  ballSpeed: { absolute: 0.44704, ofMedian: 0.01 },
  carry: { absolute: 1.5, ofMedian: 0.015 },
  launchAngle: { absolute: 1, ofMedian: 0 },
  offline: { absolute: 1, ofMedianCarry: 0.015 },
} as const;

/** The fields the one-field stray rules read. */
export type ScoredField = 'smashFactor' | 'ballSpeed' | 'carry' | 'launchAngle';

/**
 * The MAD floor of a one-field rule for a group whose median is `median`. O(1).
 * @example madFloor('carry', 210) // => 3.15
 * @example madFloor('smashFactor', 1.45) // => 0.01
 */
export function madFloor(field: ScoredField, median: number): number {
  const floor = STRAY_FLOORS[field];
  const relative = Number.isFinite(median) ? floor.ofMedian * Math.abs(median) : 0;
  return Math.max(floor.absolute, relative);
}

/**
 * The MAD floor of offline for the ground rule, from the group's median carry. O(1).
 * @example offlineMadFloor(210) // => 3.15
 */
export function offlineMadFloor(medianCarryM: number): number {
  const relative = Number.isFinite(medianCarryM) ? STRAY_FLOORS.offline.ofMedianCarry * Math.abs(medianCarryM) : 0;
  return Math.max(STRAY_FLOORS.offline.absolute, relative);
}
