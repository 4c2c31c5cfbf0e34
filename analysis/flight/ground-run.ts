import { BALL_RADIUS_M, RAD_PER_DEG, STANDARD_GRAVITY_MPS2 } from './constants';

/*
 * The run of a ball after it lands: bounces, then a roll. What is published and what is assumed:
 * - Published (structure): A. R. Penner, "The run of a golf ball", Can. J. Phys. 80:931–940
 *   (2002): each bounce is the rigid-body bounce of a spinning sphere with Coulomb friction
 *   against the turf surface tilted up toward the ball by an effective crater angle θc that grows
 *   linearly with the impact speed and angle (as summarised by Biber, Jones, Champneys, Green &
 *   Szalai, "Measurements and linearized models for golf ball bounce on a green", Sports
 *   Engineering 26 (2023), who fit that model to over 1000 measured bounces).
 * - From memory of Penner (2002), not re-read (the paper was not reachable): θc = 15.4°·(v/18.6
 *   m/s)·(θ/44.4°); normal coefficient of restitution e = 0.510 − 0.0375·vn + 0.000903·vn² for
 *   vn ≤ 20 m/s and 0.120 above; friction coefficient μ = 0.43. These were fitted on greens.
 * - Assumed (no source; chosen so a tour-average drive runs about 10 % of its carry on normal
 *   ground, common practice, no source): the firmness scales θc and e, and sets the rolling
 *   deceleration of the final roll (GROUND_FIRMNESS_PARAMETERS), which grows with speed
 *   (rollDistanceM); hops between bounces fly
 *   without air (speeds of a few m/s); the ball is a uniform sphere (I = 2/5·m·r²); the roll
 *   starts once a bounce leaves the ground slower than 0.5 m/s upward, with the rolling speed
 *   from the angular momentum about the contact point; one ground for every club (a fairway:
 *   greens hold a landing ball better than this model, which treats an iron like a drive).
 */

/** Ground firmness, a condition of the fitting. */
export type GroundFirmness = 'soft' | 'normal' | 'firm';

export const GROUND_FIRMNESSES: readonly GroundFirmness[] = ['soft', 'normal', 'firm'];

export interface GroundParameters {
  /** Multiplies Penner's crater angle (a softer ground makes a deeper crater). Assumed. */
  craterScale: number;
  /** Multiplies Penner's coefficient of restitution. Assumed. */
  restitutionScale: number;
  /** Deceleration of a slowly rolling ball (m/s²), growing with speed (rollDistanceM). Assumed. */
  rollingDecelerationMps2: number;
}

/** The assumed parameters per firmness (no source: see the note at the top of this file). */
export const GROUND_FIRMNESS_PARAMETERS: Readonly<Record<GroundFirmness, GroundParameters>> = {
  soft: { craterScale: 1.3, restitutionScale: 0.85, rollingDecelerationMps2: 1.2 },
  normal: { craterScale: 1.0, restitutionScale: 1.0, rollingDecelerationMps2: 0.75 },
  firm: { craterScale: 0.8, restitutionScale: 1.1, rollingDecelerationMps2: 0.45 },
};

/** Penner (2002), from memory: the friction coefficient of ball on turf. */
export const TURF_FRICTION = 0.43;
/** A bounce leaving the ground slower than this (m/s, upward) starts the roll. Assumed. */
export const ROLL_START_MPS = 0.5;
const MAX_BOUNCES = 12;

/**
 * Penner's (2002) normal coefficient of restitution of a ball on turf, from the normal impact
 * speed (m/s): 0.510 − 0.0375·vn + 0.000903·vn² up to 20 m/s, 0.120 above (from memory). O(1).
 * @example turfRestitution(10) // => 0.2253
 */
export function turfRestitution(normalSpeedMps: number): number {
  const v = Math.abs(normalSpeedMps);
  return v > 20 ? 0.12 : 0.51 - 0.0375 * v + 0.000903 * v * v;
}

/**
 * Penner's (2002) effective crater angle (deg) from the impact speed (m/s) and angle below the
 * horizontal (deg): 15.4°·(v/18.6)·(θ/44.4) (from memory). O(1).
 * @example craterAngleDeg(18.6, 44.4) // => 15.4
 */
export function craterAngleDeg(speedMps: number, angleDeg: number): number {
  return 15.4 * (speedMps / 18.6) * (angleDeg / 44.4);
}

/**
 * One bounce (Penner 2002): a rigid sphere (I = 2/5·m·r²) meets the turf surface tilted up toward
 * it by the crater angle (a ball coming straight down makes a level crater); the normal speed
 * rebounds with Penner's e; Coulomb friction μ acts
 * along the surface, either sliding throughout (impulse μ(1 + e)|vn|) or bringing the contact
 * point to rest (the ball leaves rolling: vt' = (5·vt − 2·r·ω)/7 in the surface's frame).
 * Returns the velocity and spin as the ball leaves the ground. O(1).
 * @example turfBounce({ horizontalMps: 25, verticalMps: -20, backSpinRadS: 200 }, GROUND_FIRMNESS_PARAMETERS.normal)
 */
