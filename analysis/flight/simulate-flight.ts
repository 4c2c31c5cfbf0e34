import { resolveAir, type AirConditions } from './air-conditions';
import { ballForces } from './ball-forces';
import type { CoefficientModel } from './coefficient-model';
import { RAD_PER_DEG, RAD_PER_S_PER_RPM } from './constants';
import { defaultCoefficients } from './default-coefficients';
import { integrateTrajectory, type PathPoint } from './integrate-trajectory';
import { launchVectors, type Launch } from './launch-vectors';

export interface FlightOptions {
  /** Coefficient model; default `defaultCoefficients`. */
  model?: CoefficientModel;
  /** Integration step (s); default 0.2 s, the integrator's (see scripts/bench/flight.ts for its error). */
  stepS?: number;
  /** Record the path for plotting; default false. */
  samplePath?: boolean;
}

/** A computed flight, in canonical units. */
export interface FlightResult {
  /** Ground distance along the target line at landing (m). */
  carryM: number;
  /** Distance right (+) or left (−) of the target line at landing (m). */
  offlineM: number;
  /** Highest point above launch height (m). */
  apexHeightM: number;
  flightTimeS: number;
  /** Angle of the landing velocity below the horizontal (deg). */
  descentAngleDeg: number;
  /** Ground-frame speed at landing (m/s). */
  landingSpeedMps: number;
  /** Spin rate at landing (rpm). */
  landingSpinRpm: number;
  /** Air density used (kg/m³). */
  airDensityKgM3: number;
  /** Path points (m, s), only when `samplePath` was set. */
  path?: PathPoint[];
}

/**
 * Ball flight from launch conditions: a point-mass ball (45.93 g, 42.67 mm) under gravity, drag
 * and lift with spin decay, in air resolved from `air`, integrated by fixed-step RK4 until the
 * ball is back at launch height. O(flight time / step); about 35 steps for a driver at the
 * default step.
 * @throws RangeError when a launch or air value is out of range
 * @example simulateFlight({ ballSpeedMps: 74.65, launchAngleDeg: 10.9, spinRateRpm: 2686 }).carryM // => 236.3
 */
export function simulateFlight(launch: Launch, air: AirConditions = {}, options: FlightOptions = {}): FlightResult {
  const resolved = resolveAir(air);
  const vectors = launchVectors(launch);
  const forces = ballForces(resolved, options.model ?? defaultCoefficients, vectors.spinAxis);
  const result = integrateTrajectory(
    forces,
    { vxMps: vectors.vxMps, vyMps: vectors.vyMps, vzMps: vectors.vzMps, spin: launch.spinRateRpm * RAD_PER_S_PER_RPM },
    { stepS: options.stepS, samplePath: options.samplePath },
  );
  const horizontalMps = Math.hypot(result.landingVxMps, result.landingVzMps);
  const flight: FlightResult = {
    carryM: result.xM,
    offlineM: result.zM,
    apexHeightM: result.apexHeightM,
    flightTimeS: result.flightTimeS,
    descentAngleDeg: Math.atan2(-result.landingVyMps, horizontalMps) / RAD_PER_DEG,
    landingSpeedMps: Math.hypot(horizontalMps, result.landingVyMps),
    landingSpinRpm: result.landingSpin / RAD_PER_S_PER_RPM,
    airDensityKgM3: resolved.densityKgM3,
  };
  if (result.path) flight.path = result.path;
  return flight;
}
