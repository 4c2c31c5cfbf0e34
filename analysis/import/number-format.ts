/**
 * Reading numbers as bay files write them: decimal point or comma, an optional thousands
 * separator, blank or "-" for a missing value, a unit written in the cell ("152.3 m").
 * The readers are compiled once per file and called once per cell, so the common case (a plain
 * number) takes one `Number()` call and no regular expression.
 */
import { findUnit, type UnitInfo } from '@/analysis/units';

export type DecimalMark = '.' | ',';

/**
 * The longest cell the careful readers look at (characters, after trimming): far more than any
 * number with a unit ("-1.234.567,89 km/h") needs; a longer cell is not a number.
 */
export const MAX_NUMBER_CELL = 64;

/** Cells that mean "no value" (compared trimmed and lower-cased). */
const MISSING = new Set(['', '-', '--', '---', '—', '–', 'n/a', 'na', '#n/a', 'null', 'none', 'nan', '?']);

/** Per-import scratch state: why the last cell failed, and a unit the cell itself named. */
export interface CellState {
  error: string | null;
  /** A unit written inside the cell ("152.3 m"), when there was one. */
  unit: UnitInfo | null;
}

export function newCellState(): CellState {
  return { error: null, unit: null };
}

/** A compiled cell reader: the number, or NaN with `state.error` null (missing) or set (unreadable). */
export type NumberReader = (cell: string, state: CellState) => number;

/** Whether a trimmed cell means "no value". */
export function isMissingCell(cell: string): boolean {
  return MISSING.has(cell.trim().toLowerCase());
}

/** Whether a cell looks like a spreadsheet formula (never evaluated). */
export function isFormulaLike(cell: string): boolean {
  const t = cell.trimStart();
  const c = t.charCodeAt(0);
  if (c === 61 /* = */ || c === 64 /* @ */) return true;
  if ((c === 43 /* + */ || c === 45 /* - */) && t.length > 1) {
    const d = t.charCodeAt(1);
    return (d >= 65 && d <= 90) || (d >= 97 && d <= 122) || d === 40 /* ( */ || d === 61;
  }
  return false;
}

