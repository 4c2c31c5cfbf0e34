import { clubInfo, compareClubs } from '@/analysis/clubs';
import { summarizeInPlace } from '@/analysis/statistics';
import { classifyCarryGap, classifyLoftStep } from './gap-rules';
import { areNeighbours } from './neighbours';
import type { GapFlag, LoftStepFlag } from './gap-rules';

/** The kept carries of one group (club and build). */
export interface LadderGroup {
  club: string;
  build: string | null;
  carryM: ArrayLike<number>;
}

/** One club on the ladder. JSON-able. */
export interface LadderRung {
  club: string;
  /** The builds whose shots make up this rung. */
  builds: (string | null)[];
  /** Kept shots with a carry. */
  n: number;
  carryMedianM: number;
  carryQ1M: number;
  carryQ3M: number;
  /** Sample sd of carry; null when n < 2. */
  carrySdM: number | null;
  /** This club's median carry less the next (shorter) club's; null for the last club. */
  gapToNextM: number | null;
  /**
   * Whether the next club is its neighbour (see areNeighbours): gaps and loft steps are flagged
   * only between neighbours; false for the last club.
   */
  neighbourToNext: boolean;
  gapFlag: GapFlag;
  /** Loft of the build(s) used; null when unknown or when the builds differ. */
  loftDeg: number | null;
  /** Next club's loft less this one's; null when either is unknown. */
  loftStepToNextDeg: number | null;
  loftStepFlag: LoftStepFlag;
}

/** Choices for the ladder. */
export interface LadderOptions {
  /** Per club, the build to use; clubs not listed pool all their builds. */
  chosenBuild?: Record<string, string | null>;
  /** Loft per group, keyed `${club}|${build ?? ''}`. */
  loftByGroup?: Record<string, number>;
  /**
   * The player's bag clubs (canonical codes): neighbours are clubs with no bag club between
   * them. Without it, neighbours are clubs a set would hold next to each other.
   */
  neighbours?: readonly string[];
}

/**
 * The key of a group (club and build) in `loftByGroup` and similar maps. O(1).
 * @example groupKey('7I', null) // => '7I|'
 */
export function groupKey(club: string, build: string | null): string {
  return `${club}|${build ?? ''}`;
}

/**
 * The bag's ladder: per club (putters left out) the carry of the kept shots (median, quartiles,
 * sd) pooled across its builds or from the chosen build, the gap to the next club in bag order,
 * loft steps where lofts are known, and — only between neighbours (areNeighbours, or the bag's
 * clubs given as `neighbours`) — flags for gaps that are too tight or too wide (common practice,
 * see GAP_RULES) and wedge loft steps outside 4–6°. No "wide" driver to 7-iron gap when the
 * clubs between were not hit. O(n) expected.
 * @example buildLadder([{ club: '7I', build: null, carryM: [150, 152] }, { club: '8I', build: null, carryM: [140, 141] }])[0].gapToNextM // => 10.5
 */
export function buildLadder(groups: readonly LadderGroup[], options: LadderOptions = {}): LadderRung[] {
  const byClub = new Map<string, LadderGroup[]>();
  for (const group of groups) {
    if (group.club === 'PT') continue;
    const chosen = options.chosenBuild;
    if (chosen && Object.prototype.hasOwnProperty.call(chosen, group.club) && chosen[group.club] !== group.build) continue;
    const list = byClub.get(group.club);
    if (list) list.push(group);
    else byClub.set(group.club, [group]);
  }
  const partial: Omit<LadderRung, 'gapToNextM' | 'neighbourToNext' | 'gapFlag' | 'loftStepToNextDeg' | 'loftStepFlag'>[] = [];
  for (const club of [...byClub.keys()].sort(compareClubs)) {
    const list = byClub.get(club)!;
    let total = 0;
    for (const g of list) total += g.carryM.length;
    const carries = new Float64Array(total);
    let n = 0;
    for (const g of list) {
      for (let i = 0; i < g.carryM.length; i++) if (Number.isFinite(g.carryM[i])) carries[n++] = g.carryM[i];
    }
    if (n === 0) continue;
    const summary = summarizeInPlace(carries, n);
    const lofts = list.map((g) => options.loftByGroup?.[groupKey(g.club, g.build)]);
    const loftDeg = lofts.every((l) => l !== undefined && l === lofts[0]) ? (lofts[0] as number) : null;
    partial.push({
      club,
      builds: list.map((g) => g.build).sort((x, y) => (x ?? '').localeCompare(y ?? '')),
      n,
      carryMedianM: summary.median,
      carryQ1M: summary.q1,
      carryQ3M: summary.q3,
      carrySdM: summary.sd,
      loftDeg,
    });
  }
  return partial.map((rung, i) => {
    const next = partial[i + 1];
    if (!next) return { ...rung, gapToNextM: null, neighbourToNext: false, gapFlag: null, loftStepToNextDeg: null, loftStepFlag: null };
    const kind = clubInfo(rung.club)?.kind ?? null;
    const nextKind = clubInfo(next.club)?.kind ?? null;
    const gapToNextM = rung.carryMedianM - next.carryMedianM;
    const loftStepToNextDeg = rung.loftDeg !== null && next.loftDeg !== null ? next.loftDeg - rung.loftDeg : null;
    const neighbourToNext = areNeighbours(rung.club, next.club, options.neighbours);
    return {
      ...rung,
      gapToNextM,
      neighbourToNext,
      gapFlag: neighbourToNext ? classifyCarryGap(gapToNextM, kind, nextKind) : null,
      loftStepToNextDeg,
      loftStepFlag: loftStepToNextDeg === null || !neighbourToNext ? null : classifyLoftStep(loftStepToNextDeg, kind, nextKind),
    };
  });
}
