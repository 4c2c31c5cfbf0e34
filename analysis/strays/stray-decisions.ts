/** A fitter's decision on one shot, by row: keep it in the statistics or drop it. */
export type StrayDecision = 'keep' | 'drop';

/**
 * Whether a shot counts in the statistics. The fitter's decision wins; without one, a misread
 * or mishit counts only when strays are included (the default leaves them out), and a shot
 * flagged only for review (a directional miss: the player's dispersion) counts. O(1).
 * @example isShotKept({ flagged: true, decision: 'keep', includeStrays: false }) // => true
 * @example isShotKept({ flagged: true, reviewOnly: true }) // => true
 */
export function isShotKept(shot: { flagged: boolean; reviewOnly?: boolean; decision?: StrayDecision; includeStrays?: boolean }): boolean {
  if (shot.decision === 'keep') return true;
  if (shot.decision === 'drop') return false;
  return !shot.flagged || shot.reviewOnly === true || shot.includeStrays === true;
}
