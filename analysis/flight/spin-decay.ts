import { BALL_RADIUS_M } from './constants';

/**
 * Spin decay coefficient of dω/dt = −c·(v/R)·ω: c = 2.0e-5 (Smits & Smith, Science and Golf II,
 * 1994, as quoted by A. M. Nathan, 2008). At 100 mph (44.704 m/s) the time constant
 * R/(c·v) is 23.87 s.
 */
export const SPIN_DECAY_COEFFICIENT = 2.0e-5;

/**
 * Time constant (s) of spin decay at a steady air speed: τ = R / (c·v). O(1).
 * @throws RangeError when the speed is not positive
 * @example spinDecayTimeConstantS(44.704) // => 23.86 (23.87 with R = 0.02134 m)
 */
export function spinDecayTimeConstantS(speedMps: number, radiusM: number = BALL_RADIUS_M): number {
  if (!(speedMps > 0)) throw new RangeError(`speed ${speedMps} m/s is not positive`);
  return radiusM / (SPIN_DECAY_COEFFICIENT * speedMps);
}
