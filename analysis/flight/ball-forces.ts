import type { ResolvedAir } from './air-conditions';
import type { CoefficientModel } from './coefficient-model';
import { BALL_AREA_M2, BALL_MASS_KG, BALL_RADIUS_M, STANDARD_GRAVITY_MPS2 } from './constants';
import type { ForceModel } from './force-model';
import { reynoldsPerSpeed } from './reynolds-number';
import { SPIN_DECAY_COEFFICIENT } from './spin-decay';

/** A unit vector (the spin axis) in the flight frame: x toward the target, y up, z right. */
export interface UnitVector {
  x: number;
  y: number;
  z: number;
}

/**
 * Forces on a spinning ball: gravity, drag against the air-relative velocity u = v − wind(h),
 * and lift along ω̂ × u (the Magnus force), with
 *   a = −g·ŷ + (ρ·A / 2m)·|u|·(−CD·u + CL·(ω̂ × u)),
 * CD and CL from `model` at S = R·ω/|u| and Re = ρ·|u|·d/μ, and spin decaying as
 * dω/dt = −c·(|u|/R)·ω (see spin-decay.ts). The wind at height h follows the logarithmic profile
 * of wind-profile.ts (no wind at or below the roughness length). The spin axis ω̂ stays fixed in
 * space (no gyroscopic precession), and ω̂ × u is not renormalised, so only the part of the spin
 * across the air flow lifts. The extra scalar of the integrator is ω in rad/s. O(1) per call.
 * @example integrateTrajectory(ballForces(resolveAir(), defaultCoefficients, axis), start)
 */
export function ballForces(air: ResolvedAir, model: CoefficientModel, spinAxis: UnitVector): ForceModel {
  const k = (air.densityKgM3 * BALL_AREA_M2) / (2 * BALL_MASS_KG);
  const rePerSpeed = reynoldsPerSpeed(air.densityKgM3, air.viscosityPaS);
  const decay = SPIN_DECAY_COEFFICIENT / BALL_RADIUS_M;
  const { windXMps, windZMps, windRoughnessM } = air;
  const windy = windXMps !== 0 || windZMps !== 0;
  const perLog = windy ? 1 / Math.log(air.windReferenceHeightM / windRoughnessM) : 0;
  const wx = spinAxis.x;
  const wy = spinAxis.y;
  const wz = spinAxis.z;
  return {
    derivative(heightM, vx, vy, vz, spin, out) {
      let ux = vx;
      let uz = vz;
      if (windy && heightM > windRoughnessM) {
        const share = Math.log(heightM / windRoughnessM) * perLog;
        ux -= windXMps * share;
        uz -= windZMps * share;
      }
      const uy = vy;
      const speed = Math.sqrt(ux * ux + uy * uy + uz * uz);
      if (speed === 0) {
        out[0] = 0;
        out[1] = -STANDARD_GRAVITY_MPS2;
        out[2] = 0;
        out[3] = 0;
        return;
      }
      const spinRatio = (BALL_RADIUS_M * spin) / speed;
      const reynolds = rePerSpeed * speed;
      const drag = k * speed * model.dragCoefficient(spinRatio, reynolds);
      const lift = k * speed * model.liftCoefficient(spinRatio, reynolds);
      out[0] = -drag * ux + lift * (wy * uz - wz * uy);
      out[1] = -STANDARD_GRAVITY_MPS2 - drag * uy + lift * (wz * ux - wx * uz);
      out[2] = -drag * uz + lift * (wx * uy - wy * ux);
      out[3] = -decay * speed * spin;
    },
  };
}
