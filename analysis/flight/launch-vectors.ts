import { RAD_PER_DEG } from './constants';
import type { UnitVector } from './ball-forces';

/** Launch conditions of a ball, in canonical units. */
export interface Launch {
  ballSpeedMps: number;
  /** Vertical launch angle (deg), + upward. */
  launchAngleDeg: number;
  /** Horizontal launch direction (deg), + starts right of the target line. Default 0. */
  launchDirectionDeg?: number;
  /** Total spin rate (rpm). */
  spinRateRpm: number;
  /** Spin axis tilt (deg), + tilted so that the ball curves right. Default 0. */
  spinAxisDeg?: number;
}

/** Initial velocity (m/s) and spin axis in the flight frame (x toward the target, y up, z right). */
export interface LaunchVectors {
  vxMps: number;
  vyMps: number;
  vzMps: number;
  spinAxis: UnitVector;
}

/**
 * Initial velocity and spin axis of a launch. The spin axis lies in the plane across the
 * launch velocity: with no tilt it is horizontal and points to the right of the launch
 * direction (pure back spin lifts the ball); a tilt of +a degrees turns it about the velocity so
 * that the lift leans right by a degrees (the ball curves right). O(1).
 * @throws RangeError when a value is not finite or the ball speed or spin rate is negative
 * @example launchVectors({ ballSpeedMps: 70, launchAngleDeg: 10, spinRateRpm: 2500 }).vyMps // => 12.155
 */
export function launchVectors(launch: Launch): LaunchVectors {
  const { ballSpeedMps, launchAngleDeg, spinRateRpm } = launch;
  const directionDeg = launch.launchDirectionDeg ?? 0;
  const axisDeg = launch.spinAxisDeg ?? 0;
  for (const [name, value] of [
    ['ball speed', ballSpeedMps], ['launch angle', launchAngleDeg], ['launch direction', directionDeg],
    ['spin rate', spinRateRpm], ['spin axis', axisDeg],
  ] as const) {
    if (!Number.isFinite(value)) throw new RangeError(`${name} ${value} is not a finite number`);
  }
  if (ballSpeedMps < 0) throw new RangeError(`ball speed ${ballSpeedMps} m/s is negative`);
  if (spinRateRpm < 0) throw new RangeError(`spin rate ${spinRateRpm} rpm is negative`);
  const theta = launchAngleDeg * RAD_PER_DEG;
  const psi = directionDeg * RAD_PER_DEG;
  const a = axisDeg * RAD_PER_DEG;
  const ct = Math.cos(theta), st = Math.sin(theta), cp = Math.cos(psi), sp = Math.sin(psi);
  // Unit launch direction d, the horizontal right across it r, and up across it u = r × d.
  const dx = ct * cp, dy = st, dz = ct * sp;
  const rx = -sp, rz = cp;
  const ux = -rz * dy, uy = rz * dx - rx * dz, uz = rx * dy;
  // ω̂ = cos a · r − sin a · u, so that ω̂ × d = cos a · u + sin a · r.
  const ca = Math.cos(a), sa = Math.sin(a);
  return {
    vxMps: ballSpeedMps * dx,
    vyMps: ballSpeedMps * dy,
    vzMps: ballSpeedMps * dz,
    spinAxis: { x: ca * rx - sa * ux, y: -sa * uy, z: ca * rz - sa * uz },
  };
}
