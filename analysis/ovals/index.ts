export { descriptiveScale2, predictionScale2 } from './oval-scale';
export { groundOval, ovalFromCovariance, ovalFromMoments } from './oval';
export type { Oval, OvalKind } from './oval';
export { ovalOutline } from './oval-outline';
export type { GroundPoint } from './oval-outline';
export { ovalSpread, describeOvalSpread } from './oval-spread';
export type { OvalSpread } from './oval-spread';
