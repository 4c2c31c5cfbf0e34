export { compareBuilds, SPREAD_METHOD } from './compare-builds';
export type { BuildSample, FieldComparison, HeadToHead, SpreadComparison } from './compare-builds';
export { moreShotsNeeded } from './shots-needed';
export type { ShotsNeededInput } from './shots-needed';
