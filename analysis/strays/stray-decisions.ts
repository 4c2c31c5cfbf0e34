/** A fitter's decision on one shot, by row: keep it in the statistics or drop it. */
export type StrayDecision = 'keep' | 'drop';

/**
 * Whether a shot counts in the statistics. The fitter's decision wins; without one, a stray
 * counts only when strays are included (the default leaves them out). O(1).
 * @example isShotKept({ flagged: true, decision: 'keep', includeStrays: false }) // => true
 */
export function isShotKept(shot: { flagged: boolean; decision?: StrayDecision; includeStrays?: boolean }): boolean {
  if (shot.decision === 'keep') return true;
  if (shot.decision === 'drop') return false;
  return !shot.flagged || shot.includeStrays === true;
}
