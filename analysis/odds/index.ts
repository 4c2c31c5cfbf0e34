export { fairwayOdds } from './fairway-odds';
export type { FairwayInput } from './fairway-odds';
export { discProbability, DISC_NODES } from './disc-probability';
export type { DiscInput } from './disc-probability';
export { greenOdds } from './green-odds';
export type { GreenInput } from './green-odds';
export { onTargetOdds, DEFAULT_FAIRWAY_WIDTH_M, DEFAULT_GREEN_RADIUS_M } from './on-target-odds';
export type { OddsTargets, OnTargetOdds } from './on-target-odds';
