export { bagChecks, MAX_CLUBS_IN_ROUND, MAX_PUTTER_LOFT_DEG } from './bag-checks';
export type { BagCheck, CheckedClub } from './bag-checks';
export { LOCAL_RULE_G10_MAX_LENGTH_IN, lengthConformanceNotes, MAX_CLUB_LENGTH_IN, MIN_CLUB_LENGTH_IN } from './length-conformance';
export type { ConformanceNote } from './length-conformance';
