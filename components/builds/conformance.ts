// The rule lives in analysis/conformance (one place for the build form, the bag and the spec sheet).
export { lengthConformanceNotes, LOCAL_RULE_G10_MAX_LENGTH_IN, MAX_CLUB_LENGTH_IN, MIN_CLUB_LENGTH_IN, type ConformanceNote } from '@/analysis/conformance';
