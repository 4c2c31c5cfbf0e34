import type { ClubKind } from '@/analysis/clubs';
import { YARD_M } from '@/analysis/units';

/**
 * Carry-gap rule of thumb between neighbouring clubs. Common practice, no source: full-swing
 * carry gaps of about 10–15 yd (9.1–13.7 m) between irons; under about 7 yd is tight, over
 * about 20 yd wide. Woods and hybrids get a wider tolerance (our choice: wide over 25 yd).
 */
export const GAP_RULES = {
  targetMinM: 10 * YARD_M,
  targetMaxM: 15 * YARD_M,
  tightBelowM: 7 * YARD_M,
  wideAboveM: 20 * YARD_M,
  woodWideAboveM: 25 * YARD_M,
} as const;

/** Loft-step rule for wedges. Common practice, no source: wedge lofts in 4–6° steps. */
export const WEDGE_LOFT_STEP = { minDeg: 4, maxDeg: 6 } as const;

/** What is wrong with a carry gap: 'reversed' when the shorter club carries as far or farther. */
export type GapFlag = 'tight' | 'wide' | 'reversed' | null;

/** What is wrong with a loft step between wedges. */
export type LoftStepFlag = 'tight' | 'wide' | null;

const LONG_KINDS: ReadonlySet<ClubKind> = new Set<ClubKind>(['driver', 'wood', 'hybrid']);

/**
 * Flag for the carry gap from a club to the next shorter one (gapM = this carry − next carry).
 * The wood tolerance applies when either club is a driver, wood or hybrid. O(1).
 * @example classifyCarryGap(4, 'iron', 'iron') // => 'tight'
 */
export function classifyCarryGap(gapM: number, kind: ClubKind | null, nextKind: ClubKind | null): GapFlag {
  if (gapM <= 0) return 'reversed';
  if (gapM < GAP_RULES.tightBelowM) return 'tight';
  const long = (kind !== null && LONG_KINDS.has(kind)) || (nextKind !== null && LONG_KINDS.has(nextKind));
  if (gapM > (long ? GAP_RULES.woodWideAboveM : GAP_RULES.wideAboveM)) return 'wide';
  return null;
}

/**
 * Flag for the loft step between two neighbouring wedges (stepDeg = next loft − this loft);
 * null for any other pair of clubs. O(1).
 * @example classifyLoftStep(8, 'wedge', 'wedge') // => 'wide'
 */
export function classifyLoftStep(stepDeg: number, kind: ClubKind | null, nextKind: ClubKind | null): LoftStepFlag {
  if (kind !== 'wedge' || nextKind !== 'wedge') return null;
  if (stepDeg < WEDGE_LOFT_STEP.minDeg) return 'tight';
  if (stepDeg > WEDGE_LOFT_STEP.maxDeg) return 'wide';
  return null;
}
