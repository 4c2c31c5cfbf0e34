import type { ShotValues } from '@/analysis/fields';
import { RAD_PER_DEG } from './constants';
import type { Launch } from './launch-vectors';

/** A shot's launch, and whether its sideways inputs were measured. */
export interface ShotLaunch {
  launch: Launch;
  /**
   * True when both the launch direction and the spin axis (spinAxis, or backSpin with
   * sideSpin) are in the shot; only then does the model's offline say something about it.
   */
  sideKnown: boolean;
}

function finite(value: number | undefined): value is number {
  return value !== undefined && Number.isFinite(value);
}

/**
 * Read a shot's launch conditions from its canonical values: ballSpeed (> 0), launchAngle and
 * spin, given as spinRate (≥ 0) or as backSpin (with sideSpin when present); the spin axis from
 * spinAxis, else atan2(sideSpin, backSpin), else 0; the launch direction from launchDirection,
 * else 0. O(1).
 * @returns null when ball speed, launch angle or spin is missing or unusable
 * @example launchFromShot({ ballSpeed: 70, launchAngle: 12, backSpin: 2800, sideSpin: -300 })
 *   // => { launch: { ballSpeedMps: 70, launchAngleDeg: 12, spinRateRpm: 2816.0, spinAxisDeg: -6.12, launchDirectionDeg: 0 }, sideKnown: false }
 */
export function launchFromShot(values: ShotValues): ShotLaunch | null {
  const { ballSpeed, launchAngle, spinRate, backSpin, sideSpin, spinAxis, launchDirection } = values;
  if (!finite(ballSpeed) || ballSpeed <= 0 || !finite(launchAngle)) return null;
  const pairKnown = finite(backSpin) && finite(sideSpin);
  let spinRateRpm: number;
  if (finite(spinRate)) spinRateRpm = spinRate;
  else if (finite(backSpin)) spinRateRpm = Math.hypot(backSpin, finite(sideSpin) ? sideSpin : 0);
  else return null;
  if (spinRateRpm < 0) return null;
  let spinAxisDeg = 0;
  if (finite(spinAxis)) spinAxisDeg = spinAxis;
  else if (pairKnown && (backSpin !== 0 || sideSpin !== 0)) spinAxisDeg = Math.atan2(sideSpin, backSpin) / RAD_PER_DEG;
  const axisKnown = finite(spinAxis) || pairKnown;
  return {
    launch: {
      ballSpeedMps: ballSpeed,
      launchAngleDeg: launchAngle,
      spinRateRpm,
      spinAxisDeg,
      launchDirectionDeg: finite(launchDirection) ? launchDirection : 0,
    },
    sideKnown: axisKnown && finite(launchDirection),
  };
}
