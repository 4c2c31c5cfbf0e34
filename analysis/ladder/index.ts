export { buildLadder, groupKey } from './build-ladder';
export type { LadderGroup, LadderOptions, LadderRung } from './build-ladder';
export { classifyCarryGap, classifyLoftStep, GAP_RULES, WEDGE_LOFT_STEP } from './gap-rules';
export type { GapFlag, LoftStepFlag } from './gap-rules';
export { bagLadder } from './bag-ladder';
export type { BagLadderClub, BagLadderRung, CarrySource } from './bag-ladder';
export { areNeighbours, NEIGHBOUR_LOFT_STEP_DEG } from './neighbours';
