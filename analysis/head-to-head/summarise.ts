import { FIELD_LABELS, type ShotField } from '@/analysis/fields';
import { displayUnits, fromCanonical, type UnitSystem } from '@/analysis/units';
import type { FieldComparison, HeadToHead, SpreadComparison } from './compare-builds';

/** Which build the fields that decide favour. */
export interface Overall {
  /** 'a' or 'b': better on at least one deciding field and worse on none; 'tradeOff': each better somewhere. */
  verdict: 'a' | 'b' | 'tradeOff' | 'equivalent' | 'unclear';
  /** The deciding fields each build is clearly better on, e.g. ['carry', 'offlineSpread']. */
  betterA: DecidingField[];
  betterB: DecidingField[];
  /** The sentence, e.g. "Overall: Birch is the better build: longer." */
  text: string;
}

/** The fields an overall verdict weighs: longer carry and total, more ball speed, tighter spreads. */
export type DecidingField = 'carry' | 'total' | 'ballSpeed' | 'offlineSpread' | 'carrySpread';

const DECIDING_WORDS: Readonly<Record<DecidingField, string>> = {
  carry: 'longer',
  total: 'longer in total',
  ballSpeed: 'more ball speed',
  offlineSpread: 'tighter left to right',
  carrySpread: 'tighter in carry',
};

type Parts = Pick<HeadToHead, 'a' | 'b' | 'fields' | 'spread'>;

const NUMBER_WORDS = ['no', 'one', 'two', 'three', 'four', 'five'];

/** A build's name in sentences: its label, else the club's code. */
export function buildName(ref: { club: string; build: string | null }): string {
  return ref.build ?? ref.club;
}

type DecidingRow = {
  field: DecidingField;
  /** After the correction: the build this field clearly favours, else 0. */
  favours: 1 | -1 | 0;
  /** Before it: the build a clear verdict of this field favours. */
  leans: 1 | -1 | 0;
  verdict: FieldComparison['verdict'];
  p: number;
  shotsNeeded: number | null;
};

/**
 * Which deciding fields favour A (+1), B (−1), neither clearly (0). A clear verdict counts for
 * the overall only when it survives Holm's step-down correction across the deciding fields
 * compared (family-wise 5%): with five chances, one "clear" difference between two equal builds
 * would otherwise turn up about one time in five. Holm, "A simple sequentially rejective
 * multiple test procedure", Scand. J. Statist. 6 (1979) 65–70.
 */
function deciding(h: Parts): DecidingRow[] {
  const out: DecidingRow[] = [];
  for (const field of ['carry', 'total', 'ballSpeed'] as const) {
    const c = h.fields[field];
    const side = c && c.verdict === 'clear' ? (c.diff > 0 ? 1 : -1) : 0;
    if (c) out.push({ field, favours: side, leans: side, verdict: c.verdict, p: c.p, shotsNeeded: c.shotsNeeded });
  }
  for (const [field, key] of [['offlineSpread', 'offline'], ['carrySpread', 'carry']] as const) {
    const s = h.spread.fields[key];
    // tighter is better: a smaller deviation for A favours A
    const side = s && s.verdict === 'clear' ? (s.diff < 0 ? 1 : -1) : 0;
    if (s) out.push({ field, favours: side, leans: side, verdict: s.verdict, p: s.p, shotsNeeded: s.shotsNeeded });
  }
  const order = [...out].sort((a, b) => a.p - b.p);
  let rejecting = true;
  order.forEach((row, k) => {
    rejecting = rejecting && row.p <= 0.05 / (order.length - k);
    if (!rejecting) row.favours = 0;
  });
  return out;
}

function listWords(words: string[]): string {
  if (words.length <= 1) return words.join('');
  return `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`;
}

