import type { ForceModel } from './force-model';
import { hermite, hermiteRoot } from './hermite';

/** The start of a flight: at the origin (launch height 0) with this velocity and spin. */
export interface TrajectoryStart {
  vxMps: number;
  vyMps: number;
  vzMps: number;
  /** The extra scalar carried along (the ball's spin rate, rad/s); 0 when unused. */
  spin?: number;
}

export interface IntegrationOptions {
  /** Fixed step (s). Default 0.2 s (carry within 0.002 % of a 1 ms step for the default ball model; scripts/bench/flight.ts). */
  stepS?: number;
  /** Give up (throw) if the point has not come back to launch height by then. Default 60 s. */
  maxTimeS?: number;
  /** Record the path (one point per step plus the landing point). Default false. */
  samplePath?: boolean;
}

/** One recorded point of a path. */
export interface PathPoint {
  timeS: number;
  xM: number;
  yM: number;
  zM: number;
}

export interface TrajectoryResult {
  /** x at landing (m): distance along the target line. */
  xM: number;
  /** z at landing (m): + right of the target line. */
  zM: number;
  flightTimeS: number;
  apexHeightM: number;
  apexTimeS: number;
  /** Ground-frame velocity at landing (m/s). */
  landingVxMps: number;
  landingVyMps: number;
  landingVzMps: number;
  /** The extra scalar (spin) at landing. */
  landingSpin: number;
  /** Present only when `samplePath` was set. */
  path?: PathPoint[];
}

const DEFAULT_STEP_S = 0.2;
const DEFAULT_MAX_TIME_S = 60;

/**
 * Integrate a point mass from launch height until it comes back down to it, with classical
 * fourth-order Runge–Kutta at a fixed step (the height is part of the state: forces may depend
 * on it); the landing and the apex are placed inside their step by cubic Hermite interpolation
 * of positions (from positions and velocities at both ends of the step) and of velocities and
 * spin (from their values and rates at both ends), so the landing velocity and spin are those at
 * the ground crossing, not at the end of the step, and their error is of the same order as the
 * step's. O(flight time / step) derivative calls
 * (four per step).
 * https://en.wikipedia.org/wiki/Runge%E2%80%93Kutta_methods
 * @throws RangeError when the step or time limit is not positive
 * @throws Error when the point is still in the air after `maxTimeS`
 * @example
 * // gravity only: out = [0, −9.80665, 0, 0]; 70 m/s at 10°
 * integrateTrajectory(gravityOnly, { vxMps: 68.9365, vyMps: 12.1554, vzMps: 0 }).xM // => 170.894
 */
export function integrateTrajectory(forces: ForceModel, start: TrajectoryStart, options: IntegrationOptions = {}): TrajectoryResult {
  const h = options.stepS ?? DEFAULT_STEP_S;
  const maxTimeS = options.maxTimeS ?? DEFAULT_MAX_TIME_S;
  if (!(h > 0) || !Number.isFinite(h)) throw new RangeError(`step ${h} s is not positive`);
  if (!(maxTimeS > 0)) throw new RangeError(`time limit ${maxTimeS} s is not positive`);
  const path: PathPoint[] | undefined = options.samplePath ? [{ timeS: 0, xM: 0, yM: 0, zM: 0 }] : undefined;
  let x = 0;
  let y = 0;
  let z = 0;
  let vx = start.vxMps;
  let vy = start.vyMps;
  let vz = start.vzMps;
  let w = start.spin ?? 0;
  const k = new Float64Array(4);
  forces.derivative(0, vx, vy, vz, w, k);
  let ax = k[0];
  let ay = k[1];
  let az = k[2];
  let aw = k[3];
  if (!(vy > 0)) {
    const still: TrajectoryResult = {
      xM: 0, zM: 0, flightTimeS: 0, apexHeightM: 0, apexTimeS: 0,
      landingVxMps: vx, landingVyMps: vy, landingVzMps: vz, landingSpin: w,
    };
    if (path) still.path = path;
    return still;
  }
  let t = 0;
  let apexHeightM = 0;
  let apexTimeS = 0;
  const half = h / 2;
  const sixth = h / 6;
  while (t < maxTimeS) {
    // k1 = (v, a) at the start of the step (carried over from the end of the last step).
    const v1x = vx, v1y = vy, v1z = vz;
    const a1x = ax, a1y = ay, a1z = az, a1w = aw;
    const v2x = vx + half * a1x, v2y = vy + half * a1y, v2z = vz + half * a1z;
    forces.derivative(y + half * v1y, v2x, v2y, v2z, w + half * a1w, k);
    const a2x = k[0], a2y = k[1], a2z = k[2], a2w = k[3];
    const v3x = vx + half * a2x, v3y = vy + half * a2y, v3z = vz + half * a2z;
    forces.derivative(y + half * v2y, v3x, v3y, v3z, w + half * a2w, k);
    const a3x = k[0], a3y = k[1], a3z = k[2], a3w = k[3];
    const v4x = vx + h * a3x, v4y = vy + h * a3y, v4z = vz + h * a3z;
    forces.derivative(y + h * v3y, v4x, v4y, v4z, w + h * a3w, k);
    const a4x = k[0], a4y = k[1], a4z = k[2], a4w = k[3];

    const nx = x + sixth * (v1x + 2 * v2x + 2 * v3x + v4x);
    const ny = y + sixth * (v1y + 2 * v2y + 2 * v3y + v4y);
    const nz = z + sixth * (v1z + 2 * v2z + 2 * v3z + v4z);
    const nvx = vx + sixth * (a1x + 2 * a2x + 2 * a3x + a4x);
    const nvy = vy + sixth * (a1y + 2 * a2y + 2 * a3y + a4y);
    const nvz = vz + sixth * (a1z + 2 * a2z + 2 * a3z + a4z);
    const nw = w + sixth * (a1w + 2 * a2w + 2 * a3w + a4w);
    forces.derivative(ny, nvx, nvy, nvz, nw, k);
    const nax = k[0], nay = k[1], naz = k[2], naw = k[3];

    if (vy > 0 && nvy <= 0) {
      // Apex inside this step: vertical velocity crosses zero.
      const s = hermiteRoot(vy, ay, nvy, nay, h);
      const height = hermite(y, vy, ny, nvy, h, s);
      if (height > apexHeightM) {
        apexHeightM = height;
        apexTimeS = t + s * h;
      }
    }
    if (ny <= 0) {
      const s = hermiteRoot(y, vy, ny, nvy, h);
      const landing: TrajectoryResult = {
        xM: hermite(x, vx, nx, nvx, h, s),
        zM: hermite(z, vz, nz, nvz, h, s),
        flightTimeS: t + s * h,
        apexHeightM,
        apexTimeS,
        landingVxMps: hermite(vx, ax, nvx, nax, h, s),
        landingVyMps: hermite(vy, ay, nvy, nay, h, s),
        landingVzMps: hermite(vz, az, nvz, naz, h, s),
        landingSpin: hermite(w, aw, nw, naw, h, s),
      };
      if (path) {
        path.push({ timeS: landing.flightTimeS, xM: landing.xM, yM: 0, zM: landing.zM });
        landing.path = path;
      }
      return landing;
    }
    x = nx; y = ny; z = nz;
    vx = nvx; vy = nvy; vz = nvz; w = nw;
    ax = nax; ay = nay; az = naz; aw = naw;
    t += h;
    if (path) path.push({ timeS: t, xM: x, yM: y, zM: z });
  }
  throw new Error(`the trajectory has not landed after ${maxTimeS} s`);
}
