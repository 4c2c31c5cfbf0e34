export { impactSpeedRatio, BALL_MASS_LIMIT_KG } from './impact-speed-ratio';
export type { ImpactInput } from './impact-speed-ratio';
export { smashFactorLimit, smashFactorMisread, IMPACT_CLUBS, RESTITUTION_LIMIT, SMASH_MEASUREMENT_ALLOWANCE } from './smash-factor-limit';
export type { SmashFactorLimit } from './smash-factor-limit';