/**
 * The overall verdict of a head-to-head, by a rule of ours on the fields a fitter decides a
 * build by: longer carry (and total), more ball speed, tighter left–right and carry spread.
 * A build is better when it is clearly better on at least one of them (clear, and still so
 * after Holm's correction across them) and clearly worse on none; a trade-off when each is
 * clearly better somewhere; equivalent when every one compared is equivalent; otherwise not yet
 * clear, with the shots that would settle it. O(1).
 * @example overallVerdict(h).text // => "Overall: Birch is the better build: longer and tighter left to right."
 */
export function overallVerdict(h: Parts): Overall {
  const rows = deciding(h);
  const betterA = rows.filter((r) => r.favours === 1).map((r) => r.field);
  const betterB = rows.filter((r) => r.favours === -1).map((r) => r.field);
  const nameA = buildName(h.a);
  const nameB = buildName(h.b);
  const words = (fields: DecidingField[]) => listWords(fields.map((f) => DECIDING_WORDS[f]));
  // Clear on their own but not after the correction: said as "perhaps".
  const perhaps = (side: 1 | -1) => {
    const fields = rows.filter((r) => r.leans === side && r.favours === 0).map((r) => r.field);
    return fields.length ? ` (perhaps also ${words(fields)})` : '';
  };
  if (betterA.length > 0 && betterB.length === 0) {
    return { verdict: 'a', betterA, betterB, text: `Overall: ${nameA} is the better build: ${words(betterA)}${perhaps(1)}.` };
  }
  if (betterB.length > 0 && betterA.length === 0) {
    return { verdict: 'b', betterA, betterB, text: `Overall: ${nameB} is the better build: ${words(betterB)}${perhaps(-1)}.` };
  }
  if (betterA.length > 0) {
    return { verdict: 'tradeOff', betterA, betterB, text: `Overall: a trade-off: ${nameA} is ${words(betterA)}; ${nameB} is ${words(betterB)}.` };
  }
  const leaning = rows.filter((r) => r.leans !== 0);
  if (leaning.length > 0) {
    const side = (r: DecidingRow) => `${r.leans === 1 ? nameA : nameB} looks ${DECIDING_WORDS[r.field]}`;
    return {
      verdict: 'unclear',
      betterA,
      betterB,
      text: `Overall: not yet clear: ${listWords(leaning.map(side))}, but with ${NUMBER_WORDS[rows.length] ?? rows.length} things weighed that could still be chance; a few more shots per build will tell.`,
    };
  }
  if (rows.length > 0 && rows.every((r) => r.verdict === 'equivalent')) {
    return { verdict: 'equivalent', betterA, betterB, text: `Overall: no difference that matters between ${nameA} and ${nameB}.` };
  }
  const needed = rows.map((r) => r.shotsNeeded).filter((n): n is number => n !== null);
  const more = needed.length ? Math.max(...needed) : null;
  const tail = more === null ? '' : more > 100 ? ': more than 100 more shots per build would settle it' : `: about ${more} more shots per build would settle it`;
  return { verdict: 'unclear', betterA, betterB, text: `Overall: not yet clear${tail}.` };
}

/** Decimals of an amount in its display unit. */
function decimals(field: ShotField, unit: string): number {
  if (field === 'smashFactor') return 3;
  if (unit === 'rpm' || unit === 'ft') return 0;
  return 1;
}

/**
 * A canonical amount (a difference, a spread) in the user's units with its unit: "6 yd",
 * "1.5 mph", "1.2°", "250 rpm", "0.020". O(1).
 * @example formatAmount('carry', 5.4864, 'imperial') // => '6.0 yd'
 */
export function formatAmount(field: ShotField, value: number, units: UnitSystem): string {
  const unit = displayUnits(units)[field];
  const shown = field === 'smashFactor' ? value : fromCanonical(value, unit, field);
  const text = Math.abs(shown).toFixed(decimals(field, unit));
  if (unit === 'ratio') return text;
  if (unit === 'deg') return `${text}°`;
  return `${text} ${unit}`;
}

