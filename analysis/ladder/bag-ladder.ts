import { clubInfo, compareClubs } from '@/analysis/clubs';
import { classifyCarryGap, classifyLoftStep } from './gap-rules';
import type { GapFlag, LoftStepFlag } from './gap-rules';

/** Where a bag club's carry comes from: hit in a fitting, entered by hand, or estimated by the flight model. */
export type CarrySource = 'hit' | 'entered' | 'estimate';

/** One club of a bag as the ladder needs it (canonical units). */
export interface BagLadderClub {
  id: string;
  club: string;
  loftDeg: number | null;
  carryM: number | null;
  carrySource: CarrySource | null;
  /** Middle half of the carries where the club was hit (m); null when not hit. */
  carryQ1M?: number | null;
  carryQ3M?: number | null;
}

/** One club on the bag's ladder. JSON-able. */
export interface BagLadderRung extends BagLadderClub {
  /** The loft the order uses: the club's own, else the typical loft of its kind. */
  orderLoftDeg: number;
  /** The next (shorter) club in the bag; null for the last. */
  nextId: string | null;
  /** This carry less the next club's; null when either carry is unknown. */
  gapToNextM: number | null;
  gapFlag: GapFlag;
  /** Next loft less this one; null when either loft is unknown. */
  loftStepToNextDeg: number | null;
  loftStepFlag: LoftStepFlag;
}

const UNKNOWN_LOFT_DEG = 90;

/**
 * The bag's ladder: every club but the putter, ordered by loft (the club's own, else the typical
 * loft of its kind; ties by longer carry, then bag order), each with the carry gap and loft step
 * to its neighbour in the bag and the common-practice flags of `gap-rules` (carry gaps too tight,
 * too wide or reversed; wedge loft steps outside 4–6°). Clubs without a carry stay on the ladder
 * with no gap. O(n log n).
 * @example bagLadder([{ id: 'a', club: '7I', loftDeg: 31, carryM: 137, carrySource: 'hit' }, { id: 'b', club: '8I', loftDeg: 35, carryM: 128, carrySource: 'estimate' }])[0].gapToNextM // => 9
 */
export function bagLadder(clubs: readonly BagLadderClub[]): BagLadderRung[] {
  const ordered = clubs
    .filter((c) => clubInfo(c.club)?.kind !== 'putter')
    .map((c) => ({ c, orderLoftDeg: c.loftDeg ?? clubInfo(c.club)?.typicalLoftDeg ?? UNKNOWN_LOFT_DEG }))
    .sort((a, b) => a.orderLoftDeg - b.orderLoftDeg || (b.c.carryM ?? -1) - (a.c.carryM ?? -1) || compareClubs(a.c.club, b.c.club) || a.c.id.localeCompare(b.c.id));
  return ordered.map(({ c, orderLoftDeg }, i) => {
    const next = ordered[i + 1]?.c;
    const kind = clubInfo(c.club)?.kind ?? null;
    const nextKind = next ? (clubInfo(next.club)?.kind ?? null) : null;
    const gapToNextM = next && c.carryM !== null && next.carryM !== null ? c.carryM - next.carryM : null;
    const loftStepToNextDeg = next && c.loftDeg !== null && next.loftDeg !== null ? next.loftDeg - c.loftDeg : null;
    return {
      ...c,
      carryQ1M: c.carryQ1M ?? null,
      carryQ3M: c.carryQ3M ?? null,
      orderLoftDeg,
      nextId: next?.id ?? null,
      gapToNextM,
      gapFlag: gapToNextM === null ? null : classifyCarryGap(gapToNextM, kind, nextKind),
      loftStepToNextDeg,
      loftStepFlag: loftStepToNextDeg === null ? null : classifyLoftStep(loftStepToNextDeg, kind, nextKind),
    };
  });
}
