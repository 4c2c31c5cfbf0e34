import { clubInfo } from '@/analysis/clubs';
import type { BagStatus } from '@/server/schemas';
import type { BagLadderRung, CarrySource } from '@/analysis/ladder';
import type { LadderRung } from '@/analysis/ladder';
import { specNumber } from '@/analysis/bag';

export const STATUS_WORDS: Readonly<Record<BagStatus, string>> = { 'in-bag': 'In the bag', 'on-order': 'On order', out: 'Out' };
export const STATUS_OPTIONS = (['in-bag', 'on-order', 'out'] as const).map((value) => ({ value, label: STATUS_WORDS[value] }));

/** How the carry's source reads beside the carry. */
export const SOURCE_WORDS: Readonly<Record<CarrySource, string>> = { hit: 'hit', entered: 'entered', estimate: 'estimate' };

/** A club's full name: "Driver", "7 iron", "Pitching wedge", "56° wedge". */
export const clubName = (code: string): string => {
  const label = clubInfo(code)?.label ?? code;
  return label.charAt(0).toUpperCase() + label.slice(1);
};

/** A short row label for a chart: the full name, but a wedge by its loft ("50° wedge") when known. O(1). */
export function chartLabel(code: string, loftDeg: number | null): string {
  const info = clubInfo(code);
  if (info?.kind === 'wedge' && loftDeg !== null) return `${specNumber(loftDeg)}° wedge`;
  return clubName(code);
}

/**
 * The bag's ladder as the session ladder chart draws it: clubs with a carry only, a single carry
 * (entered or estimated) drawn as a point. O(n).
 */
export function chartRungs(ladder: readonly BagLadderRung[]): { rungs: LadderRung[]; sources: (CarrySource | null)[]; labels: string[]; withoutCarry: BagLadderRung[] } {
  const withCarry = ladder.filter((r) => r.carryM !== null);
  return {
    rungs: withCarry.map((r) => ({
      club: r.id, // one row per bag club, even for two clubs of one code
      builds: [],
      n: r.carrySource === 'hit' ? 1 : 0,
      carryMedianM: r.carryM!,
      carryQ1M: r.carryQ1M ?? r.carryM!,
      carryQ3M: r.carryQ3M ?? r.carryM!,
      carrySdM: null,
      gapToNextM: r.gapToNextM,
      // clubs side by side in the bag are neighbours by definition
      neighbourToNext: r.gapToNextM !== null,
      gapFlag: r.gapFlag,
      loftDeg: r.loftDeg,
      loftStepToNextDeg: r.loftStepToNextDeg,
      loftStepFlag: r.loftStepFlag,
    })),
    sources: withCarry.map((r) => r.carrySource),
    labels: withCarry.map((r) => chartLabel(r.club, r.loftDeg)),
    withoutCarry: ladder.filter((r) => r.carryM === null),
  };
}