/** A clear difference of means as a clause with the build as subject (the subject given separately). */
function meanClause(field: ShotField, c: FieldComparison, units: UnitSystem): string {
  const x = formatAmount(field, c.diff, units);
  const up = c.diff > 0;
  switch (field) {
    case 'carry':
      return `carries ${x} ${up ? 'farther' : 'shorter'}`;
    case 'total':
      return `goes ${x} ${up ? 'farther' : 'shorter'} in total`;
    case 'ballSpeed':
      return `has ${x} ${up ? 'more' : 'less'} ball speed`;
    case 'clubSpeed':
      return `has ${x} ${up ? 'more' : 'less'} club speed`;
    case 'offline':
      return `finishes ${x} further ${up ? 'right' : 'left'}`;
    case 'launchAngle':
      return `launches ${x} ${up ? 'higher' : 'lower'}`;
    case 'spinRate':
      return `spins ${x} ${up ? 'more' : 'less'}`;
    case 'smashFactor':
      return `has a smash factor ${x} ${up ? 'higher' : 'lower'}`;
    case 'spinAxis':
      return `tilts its spin axis ${x} further ${up ? 'right' : 'left'}`;
    default:
      return `has ${FIELD_LABELS[field].toLowerCase()} ${x} ${up ? 'higher' : 'lower'}`;
  }
}

/** The fields the sentence speaks of, in order. */
const SUMMARY_FIELDS: readonly ShotField[] = ['carry', 'total', 'ballSpeed', 'offline', 'launchAngle', 'spinRate', 'smashFactor', 'spinAxis', 'clubSpeed'];
/** 1.96: the normal quantile that holds 95% of shots within ±1.96 sd (a spread as a fitter reads it). */
const Z95 = 1.959964;

function spreadClause(field: 'offline' | 'carry', s: SpreadComparison, units: UnitSystem): string {
  const what = field === 'offline' ? 'left–right spread' : 'carry spread';
  const a = formatAmount(field, Z95 * s.sdA, units);
  const b = formatAmount(field, Z95 * s.sdB, units);
  const unit = a.slice(a.indexOf(' ') + 1);
  return `${what} ±${a.slice(0, a.indexOf(' '))} vs ±${b.slice(0, b.indexOf(' '))} ${unit}, ${s.diff > 0 ? 'wider' : 'tighter'} (clear)`;
}

/**
 * A head-to-head in one sentence in the user's units, build A as the subject: each clear
 * difference of means, each clear difference of spread (95% of shots within ±1.96 sd), then
 * what is left: "Birch carries 6 yd farther (clear); left–right spread ±38.0 vs ±25.0 yd, wider
 * (clear); the rest is equivalent or not yet clear." Then the overall verdict. O(fields).
 * @example summariseHeadToHead(h, 'imperial') // => "Birch carries 6 yd farther (clear); … Overall: …"
 */
export function summariseHeadToHead(h: Parts & { overall: Overall }, units: UnitSystem): string {
  const nameA = buildName(h.a);
  const means: string[] = [];
  let compared = 0;
  for (const field of SUMMARY_FIELDS) {
    const c = h.fields[field];
    if (!c) continue;
    compared++;
    if (c.verdict === 'clear') means.push(`${meanClause(field, c, units)} (clear)`);
  }
  const spreads: string[] = [];
  for (const field of ['offline', 'carry'] as const) {
    const s = h.spread.fields[field];
    if (!s) continue;
    compared++;
    if (s.verdict === 'clear') spreads.push(spreadClause(field, s, units));
  }
  const parts: string[] = [];
  if (means.length) parts.push(`${nameA} ${listWords(means)}`);
  if (spreads.length) parts.push(`${means.length ? '' : `${nameA}: `}${spreads.join('; ')}`);
  const clear = means.length + spreads.length;
  let sentence: string;
  if (compared === 0) sentence = `Nothing to compare between ${nameA} and ${buildName(h.b)} yet.`;
  else if (clear === 0) sentence = `No clear difference between ${nameA} and ${buildName(h.b)}: everything compared is equivalent or not yet clear.`;
  else sentence = `${parts.join('; ')}${clear < compared ? '; the rest is equivalent or not yet clear' : ''}.`;
  return `${sentence} ${h.overall.text}`;
}