export function turfBounce(landing: GroundLanding, ground: GroundParameters): GroundLanding {
  const { horizontalMps: vh, verticalMps: vv } = landing;
  const r = BALL_RADIUS_M;
  const speed = Math.hypot(vh, vv);
  const angleDeg = Math.atan2(-vv, Math.abs(vh)) / RAD_PER_DEG;
  const tilt = ground.craterScale * craterAngleDeg(speed, angleDeg) * RAD_PER_DEG * Math.sign(vh);
  const c = Math.cos(tilt);
  const s = Math.sin(tilt);
  // Frame of the tilted surface: tangent t = (c, s), normal n = (−s, c).
  const vt = vh * c + vv * s;
  const vn = -vh * s + vv * c;
  if (vn >= 0) return { ...landing };
  const e = ground.restitutionScale * turfRestitution(vn);
  const slip = vt + r * landing.backSpinRadS;
  const limit = TURF_FRICTION * (1 + e) * -vn;
  const impulse = Math.abs(slip) > 3.5 * limit ? Math.sign(slip) * limit : slip / 3.5;
  const vtAfter = vt - impulse;
  const vnAfter = -e * vn;
  return {
    horizontalMps: vtAfter * c - vnAfter * s,
    verticalMps: vtAfter * s + vnAfter * c,
    backSpinRadS: landing.backSpinRadS - (2.5 * impulse) / r,
  };
}

/** Speed (m/s) at which the assumed grass resistance doubles the rolling deceleration. Assumed. */
export const ROLL_RESISTANCE_SPEED_MPS = 5;

/**
 * Distance (m) a ball rolling at `speedMps` covers to rest under a deceleration that grows with
 * speed, a(v) = a0·(1 + v/vr) (a0 the slow-roll deceleration, vr = 5 m/s; assumed: grass holds a
 * fast ball back more than a slow one): d = (vr/a0)·(v − vr·ln(1 + v/vr)). O(1).
 * @example rollDistanceM(5, 1) // => 5·(5 − 5·ln 2) = 7.67
 */
export function rollDistanceM(speedMps: number, slowDecelerationMps2: number): number {
  const vr = ROLL_RESISTANCE_SPEED_MPS;
  return (vr / slowDecelerationMps2) * (speedMps - vr * Math.log1p(speedMps / vr));
}

/** A landing: ground speed along the landing heading, downward speed, back spin. */
export interface GroundLanding {
  /** Horizontal speed (m/s), ≥ 0. */
  horizontalMps: number;
  /** Vertical speed (m/s), < 0 downward. */
  verticalMps: number;
  /** Back spin (rad/s), + for back spin, − for top spin. */
  backSpinRadS: number;
}

export interface GroundRun {
  /** Distance from the landing point to where the ball stops, along the landing heading (m); negative when it spins back past the landing point. */
  runM: number;
  /** Of which: the bounces (m). */
  bounceM: number;
  bounces: number;
}

/**
 * The run of a landed ball on ground of a firmness: Penner's bounces, then a roll at constant
 * deceleration. O(bounces) ≤ 12 bounces.
 * @throws RangeError when a value is not finite or the ball is not coming down
 * @example groundRun({ horizontalMps: 25, verticalMps: -20, backSpinRadS: 200 }, 'normal').runM // => ≈ 20
 */
export function groundRun(landing: GroundLanding, firmness: GroundFirmness = 'normal'): GroundRun {
  let vh = landing.horizontalMps;
  let vv = landing.verticalMps;
  let spin = landing.backSpinRadS;
  if (!Number.isFinite(vh) || !Number.isFinite(vv) || !Number.isFinite(spin)) throw new RangeError('landing values must be finite');
  if (!(vv < 0)) throw new RangeError(`vertical landing speed ${vv} m/s is not downward`);
  const ground = GROUND_FIRMNESS_PARAMETERS[firmness];
  if (!ground) throw new RangeError(`ground firmness "${firmness}" is not soft, normal or firm`);
  let bounceM = 0;
  let bounces = 0;
  while (bounces < MAX_BOUNCES) {
    bounces += 1;
    const after = turfBounce({ horizontalMps: vh, verticalMps: vv, backSpinRadS: spin }, ground);
    vh = after.horizontalMps;
    vv = after.verticalMps;
    spin = after.backSpinRadS;
    if (vv < ROLL_START_MPS) break;
    bounceM += (vh * 2 * vv) / STANDARD_GRAVITY_MPS2; // a hop without air
    vv = -vv;
  }
  const r = BALL_RADIUS_M;
  const rollMps = (5 * vh - 2 * r * spin) / 7;
  const rollM = Math.sign(rollMps) * rollDistanceM(Math.abs(rollMps), ground.rollingDecelerationMps2);
  return { runM: bounceM + rollM, bounceM, bounces };
}
