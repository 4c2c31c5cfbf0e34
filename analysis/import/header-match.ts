/**
 * Reading a column header: its name, the unit it states ("Carry (m)", "Ball Speed [km/h]",
 * "Carry yds"), a side hint ("Offline (L-/R+)", "Side (left +)"), and which targets its name
 * matches, each with a confidence and plain-words reason.
 */
import { findUnit, type UnitInfo } from '@/analysis/units';
import { HEADER_WORDS, type HeaderWord } from './header-words';
import { targetWords } from './shot-limits';
import type { ColumnTarget, SideNotation } from './recipe';

export interface ParsedHeader {
  /** Normalised name: lower case words, no unit, no punctuation. */
  name: string;
  /** The unit the header states, if it names a known one. */
  unit: UnitInfo | null;
  /** Text that looks like a unit but is not one Ovalyard knows ("furlongs"). */
  unknownUnit: string | null;
  /** A sign convention the header states, or a hint that cells carry L/R marks. */
  side: SideNotation | 'lettered' | null;
}

// A bracketed group holds no other bracket, so each scan stops at the next one: linear in the header.
const GROUP = /[([{]([^()[\]{}]*)[)\]}]/g;
// "R+", "+R", "+ = right", "right is +", "right positive", "L-" (not "L-R"), "-L", "- = left"
const RIGHT_POSITIVE = /(\br\s*\+|\+\s*(?:=\s*)?r(ight)?\b|\bright\s*(is\s*)?(\+|positive)|\bl\s*-(?!\s*\/?\s*r\b)|(?<![a-z]\s?)-l(eft)?\b|-\s*=\s*l(eft)?\b|\bleft\s*(is\s*)?(-|negative))/i;
const LEFT_POSITIVE = /(\bl\s*\+|\+\s*(?:=\s*)?l(eft)?\b|\bleft\s*(is\s*)?(\+|positive)|\br\s*-(?!\s*\/?\s*l\b)|(?<![a-z]\s?)-r(ight)?\b|-\s*=\s*r(ight)?\b|\bright\s*(is\s*)?(-|negative))/i;
const LETTERED = /^(l\s*\/\s*r|r\s*\/\s*l|lr|left\s*\/\s*right|right\s*\/\s*left|l or r|left or right)$/i;

function sideHint(text: string): SideNotation | 'lettered' | null {
  const right = RIGHT_POSITIVE.test(text);
  const left = LEFT_POSITIVE.test(text);
  if (right && !left) return 'signed-right-positive';
  if (left && !right) return 'signed-left-positive';
  if (LETTERED.test(text.trim())) return 'lettered';
  return null;
}

/** Normalise free text for matching: lower case, letters and digits in single-spaced words. */
export function normaliseWords(text: string): string {
  return text
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, ' ')
    .trim();
}

/**
 * Parse a header into name, stated unit and side hint. O(header length).
 * @example parseHeader('Ball Speed [km/h]') // => { name: 'ball speed', unit: km/h, unknownUnit: null, side: null }
 * @example parseHeader('Offline (m, L-/R+)').side // => 'signed-right-positive'
 */
export function parseHeader(header: string): ParsedHeader {
  let unit: UnitInfo | null = null;
  let unknownUnit: string | null = null;
  let side: SideNotation | 'lettered' | null = null;
  const groups: string[] = [];
  let rest = header.replace(GROUP, (_, inner: string) => {
    groups.push(inner);
    return ' ';
  });
  for (const group of groups) {
    for (const part of group.split(/[,;]/).map((p) => p.trim()).filter((p) => p !== '')) {
      const found = findUnit(part);
      if (found) {
        unit ??= found;
        continue;
      }
      // "deg L+/R-", "yds +R": a unit and a side hint in one part
      const words = part.split(/\s+/);
      const head = findUnit(words[0]);
      const tailHint = words.length > 1 ? sideHint(words.slice(1).join(' ')) : null;
      if (head && tailHint) {
        unit ??= head;
        side ??= tailHint;
        continue;
      }
      const hint = sideHint(part);
      if (hint) {
        side ??= hint;
        continue;
      }
      if (/^[a-z°º/.'"^0-9-]{1,12}$/i.test(part) && !/^\d+$/.test(part)) unknownUnit ??= part;
    }
  }
  if (!unit) {
    // a unit written after the name: "Carry yds", "Ball Speed mph", "Speed - km/h"
    const m = /^(.*\S)\s+(?:[-–]\s*)?(\S+)$/.exec(rest.trim());
    if (m) {
      const found = findUnit(m[2]);
      if (found && normaliseWords(m[1]) !== '') {
        unit = found;
        rest = m[1];
      }
    }
  }
  if (!side) side = sideHint(rest.replace(/[a-z]{3,}/gi, (w) => (/^(left|right)$/i.test(w) ? w : ' ')));
  if (unit) unknownUnit = null;
  return { name: normaliseWords(rest), unit, unknownUnit, side };
}

/** A candidate target for a header, before the data is looked at. */
export interface HeaderCandidate {
  target: ColumnTarget;
  confidence: number;
  reason: string;
  note?: string;
}

function levenshtein(a: string, b: string): number {
  if (Math.abs(a.length - b.length) > 2) return 3;
  const row = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    let prev = row[0];
    row[0] = i;
    for (let j = 1; j <= b.length; j++) {
      const tmp = row[j];
      row[j] = Math.min(row[j] + 1, row[j - 1] + 1, prev + (a[i - 1] === b[j - 1] ? 0 : 1));
      prev = tmp;
    }
  }
  return row[b.length];
}

function withNote(c: HeaderCandidate, word: HeaderWord): HeaderCandidate {
  return word.note ? { ...c, note: word.note } : c;
}

/**
 * The targets a header name matches, best first: exact phrases, then phrases contained as whole
 * words (longest first), then near spellings (one or two letters off). O(words × name length).
 * @example matchHeaderName('ball speed')[0] // => { target: 'ballSpeed', confidence: 0.95, reason: 'header "ball speed" is a name for ball speed' }
 */
export function matchHeaderName(name: string): HeaderCandidate[] {
  if (name === '') return [];
  const out: HeaderCandidate[] = [];
  const padded = ` ${name} `;
  for (const word of HEADER_WORDS) {
    if (word.phrase === name) {
      out.push(withNote({ target: word.target, confidence: word.confidence, reason: `header "${name}" is a name for ${targetWords(word.target)}` }, word));
    } else if (padded.includes(` ${word.phrase} `)) {
      // longer contained phrases are likelier to be what the header means
      const share = word.phrase.length / name.length;
      out.push(withNote({
        target: word.target,
        confidence: word.confidence * (0.6 + 0.25 * share),
        reason: `header "${name}" contains "${word.phrase}"`,
      }, word));
    } else if (word.phrase.length >= 5) {
      const distance = levenshtein(word.phrase, name);
      if (distance === 1 || (distance === 2 && word.phrase.length >= 9)) {
        out.push(withNote({
          target: word.target,
          confidence: word.confidence * (distance === 1 ? 0.7 : 0.6),
          reason: `header "${name}" is spelt close to "${word.phrase}"`,
        }, word));
      }
    }
  }
  out.sort((a, b) => b.confidence - a.confidence);
  const seen = new Set<ColumnTarget>();
  return out.filter((c) => (seen.has(c.target) ? false : (seen.add(c.target), true)));
}
