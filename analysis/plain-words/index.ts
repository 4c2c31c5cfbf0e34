export { buildInPlainWords, theBuild } from './build-in-plain-words';
export type { PlainBuildWords } from './build-in-plain-words';
export { chanceWords, oddsInPlainWords } from './odds-in-plain-words';
export { curveWord, faceWord, HOOK_AXIS_DEG, missWord, pathWord, SQUARE_DEG, STRAIGHT_AXIS_DEG } from './handed-words';
export type { Hand } from './handed-words';
