import { clubInfo } from '@/analysis/clubs';

/**
 * Length limits of the equipment rules (R&A / USGA Equipment Rules, Part 2, 1c): a club is at
 * least 18 in long and, putters aside, at most 48 in. Model Local Rule G-10 (available from
 * 1 January 2022) lets the committee of a competition limit every club but the putter to 46 in.
 */
export const MIN_CLUB_LENGTH_IN = 18;
export const MAX_CLUB_LENGTH_IN = 48;
export const LOCAL_RULE_G10_MAX_LENGTH_IN = 46;

export type ConformanceNote = {
  /** too-short, over-48: the club does not conform; over-46-local-rule: only where G-10 is in force. */
  code: 'too-short' | 'over-48' | 'over-46-local-rule';
  /** nonconforming: the equipment rules themselves; local-rule: only where a committee adopts it. */
  severity: 'nonconforming' | 'local-rule';
  title: string;
  text: string;
};

/**
 * Notes on a club's length against the equipment rules, for a fitter to weigh (they never block a
 * save). Putters have no upper limit; a club over 48 in gets only that note (it is over 46 in
 * too, but no longer conforms at all). An unknown club code is treated as a club other than a
 * putter. O(1).
 * https://www.usga.org/equipment-standards/equipment-rules-2019/equipment-rules/part-2-rule-1-interpretations.html
 * @example lengthConformanceNotes('DR', 46.5) // => [{ code: 'over-46-local-rule', … }]
 * @example lengthConformanceNotes('PT', 50) // => []
 */
export function lengthConformanceNotes(club: string, lengthIn: number | null | undefined): ConformanceNote[] {
  if (lengthIn === null || lengthIn === undefined || !Number.isFinite(lengthIn)) return [];
  const putter = clubInfo(club)?.kind === 'putter';
  if (lengthIn < MIN_CLUB_LENGTH_IN) {
    return [
      {
        code: 'too-short',
        severity: 'nonconforming',
        title: `Shorter than ${MIN_CLUB_LENGTH_IN} in`,
        text: `A club shorter than ${MIN_CLUB_LENGTH_IN} in does not conform to the Rules of Golf equipment rules.`,
      },
    ];
  }
  if (putter) return [];
  if (lengthIn > MAX_CLUB_LENGTH_IN) {
    return [
      {
        code: 'over-48',
        severity: 'nonconforming',
        title: `Longer than ${MAX_CLUB_LENGTH_IN} in`,
        text: `A club other than a putter longer than ${MAX_CLUB_LENGTH_IN} in does not conform to the Rules of Golf equipment rules. The governing bodies’ rules decide.`,
      },
    ];
  }
  if (lengthIn > LOCAL_RULE_G10_MAX_LENGTH_IN) {
    return [
      {
        code: 'over-46-local-rule',
        severity: 'local-rule',
        title: `Longer than ${LOCAL_RULE_G10_MAX_LENGTH_IN} in`,
        text: `Model Local Rule G-10, which many competitions adopt, limits clubs other than putters to ${LOCAL_RULE_G10_MAX_LENGTH_IN} in. The committee in charge of a competition decides.`,
      },
    ];
  }
  return [];
}
