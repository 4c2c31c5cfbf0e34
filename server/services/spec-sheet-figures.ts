/**
 * The figures behind each chosen build on the spec sheet, from the fitting's analysis: carry,
 * spread, the oval, and the chosen build against the club's other build with the most shots.
 */
import type { HeadToHead } from '../../analysis/head-to-head';
import type { GroupAnalysis, GroupRef, SessionAnalysis } from '../../analysis/session';
import { RAD_PER_DEG } from '../../analysis/flight';
import type { ChoiceFigures } from '../schemas';

/**
 * On-target odds of the chosen build (the analysis's next-shot odds for its group) and the
 * head-to-head's one-sentence summary against the rival, when both are known. O(groups).
 */
export function decisionFigures(
  analysis: SessionAnalysis,
  chosen: GroupRef,
  headToHead: HeadToHead | null,
): Pick<ChoiceFigures, 'onTargetOdds' | 'summary'> {
  const group = analysis.groups.find((g) => sameGroup(g, chosen));
  const odds = group?.odds;
  const onTargetOdds =
    odds && odds.fairway.p !== null && odds.green.p !== null
      ? { fairwayWidthM: odds.fairway.widthM, fairway: odds.fairway.p, greenRadiusM: odds.green.radiusM, green: odds.green.p }
      : null;
  return { onTargetOdds, summary: headToHead?.summary ?? null };
}

/** Half-extents of an oval across (offline) and along (carry) the target line. */
function ovalExtents(g: GroupAnalysis): { widthM: number; lengthM: number } | null {
  const o = g.oval;
  if (!o) return null;
  const phi = o.angleDeg * RAD_PER_DEG; // long axis from the carry axis toward +offline
  const across = Math.sqrt(o.semiMajor ** 2 * Math.sin(phi) ** 2 + o.semiMinor ** 2 * Math.cos(phi) ** 2);
  const along = Math.sqrt(o.semiMajor ** 2 * Math.cos(phi) ** 2 + o.semiMinor ** 2 * Math.sin(phi) ** 2);
  return { widthM: 2 * across, lengthM: 2 * along };
}

const sameGroup = (g: GroupAnalysis, ref: GroupRef) => g.club === ref.club && (g.build ?? null) === (ref.build ?? null);

/** The club's other build with the most kept shots (at least two), to compare the chosen one with. */
export function rivalOf(analysis: SessionAnalysis, chosen: GroupRef): GroupRef | null {
  const rival = analysis.groups
    .filter((g) => g.club === chosen.club && !sameGroup(g, chosen) && g.kept >= 2)
    .sort((a, b) => b.kept - a.kept || (a.build ?? '').localeCompare(b.build ?? ''))[0];
  return rival ? { club: rival.club, build: rival.build } : null;
}

/**
 * Figures of one chosen build: its kept shots' carry (median, middle half, sd), offline sd, the
 * 95 % oval's width and length, and against the rival (see `rivalOf`) the Welch 95 % interval of
 * the carry difference and the ratio of offline sd, from `headToHead` (chosen as A, rival as B).
 * Null when the build has no kept shots. O(groups).
 */
export function choiceFigures(analysis: SessionAnalysis, chosen: GroupRef, rivalRef: GroupRef | null, headToHead: HeadToHead | null): ChoiceFigures | null {
  const group = analysis.groups.find((g) => sameGroup(g, chosen));
  if (!group || group.kept === 0) return null;
  let rival: ChoiceFigures['rival'] = null;
  const carryDiff = headToHead?.fields.carry;
  if (rivalRef && carryDiff) {
    const offline = headToHead?.spread.fields.offline;
    rival = {
      label: rivalRef.build ?? '',
      carryDiffM: carryDiff.diff,
      carryDiffCi95M: carryDiff.ci95,
      offlineSdRatio: offline && offline.sdB > 0 ? offline.sdA / offline.sdB : null,
    };
  }
  const carry = group.fields.carry;
  const extents = ovalExtents(group);
  return {
    n: group.kept,
    carryMedianM: carry?.median ?? null,
    carryQ1M: carry?.q1 ?? null,
    carryQ3M: carry?.q3 ?? null,
    carrySdM: carry?.sd ?? null,
    offlineSdM: group.fields.offline?.sd ?? null,
    ovalWidthM: extents?.widthM ?? null,
    ovalLengthM: extents?.lengthM ?? null,
    rival,
    ...decisionFigures(analysis, chosen, headToHead),
  };
}
