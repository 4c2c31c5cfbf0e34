import { clubInfo } from '@/analysis/clubs';
import { simulateFlight, type AirConditions } from '@/analysis/flight';
import { impactLaunch, TYPICAL_HEADS, type ImpactLaunch } from './launch-from-loft';
import { typicalLengthIn } from './typical-length';

/** A player's measured club speed with one club, the yardstick for the others. */
export interface SpeedReference {
  clubSpeedMps: number;
  /** Length of the club it was measured with (in). */
  lengthIn: number;
}

/** A carry from the flight model, marked as an estimate wherever it is shown. */
export interface CarryEstimate {
  carryM: number;
  clubSpeedMps: number;
  launch: ImpactLaunch;
  /** The loft used (deg) and whether it was the club's own or the typical loft of its kind. */
  loftDeg: number;
  loftFrom: 'club' | 'typical';
}

/**
 * The club speed a player swings a club of this length with, from a measured reference:
 * speed in proportion to length (the same turning rate of the arms and club; a plain physical
 * assumption, rough). O(1).
 * @throws RangeError when a length is not positive
 * @example clubSpeedForLength({ clubSpeedMps: 45, lengthIn: 45.5 }, 37) // => 36.59
 */
export function clubSpeedForLength(reference: SpeedReference, lengthIn: number): number {
  if (!(lengthIn > 0) || !(reference.lengthIn > 0)) throw new RangeError('lengths must be positive');
  return (reference.clubSpeedMps * lengthIn) / reference.lengthIn;
}

/**
 * The club speed behind a ball speed for a club of this kind and loft, by the impact estimate
 * (ball speed is proportional to club speed there). Null for a putter or an unknown code. O(1).
 * @example clubSpeedFromBallSpeed(66, 'DR', 10.5) // => ≈ 45
 */
export function clubSpeedFromBallSpeed(ballSpeedMps: number, club: string, loftDeg: number | null): number | null {
  const info = clubInfo(club);
  if (!info || info.kind === 'putter' || !(ballSpeedMps > 0)) return null;
  const perUnit = impactLaunch(1, loftDeg ?? info.typicalLoftDeg, TYPICAL_HEADS[info.kind]).ballSpeedMps;
  return ballSpeedMps / perUnit;
}

/**
 * A club's carry estimated for a player: club speed from the reference by length (the club's
 * own length, else a typical one), the ball's launch from the impact estimate for its loft (its
 * own, else the typical loft), then the flight model (analysis/flight, still air unless `air`
 * says otherwise). Null for a putter, an unknown code or no reference. O(flight steps).
 * @example estimateCarry({ club: '7I', loftDeg: 31, lengthIn: 37 }, { clubSpeedMps: 45, lengthIn: 45.5 })?.carryM // => ≈ 143
 */
export function estimateCarry(
  club: { club: string; loftDeg: number | null; lengthIn: number | null },
  reference: SpeedReference | null,
  air: AirConditions = {},
): CarryEstimate | null {
  const info = clubInfo(club.club);
  if (!reference || !info || info.kind === 'putter') return null;
  const lengthIn = club.lengthIn ?? typicalLengthIn(club.club);
  if (lengthIn === null) return null;
  const loftDeg = club.loftDeg ?? info.typicalLoftDeg;
  const clubSpeedMps = clubSpeedForLength(reference, lengthIn);
  const launch = impactLaunch(clubSpeedMps, loftDeg, TYPICAL_HEADS[info.kind]);
  const flight = simulateFlight(launch, air);
  return { carryM: flight.carryM, clubSpeedMps, launch, loftDeg, loftFrom: club.loftDeg === null ? 'typical' : 'club' };
}

/** A club the player hit: its code, loft, length and median carry. */
export interface HitClub {
  club: string;
  loftDeg: number | null;
  lengthIn: number | null;
  carryM: number;
}

/**
 * The speed reference that makes the estimate reproduce a club the player hit: the club speed
 * (at that club's length) whose estimated carry equals the measured one, by bisection on
 * 5–90 m/s (carry rises with speed). Estimates for the player's other clubs then start from
 * their own ball striking rather than a typical one. Null for a putter, an unknown code, or a
 * carry outside what 5–90 m/s gives. O(40 flights).
 * @example calibratedReference({ club: '7I', loftDeg: 31, lengthIn: 37, carryM: 130.8 })?.clubSpeedMps // => ≈ 34
 */
export function calibratedReference(hit: HitClub, air: AirConditions = {}): SpeedReference | null {
  const info = clubInfo(hit.club);
  const lengthIn = hit.lengthIn ?? typicalLengthIn(hit.club);
  if (!info || info.kind === 'putter' || lengthIn === null || !(hit.carryM > 0)) return null;
  const carryAt = (speed: number) => estimateCarry({ club: hit.club, loftDeg: hit.loftDeg, lengthIn }, { clubSpeedMps: speed, lengthIn }, air)!.carryM;
  let lo = 5;
  let hi = 90;
  if (carryAt(lo) > hit.carryM || carryAt(hi) < hit.carryM) return null;
  for (let i = 0; i < 40; i++) {
    const mid = (lo + hi) / 2;
    if (carryAt(mid) < hit.carryM) lo = mid;
    else hi = mid;
  }
  return { clubSpeedMps: (lo + hi) / 2, lengthIn };
}
