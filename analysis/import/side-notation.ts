/**
 * Left/right values: signed numbers (either sign may be right), "12.3 L", "R 4.5", "12.3L",
 * "4.2 left". Ovalyard's sign: + is right.
 */
import { ImportError } from './import-error';
import { compileNumberReader, newCellState, quickDecimalRange, type CellState, type DecimalMark, type NumberReader } from './number-format';
import type { SideNotation } from './recipe';

// Anchored, one way to match each character: linear in the cell (no backtracking between runs).
const PREFIX = /^(left|right|l|r)(?![a-z])\.?\s*([\s\S]*)$/i;
/** Side words, longest first, so "left" wins over "l". */
const SIDE_WORDS = ['right', 'left', 'r', 'l'] as const;

function isAsciiLetter(code: number): boolean {
  const c = code | 32;
  return c >= 97 && c <= 122;
}

/** A side word ending the trimmed cell (before an optional "."), not preceded by a letter. O(1). */
function suffixMark(t: string): { mark: 'L' | 'R'; rest: string } | null {
  const end = t.charCodeAt(t.length - 1) === 46 /* . */ ? t.length - 1 : t.length;
  const tail = t.slice(Math.max(0, end - 5), end).toLowerCase();
  for (const word of SIDE_WORDS) {
    if (!tail.endsWith(word)) continue;
    const start = end - word.length;
    if (start > 0 && isAsciiLetter(t.charCodeAt(start - 1))) continue;
    const rest = t.slice(0, start).trimEnd();
    return rest === '' ? null : { mark: word[0].toUpperCase() as 'L' | 'R', rest };
  }
  return null;
}

/** Where a left/right mark sits in a cell, if it has one. O(cell length). */
export function sideMark(cell: string): { mark: 'L' | 'R'; rest: string; position: 'prefix' | 'suffix' } | null {
  const t = cell.trim();
  const suffix = suffixMark(t);
  if (suffix) return { ...suffix, position: 'suffix' };
  const m = PREFIX.exec(t);
  if (m && m[2] !== '') return { mark: m[1][0].toUpperCase() as 'L' | 'R', rest: m[2], position: 'prefix' };
  return null;
}

/** The common case without regular expressions: a number, optional spaces, then L or R. */
function quickSuffixMark(cell: string): { mark: 'L' | 'R'; rest: string } | null {
  let end = cell.length - 1;
  const c = cell.charCodeAt(end) | 32;
  if (c !== 108 && c !== 114) return null;
  while (end > 0 && cell.charCodeAt(end - 1) === 32) end--;
  const before = cell.charCodeAt(end - 1);
  if (!(before >= 48 && before <= 57) && before !== 46 && before !== 44) return null;
  return { mark: c === 108 ? 'L' : 'R', rest: cell.slice(0, end) };
}

/**
 * Compile a reader for a left/right column: the number in the column's unit with + = right, or
 * NaN (state.error null: missing; set: unreadable). An explicit L/R mark always wins over the
 * notation; a mark together with a minus sign is refused as contradictory. In the L/R notations
 * a bare number is refused unless it is zero. O(1); the reader is O(cell length).
 */
export function compileSideReader(notation: SideNotation, readNumber: NumberReader, decimal: DecimalMark | null = null): NumberReader {
  const lettered = notation === 'suffix-LR' || notation === 'prefix-LR';
  const decimalCode = decimal === null ? -1 : decimal.charCodeAt(0);
  const sign = notation === 'signed-left-positive' ? -1 : 1;
  const withMark = (cell: string, state: CellState): number => {
    const side = quickSuffixMark(cell) ?? sideMark(cell);
    if (!side) return NaN;
    const v = readNumber(side.rest, state);
    if (v !== v) {
      if (state.error === null) state.error = `"${cell.trim()}" has a side but no number`;
      return NaN;
    }
    if (v < 0 || /^\s*-/.test(side.rest)) {
      state.error = `"${cell.trim()}" has both a minus sign and a side letter`;
      return NaN;
    }
    return side.mark === 'L' ? (v === 0 ? 0 : -v) : v;
  };
  if (lettered) {
    return (cell, state) => {
      // fast path: "12.3 L", "4.5R" read in place, no regular expression, no substring
      const end = cell.length - 1;
      const last = cell.charCodeAt(end) | 32;
      if (decimalCode > 0 && (last === 108 || last === 114)) {
        let stop = end;
        while (stop > 0 && cell.charCodeAt(stop - 1) === 32) stop--;
        const first = cell.charCodeAt(0);
        const quick = first === 45 || first === 43 ? NaN : quickDecimalRange(cell, 0, stop, decimalCode);
        if (quick === quick) {
          state.error = null;
          state.unit = null;
          return last === 108 && quick !== 0 ? -quick : quick;
        }
      }
      const v = withMark(cell, state);
      if (v === v || state.error !== null) return v;
      const plain = readNumber(cell, state);
      if (plain !== plain) {
        if (state.error !== null) state.error = `"${cell.trim()}" is not a number with L or R`;
        return NaN;
      }
      if (plain !== 0) {
        state.error = `"${cell.trim()}" has no L or R mark`;
        return NaN;
      }
      return 0;
    };
  }
  return (cell, state) => {
    const v = readNumber(cell, state);
    if (v === v) return v === 0 ? 0 : sign * v;
    if (state.error === null) return NaN;
    const error = state.error;
    const marked = withMark(cell, state);
    if (marked === marked) {
      state.error = null;
      return marked;
    }
    if (state.error === null) state.error = error;
    return NaN;
  };
}

/**
 * Read one left/right cell in its own unit, + = right. O(cell length).
 * @returns the value, or null for a blank or "-" cell
 * @throws ImportError BAD_CELL when the cell cannot be read
 * @example parseSide('12.3 L', 'suffix-LR', '.') // => -12.3
 * @example parseSide('4,5', 'signed-left-positive', ',') // => -4.5
 */
export function parseSide(cell: string, notation: SideNotation, decimal: DecimalMark): number | null {
  const state = newCellState();
  const v = compileSideReader(notation, compileNumberReader(decimal, null), decimal)(cell, state);
  if (v === v) return v;
  if (state.error !== null) throw new ImportError('BAD_CELL', state.error);
  return null;
}

/**
 * Guess the side notation of a column from sample cells: the L/R mark's usual position when
 * cells carry one, else signed (the sign convention cannot be told from the numbers). O(cells).
 */
export function detectSideNotation(cells: readonly string[]): { notation: SideNotation; lettered: number; signed: number } {
  let prefix = 0;
  let suffix = 0;
  let signed = 0;
  for (const cell of cells) {
    const side = sideMark(cell);
    if (side) {
      if (side.position === 'prefix') prefix++;
      else suffix++;
    } else if (/^\s*[+\-\u2212]\s*\d/.test(cell)) signed++;
  }
  if (prefix + suffix === 0) return { notation: 'signed-right-positive', lettered: 0, signed };
  return { notation: prefix > suffix ? 'prefix-LR' : 'suffix-LR', lettered: prefix + suffix, signed };
}
