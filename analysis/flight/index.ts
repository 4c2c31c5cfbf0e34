export { resolveAir, type AirConditions, type ResolvedAir, type Wind } from './air-conditions';
export { sutherlandViscosityPaS } from './air-viscosity';
export { ballForces, type UnitVector } from './ball-forces';
export type { CoefficientModel } from './coefficient-model';
export type { Conditions } from './conditions';
export {
  BALL_AREA_M2,
  BALL_DIAMETER_M,
  BALL_MASS_KG,
  BALL_RADIUS_M,
  RAD_PER_DEG,
  RAD_PER_S_PER_RPM,
  STANDARD_GRAVITY_MPS2,
} from './constants';
export {
  COEFFICIENT_MODELS,
  coefficientModel,
  defaultCoefficients,
  smitsSmithDragLyuLiftCoefficients,
} from './default-coefficients';
export { FLIGHT_FIELDS, fillFlightFields, flightFieldValue, type FlightField } from './fill-flight-fields';
export type { ForceModel } from './force-model';
export {
  craterAngleDeg,
  GROUND_FIRMNESS_PARAMETERS,
  GROUND_FIRMNESSES,
  groundRun,
  TURF_FRICTION,
  turfBounce,
  turfRestitution,
  ROLL_RESISTANCE_SPEED_MPS,
  ROLL_START_MPS,
  rollDistanceM,
  type GroundFirmness,
  type GroundLanding,
  type GroundParameters,
  type GroundRun,
} from './ground-run';
export {
  integrateTrajectory,
  type IntegrationOptions,
  type PathPoint,
  type TrajectoryResult,
  type TrajectoryStart,
} from './integrate-trajectory';
export { launchFromShot, type ShotLaunch } from './launch-from-shot';
export { launchVectors, type Launch, type LaunchVectors } from './launch-vectors';
export { LYU_DRAG_BRANCH_SWITCH_RE, lyuCoefficients, lyuDragCoefficient, lyuLiftCoefficient } from './lyu-coefficients';
export { DRAG_CRISIS_RE, modernBallCoefficients, modernBallDragCoefficient, modernBallLiftCoefficient } from './modern-ball-coefficients';
export { DEFAULT_CO2_MOLE_FRACTION, moistAirDensityKgM3, saturationVapourPressurePa } from './moist-air-density';
export { normaliseShot, type NormalisedShot } from './normalise-shot';
export {
  optimiseLaunch,
  type LaunchOptimum,
  type LaunchPick,
  type LaunchWindow,
  type OptimiseOptions,
  type WindowObjective,
  type WindowRow,
} from './optimise-launch';
export {
  clubWindowAim,
  DEFAULT_DESCENT_FLOOR_DEG,
  launchWindowForClub,
  RUN_MODEL_MIN_DESCENT_DEG,
  type ClubWindowAim,
} from './club-launch-window';
export { reynoldsNumber, reynoldsPerSpeed } from './reynolds-number';
export { simulateFlight, type FlightOptions, type FlightResult } from './simulate-flight';
export { smitsSmithCoefficients, smitsSmithDragCoefficient, smitsSmithLiftCoefficient } from './smits-smith-coefficients';
export { SPIN_DECAY_COEFFICIENT, spinDecayTimeConstantS } from './spin-decay';
export {
  ISA_GAS_CONSTANT_J_PER_KG_K,
  ISA_LAPSE_RATE_K_PER_M,
  ISA_SEA_LEVEL_PRESSURE_PA,
  ISA_SEA_LEVEL_TEMPERATURE_K,
  isaDensityKgM3,
  isaPressurePa,
  isaTemperatureK,
} from './standard-atmosphere';
export { GRASS_ROUGHNESS_M, WIND_REFERENCE_HEIGHT_M, windProfileFactor } from './wind-profile';
