import type { HeadToHead } from '../head-to-head/compare-builds';
import { displayUnits, fromCanonical, type UnitSystem } from '../units';

/** What a head-to-head says in a player's words. */
export interface PlainBuildWords {
  /** "The 65 g shaft: 6 yd longer and as straight" */
  headline: string;
  /** "than the 55 g shaft", or "" without a rival. */
  against: string;
  /** How sure: "clear", "too close to call yet". */
  certainty: 'settled' | 'not-yet';
}

type Parts = Pick<HeadToHead, 'b' | 'fields' | 'spread' | 'overall'>;

/** "The 65 g shaft" from a label "65 g shaft"; a label that is already a name ("Birch") stays. */
export function theBuild(label: string): string {
  if (label === '') return 'This build';
  if (label.toLowerCase().startsWith('the ')) return `The ${label.slice(4)}`;
  const first = label.charAt(0);
  // A label starting with a figure or a small letter is a description ("65 g shaft"); a capital, a name ("Birch").
  return first === first.toUpperCase() && first !== first.toLowerCase() ? label : `The ${label}`;
}

function lengthWords(h: Parts, units: UnitSystem): string {
  const c = h.fields.carry;
  if (!c) return '';
  if (c.verdict === 'equivalent') return 'as long';
  if (c.verdict !== 'clear') return 'no clear difference in length yet';
  const unit = displayUnits(units).carry;
  const amount = Math.round(Math.abs(fromCanonical(c.diff, unit, 'carry')));
  const more = c.diff > 0;
  if (amount === 0) return more ? 'a touch longer' : 'a touch shorter';
  return `${amount} ${unit} ${more ? 'longer' : 'shorter'}`;
}

function straightWords(h: Parts): string {
  const s = h.spread.fields.offline;
  if (!s) return '';
  if (s.verdict === 'equivalent') return 'as straight';
  if (s.verdict !== 'clear') return 'no clear difference in straightness yet';
  return s.diff < 0 ? 'straighter' : 'less straight';
}

/**
 * A chosen build against its rival in a player's words, from the head-to-head (A = the chosen
 * build): length from the carry difference (whole yards or metres, "as long" when equivalent),
 * straightness from the left–right spread ("as straight", "straighter"); "not yet" unless the
 * overall verdict is settled (a build, a trade-off or equivalent). O(1).
 * @example buildInPlainWords('65 g shaft', h, 'imperial').headline // => 'The 65 g shaft: 6 yd longer and as straight'
 */
export function buildInPlainWords(label: string, h: Parts | null, units: UnitSystem): PlainBuildWords {
  const name = theBuild(label);
  if (!h) return { headline: `${name}: the one your fitter chose`, against: '', certainty: 'settled' };
  const parts = [lengthWords(h, units), straightWords(h)].filter((p) => p !== '');
  const body = parts.length === 0 ? 'no difference we could measure' : parts.join(' and ');
  const rival = h.b.build ?? h.b.club;
  return {
    headline: `${name}: ${body}`,
    against: `than ${theBuild(rival).replace(/^The /, 'the ')}`,
    certainty: h.overall.verdict === 'unclear' ? 'not-yet' : 'settled',
  };
}
