export { analyseSession } from './analyse-session';
export { analyseGroup, groupStrays } from './analyse-group';
export type { AnalysedGroup } from './analyse-group';
export { shotColumns } from './shot-columns';
export type { ShotColumns } from './shot-columns';
export type {
  GroupAnalysis,
  GroupRef,
  SessionAnalysis,
  SessionOptions,
  SessionOval,
  SessionStray,
} from './session-types';
