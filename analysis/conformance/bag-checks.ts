import { clubInfo } from '@/analysis/clubs';
import type { BagLadderRung } from '@/analysis/ladder';
import { lengthConformanceNotes } from './length-conformance';

/**
 * Rules of Golf, Rule 4.1b: at most 14 clubs during a round. Equipment Rules: a putter's loft
 * at most 10°. Shown as notes only; the governing bodies' rules and the committee decide.
 */
export const MAX_CLUBS_IN_ROUND = 14;
export const MAX_PUTTER_LOFT_DEG = 10;

/** A club of the bag as the checks need it. */
export interface CheckedClub {
  id: string;
  club: string;
  loftDeg: number | null;
  lengthIn: number | null;
}

/** One note on a bag. */
export interface BagCheck {
  code: 'over-14-clubs' | 'over-48' | 'over-46-local-rule' | 'too-short' | 'putter-loft' | 'carry-overlap';
  /** nonconforming: against the rules themselves; local-rule: where a committee adopts it; advice: a fitting note. */
  severity: 'nonconforming' | 'local-rule' | 'advice';
  /** The bag clubs the note is about. */
  clubIds: string[];
  title: string;
  text: string;
}

const label = (code: string) => clubInfo(code)?.label ?? code;

/**
 * Notes on a bag, never blocking: more than 14 clubs (Rule 4.1b: players may carry more to
 * practise, not in a round); lengths against the equipment rules and Model Local Rule G-10 (see
 * `lengthConformanceNotes`); a putter lofted over 10°; neighbours on the ladder whose carries
 * overlap — the longer club's middle half of carries reaches into the shorter club's, or it
 * carries no farther (where only one carry each is known). O(n).
 * @example bagChecks(fifteenClubs, ladder)[0].code // => 'over-14-clubs'
 */
export function bagChecks(clubs: readonly CheckedClub[], ladder: readonly BagLadderRung[] = []): BagCheck[] {
  const checks: BagCheck[] = [];
  if (clubs.length > MAX_CLUBS_IN_ROUND) {
    checks.push({
      code: 'over-14-clubs',
      severity: 'nonconforming',
      clubIds: clubs.map((c) => c.id),
      title: `${clubs.length} clubs in the bag`,
      text: `The Rules of Golf (Rule 4.1b) allow at most ${MAX_CLUBS_IN_ROUND} clubs during a round. Carrying more to practise is fine; take ${clubs.length - MAX_CLUBS_IN_ROUND === 1 ? 'one' : clubs.length - MAX_CLUBS_IN_ROUND} out before a round played under the Rules.`,
    });
  }
  for (const c of clubs) {
    for (const note of lengthConformanceNotes(c.club, c.lengthIn)) {
      checks.push({ code: note.code, severity: note.severity, clubIds: [c.id], title: `${label(c.club)}: ${note.title.toLowerCase()}`, text: note.text });
    }
    if (clubInfo(c.club)?.kind === 'putter' && c.loftDeg !== null && c.loftDeg > MAX_PUTTER_LOFT_DEG) {
      checks.push({
        code: 'putter-loft',
        severity: 'nonconforming',
        clubIds: [c.id],
        title: `Putter lofted ${c.loftDeg}°`,
        text: `The Equipment Rules limit a putter's loft to ${MAX_PUTTER_LOFT_DEG}°. The governing bodies' rules decide.`,
      });
    }
  }
  const byId = new Map(ladder.map((r) => [r.id, r]));
  for (const r of ladder) {
    const next = r.nextId ? byId.get(r.nextId) : undefined;
    if (!next || r.carryM === null || next.carryM === null) continue;
    const bothSpread = r.carryQ1M != null && r.carryQ3M != null && next.carryQ1M != null && next.carryQ3M != null;
    const overlap = bothSpread ? (r.carryQ1M as number) <= (next.carryQ3M as number) : r.carryM <= next.carryM;
    if (!overlap) continue;
    checks.push({
      code: 'carry-overlap',
      severity: 'advice',
      clubIds: [r.id, next.id],
      title: `${label(r.club)} and ${label(next.club)} overlap`,
      text: bothSpread
        ? `Their usual carries overlap: one of the two may add little to the bag.`
        : `The ${label(r.club).toLowerCase()} carries no farther than the ${label(next.club).toLowerCase()}: one of the two may add little to the bag.`,
    });
  }
  return checks;
}
