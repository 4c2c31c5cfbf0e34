import { resolveAir } from './air-conditions';
import { ballForces } from './ball-forces';
import type { CoefficientModel } from './coefficient-model';
import type { Conditions } from './conditions';
import { RAD_PER_DEG, RAD_PER_S_PER_RPM } from './constants';
import { defaultCoefficients } from './default-coefficients';
import { groundRun } from './ground-run';
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
  /** Distance from the landing point to where the ball stops, along the target line (m); negative when it spins back. */
  rollM: number;
  /** carryM + rollM (m). */
  totalM: number;
  /** Air density used (kg/m³). */
  airDensityKgM3: number;
  /** Path points (m, s), only when `samplePath` was set. */
  path?: PathPoint[];
}

/**
 * Ball flight from launch conditions: a point-mass ball (45.93 g, 42.67 mm) under gravity, drag
 * and lift with spin decay, in air resolved from `conditions`, integrated by fixed-step RK4 until
 * the ball is back at launch height; then its run on ground of `conditions.firmness` (default
 * normal; ground-run.ts) gives roll and total. O(flight time / step); about 35 steps for a driver
 * at the default step.
 * @throws RangeError when a launch or air value is out of range
 * @example simulateFlight({ ballSpeedMps: 74.65, launchAngleDeg: 10.9, spinRateRpm: 2686 }).carryM // => 256.7
 */
export function simulateFlight(launch: Launch, conditions: Conditions = {}, options: FlightOptions = {}): FlightResult {
  const resolved = resolveAir(conditions);
  const vectors = launchVectors(launch);
  const forces = ballForces(resolved, options.model ?? defaultCoefficients, vectors.spinAxis);
  const result = integrateTrajectory(
    forces,
    { vxMps: vectors.vxMps, vyMps: vectors.vyMps, vzMps: vectors.vzMps, spin: launch.spinRateRpm * RAD_PER_S_PER_RPM },
    { stepS: options.stepS, samplePath: options.samplePath },
  );
  const horizontalMps = Math.hypot(result.landingVxMps, result.landingVzMps);
  // The run along the landing heading ψ, with the back spin about the horizontal axis across it.
  let rollM = 0;
  if (result.flightTimeS > 0 && result.landingVyMps < 0) {
    const cosPsi = horizontalMps > 0 ? result.landingVxMps / horizontalMps : 1;
    const sinPsi = horizontalMps > 0 ? result.landingVzMps / horizontalMps : 0;
    const across = vectors.spinAxis.z * cosPsi - vectors.spinAxis.x * sinPsi;
    const run = groundRun({ horizontalMps, verticalMps: result.landingVyMps, backSpinRadS: result.landingSpin * across }, conditions.firmness);
    rollM = run.runM * cosPsi;
  }
  const flight: FlightResult = {
    carryM: result.xM,
    offlineM: result.zM,
    apexHeightM: result.apexHeightM,
    flightTimeS: result.flightTimeS,
    descentAngleDeg: Math.atan2(-result.landingVyMps, horizontalMps) / RAD_PER_DEG,
    landingSpeedMps: Math.hypot(horizontalMps, result.landingVyMps),
    landingSpinRpm: result.landingSpin / RAD_PER_S_PER_RPM,
    rollM,
    totalM: result.xM + rollM,
    airDensityKgM3: resolved.densityKgM3,
  };
  if (result.path) flight.path = result.path;
  return flight;
}
