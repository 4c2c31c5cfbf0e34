import { BALL_MASS_KG, BALL_RADIUS_M, RAD_PER_DEG, RAD_PER_S_PER_RPM } from '@/analysis/flight';
import type { ClubKind } from '@/analysis/clubs';

/** The head and face of a kind of club and how it is usually delivered, for the impact estimate. */
export interface ImpactHead {
  /** Head mass (kg). */
  massKg: number;
  /** Coefficient of restitution of face and ball. */
  restitution: number;
  /** Attack angle (deg, + upward) the club usually meets the ball with. */
  attackDeg: number;
  /** Delivered loft less the built loft (deg): shaft lean and bend at impact. */
  deliveredLoftChangeDeg: number;
}

/**
 * Typical heads and deliveries by kind, for estimates only. Head masses, attack angles and
 * delivered lofts are common practice, no source, approximate: a driver of 200 g swept up off a
 * tee (+3°) with the shaft bowed forward (+3° of loft), woods of 215 g met slightly down (−1°,
 * −1° of loft), hybrids of 235 g and irons of 260 g struck down (−2°, −4°) with the hands ahead
 * (−2°, −4° of loft), wedges of 295 g struck down (−5°, −5° of loft). Restitution 0.83 for drivers and woods, the
 * governing bodies' former limit on a face's coefficient of restitution (0.830) that drivers
 * are built up to; 0.78 for the others, from memory, an assumption for slower, stiffer faces.
 */
export const TYPICAL_HEADS: Readonly<Record<Exclude<ClubKind, 'putter'>, ImpactHead>> = {
  driver: { massKg: 0.2, restitution: 0.83, attackDeg: 3, deliveredLoftChangeDeg: 3 },
  wood: { massKg: 0.215, restitution: 0.83, attackDeg: -1, deliveredLoftChangeDeg: -1 },
  hybrid: { massKg: 0.235, restitution: 0.78, attackDeg: -2, deliveredLoftChangeDeg: -2 },
  iron: { massKg: 0.26, restitution: 0.78, attackDeg: -4, deliveredLoftChangeDeg: -4 },
  wedge: { massKg: 0.295, restitution: 0.78, attackDeg: -5, deliveredLoftChangeDeg: -5 },
};

/** The ball's start from an impact. */
export interface ImpactLaunch {
  ballSpeedMps: number;
  launchAngleDeg: number;
  spinRateRpm: number;
}

/**
 * The ball's launch from a square, centred strike — the rigid-body oblique impact in which the
 * ball leaves the face rolling (after A. R. Penner, "The physics of golf", Rep. Prog. Phys. 66
 * (2003) 131–171; formulas from memory). With θ the spin loft (delivered loft less attack
 * angle) and V the club speed along its path: along the face normal
 * v_n = (1 + e)/(1 + m/M) · V cos θ; along the face v_t = (2/7) · V sin θ / (1 + 2m/(7M));
 * spin ω = (5/2) · v_t / r (a uniform ball); launch = attack + θ − atan(v_t / v_n). A typical
 * delivery (see TYPICAL_HEADS) stands in for the player's: an estimate only. O(1).
 * @throws RangeError when the speed is negative or the spin loft is outside 0–90°
 * @example impactLaunch(45, 10.5, { massKg: 0.2, restitution: 0.83, attackDeg: 0, deliveredLoftChangeDeg: 0 }) // => { ballSpeedMps: ≈ 65.9, launchAngleDeg: ≈ 8.6, spinRateRpm: ≈ 2460 }
 */
export function impactLaunch(clubSpeedMps: number, loftDeg: number, head: ImpactHead): ImpactLaunch {
  if (!(clubSpeedMps >= 0) || !Number.isFinite(clubSpeedMps)) throw new RangeError(`club speed ${clubSpeedMps} m/s is not a speed`);
  const spinLoftDeg = loftDeg + head.deliveredLoftChangeDeg - head.attackDeg;
  if (!(spinLoftDeg >= 0 && spinLoftDeg < 90)) throw new RangeError(`spin loft ${spinLoftDeg}° is outside 0–90°`);
  const theta = spinLoftDeg * RAD_PER_DEG;
  const ratio = BALL_MASS_KG / head.massKg;
  const vn = ((1 + head.restitution) / (1 + ratio)) * clubSpeedMps * Math.cos(theta);
  const vt = ((2 / 7) * clubSpeedMps * Math.sin(theta)) / (1 + (2 * ratio) / 7);
  const spinRadS = (2.5 * vt) / BALL_RADIUS_M;
  return {
    ballSpeedMps: Math.hypot(vn, vt),
    launchAngleDeg: head.attackDeg + spinLoftDeg - (vn > 0 ? Math.atan2(vt, vn) / RAD_PER_DEG : 0),
    spinRateRpm: spinRadS / RAD_PER_S_PER_RPM,
  };
}