// Every pattern below is anchored and unambiguous (no two quantifiers compete for one run of
// characters), so its cost is linear in the cell; cells are also cut off at MAX_NUMBER_CELL.
const PLAIN_NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;
const NUMBER_THEN_SUFFIX = /^([+-]?[\d.,' ]*\d\.?)\s*([^\d\s.,][^\d]*)$/;

/**
 * Read one cell the careful way (the slow path): trims, knows missing markers, refuses formulas,
 * accepts a unicode minus, space or apostrophe thousands groups, the file's thousands separator
 * (checked in groups of three) and a unit after the number. O(cell length).
 * @returns the number in the column's unit (or in `state.unit` when the cell names one), or NaN:
 *   missing when `state.error` is null, unreadable when it is set
 */
export function readNumberSlow(cell: string, decimal: DecimalMark, thousands: string | null, state: CellState): number {
  state.error = null;
  state.unit = null;
  let t = cell.trim();
  if (t.length > MAX_NUMBER_CELL) {
    state.error = `"${clip(t)}" is too long to be a number (more than ${MAX_NUMBER_CELL} characters)`;
    return NaN;
  }
  if (MISSING.has(t.toLowerCase())) return NaN;
  if (isFormulaLike(t)) {
    state.error = `formula-looking cell "${clip(cell)}" (not evaluated)`;
    return NaN;
  }
  t = t.replace(/\u2212/g, '-').replace(/[\u00a0\u202f\u2009]/g, ' ');
  const suffix = NUMBER_THEN_SUFFIX.exec(t);
  if (suffix) {
    const unit = findUnit(suffix[2]);
    if (!unit) {
      state.error = `"${clip(cell)}" is not a number`;
      return NaN;
    }
    state.unit = unit;
    t = suffix[1].trim();
  }
  const sign = t[0] === '-' || t[0] === '+' ? t[0] : '';
  let body = sign ? t.slice(1).trim() : t;
  const other = decimal === '.' ? ',' : '.';
  if (/^\d{1,3}([ ']\d{3})+([.,]\d+)?$/.test(body)) body = body.replace(/[ ']/g, '');
  if (thousands !== null && body.indexOf(thousands) >= 0) {
    const grouped = new RegExp(`^\\d{1,3}(${escape(thousands)}\\d{3})+(${escape(decimal)}\\d+)?$`);
    if (!grouped.test(body)) {
      state.error = `"${clip(cell)}" is not a number in this file's format (thousands "${thousands}", decimal "${decimal}")`;
      return NaN;
    }
    body = body.split(thousands).join('');
  }
  if (body.indexOf(other) >= 0) {
    state.error = `"${clip(cell)}" uses "${other}" but this file's decimal mark is "${decimal}"`;
    return NaN;
  }
  if (decimal === ',') body = body.replace(',', '.');
  if (!PLAIN_NUMBER.test(body)) {
    state.error = `"${clip(cell)}" is not a number`;
    return NaN;
  }
  const value = Number(sign + body);
  if (!Number.isFinite(value)) {
    state.error = `"${clip(cell)}" is not a finite number`;
    return NaN;
  }
  return value;
}

/** Exact powers of ten up to 10^15 (all exactly representable as doubles). */
const POW10 = [1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15];

/**
 * Fast exact reading of a plain decimal ("-12.34", "150,2" with a decimal comma): digits with at
 * most one decimal mark and a leading sign, nothing else. With at most 15 digits the integer
 * mantissa m is exact and m / 10^k is one correctly rounded division (k ≤ 22), so the result is
 * the same double as Number() gives (W. D. Clinger, "How to read floating point numbers
 * accurately", PLDI 1990, the fast path). NaN when the cell needs the slow path. O(cell length).
 */
export function quickDecimal(cell: string, decimalCode: number): number {
  return quickDecimalRange(cell, 0, cell.length, decimalCode);
}

/** quickDecimal of cell[start, end), without making the substring. O(end − start). */
export function quickDecimalRange(cell: string, start: number, end: number, decimalCode: number): number {
  const n = end;
  let i = start;
  let c = cell.charCodeAt(start);
  const negative = c === 45;
  if (negative || c === 43) i++;
  let mantissa = 0;
  let digits = 0;
  let fraction = -1;
  for (; i < n; i++) {
    c = cell.charCodeAt(i);
    if (c >= 48 && c <= 57) {
      mantissa = mantissa * 10 + (c - 48);
      digits++;
      if (fraction >= 0) fraction++;
    } else if (c === decimalCode && fraction < 0) fraction = 0;
    else return NaN;
  }
  if (digits === 0 || digits > 15) return NaN;
  const value = fraction > 0 ? mantissa / POW10[fraction] : mantissa;
  return negative ? (value === 0 ? 0 : -value) : value;
}

/**
 * Compile the number reader for a file's decimal mark and thousands separator. O(1); the reader
 * is O(cell length): a plain number takes the exact fast path, anything else the slow one.
 * @example compileNumberReader(',', '.')('6.512,5', newCellState()) // => 6512.5
 */
export function compileNumberReader(decimal: DecimalMark, thousands: string | null): NumberReader {
  const decimalCode = decimal.charCodeAt(0);
  return (cell, state) => {
    const v = quickDecimal(cell, decimalCode);
    if (v === v) {
      state.error = null;
      state.unit = null;
      return v;
    }
    return readNumberSlow(cell, decimal, thousands, state);
  };
}

/** What the sniffer concluded about a file's numbers. */
export interface NumberFormat {
  decimal: DecimalMark;
  thousands: string | null;
  /** Plain words when the evidence was thin or mixed. */
  doubt: string | null;
}

const NUMERIC_SHAPE = /^[+-]?[\d.,]*\d$/;
/** On a trimmed cell: an optional side word, a number, an optional degree sign, unit or side word. */
const SIDE_OR_UNIT = /^(?:(?:l|r|left|right)\s*)?([+\-\u2212]?[\d.,]*\d)(?:\s*(?:°|º|[a-z/]{1,5}|left|right))?$/i;

function sideOrUnit(cell: string): RegExpExecArray | null {
  const t = cell.trim();
  return t.length > MAX_NUMBER_CELL ? null : SIDE_OR_UNIT.exec(t);
}

/**
 * Decide the decimal mark and thousands separator from sample cells. A cell with both marks
 * settles it (the last is the decimal); a mark followed by other than three digits is a decimal;
 * repeated marks are thousands. O(cells).
 * @example detectNumberFormat(['50,1', '6.512', '150,2'], ';') // => { decimal: ',', thousands: '.', doubt: null }
 */
export function detectNumberFormat(cells: readonly string[], delimiter: string): NumberFormat {
  const decimalVotes = { '.': 0, ',': 0 };
  const thousandsVotes = { '.': 0, ',': 0 };
  const threeDigits = { '.': 0, ',': 0 };
  for (const raw of cells) {
    const m = sideOrUnit(raw);
    if (!m) continue;
    const t = m[1].replace(/^[+\-\u2212]/, '');
    if (!NUMERIC_SHAPE.test(t)) continue;
    const dot = t.lastIndexOf('.');
    const comma = t.lastIndexOf(',');
    if (dot >= 0 && comma >= 0) {
      const last = dot > comma ? '.' : ',';
      decimalVotes[last]++;
      thousandsVotes[last === '.' ? ',' : '.']++;
      continue;
    }
    const mark = dot >= 0 ? '.' : comma >= 0 ? ',' : null;
    if (mark === null) continue;
    const groups = t.split(mark);
    if (groups.length > 2) thousandsVotes[mark]++;
    else if (groups[1].length !== 3 || groups[0].length > 3 || groups[0] === '0' || groups[0] === '') decimalVotes[mark]++;
    else threeDigits[mark]++;
  }
  let decimal: DecimalMark;
  let doubt: string | null = null;
  if (decimalVotes[','] > decimalVotes['.']) decimal = ',';
  else if (decimalVotes['.'] > decimalVotes[',']) decimal = '.';
  else if (thousandsVotes['.'] > thousandsVotes[',']) decimal = ',';
  else if (thousandsVotes[','] > thousandsVotes['.']) decimal = '.';
  else {
    decimal = delimiter === ';' ? ',' : '.';
    if (threeDigits['.'] + threeDigits[','] > 0) {
      doubt = `every number with a mark has three digits after it; read "${decimal}" as the decimal mark`;
    }
  }
  if (decimalVotes['.'] > 0 && decimalVotes[','] > 0) {
    doubt = `numbers use both "." and "," as decimal marks; read "${decimal}"`;
  }
  const other = decimal === '.' ? ',' : '.';
  const thousands = thousandsVotes[other] + threeDigits[other] > 0 && decimalVotes[other] === 0 ? other : null;
  return { decimal, thousands, doubt };
}

/**
 * Whether a cell looks like a number, possibly with a side letter or a unit ("12.3 L", "98 mph",
 * "56°"). Used to tell header lines from data lines. O(cell length).
 */
export function looksNumeric(cell: string): boolean {
  return sideOrUnit(cell) !== null;
}

function clip(s: string): string {
  return s.length > 40 ? `${s.slice(0, 37)}...` : s;
}

function escape(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
