/**
 * Sniffing a bay file: delimiter, decimal mark and thousands separator, the header row after any
 * preamble lines, a units row right under the header. Reads only the head of the file.
 */
import { ImportError } from './import-error';
import { cutName, MAX_COLUMNS, MAX_HEADER_CHARS } from './import-limits';
import { matchHeaderName, parseHeader } from './header-match';
import { detectNumberFormat, looksNumeric, type DecimalMark } from './number-format';
import { isBlankRow, isSummaryRow, isUnitsRow, unitCellText } from './row-kinds';
import { assertText, detectNewline, filledWidth, headLines, splitLine, stripBom } from './text-lines';

export type Delimiter = ',' | ';' | '\t';

export interface SniffResult {
  delimiter: Delimiter;
  decimal: DecimalMark;
  thousands: string | null;
  /** 0-based line index of the header row. */
  headerRow: number;
  /** Whether a units row sits right under the header. */
  unitsRow: boolean;
  /** Column headers, duplicates disambiguated ("Carry", "Carry (2)"), blanks named "Column N". */
  headers: string[];
  /** 0-based line index of the first line after the header (and units row). */
  dataStartLine: number;
  /** Headers exactly as written (trimmed). */
  rawHeaders: string[];
  /** The units row's cell per column (brackets removed), or null where blank or absent. */
  units: (string | null)[];
  /** Lines before the header, as written. */
  preamble: string[];
  newline: '\r\n' | '\n' | '\r';
  /** Plain words on decisions the evidence did not settle. */
  doubts: string[];
  /** Headers that were written more than once (before disambiguation). */
  duplicates: string[];
}

/** Choices a recipe fixes, so the sniffer need not guess them. */
export interface SniffHints {
  delimiter?: Delimiter;
  decimal?: DecimalMark;
  headerRow?: number;
}

/** The sniff result plus what the later steps reuse: head lines split into cells. */
export interface SniffDetail {
  result: SniffResult;
  /** Character offset of the header line in the (BOM-stripped) text. */
  headerOffset: number;
  /** Character offset of line dataStartLine (the text's length when the file ends before it). */
  dataOffset: number;
  /** Head lines from dataStartLine on, split into cells, with their 0-based line index. */
  headRows: { line: number; cells: string[] }[];
  /** Whether headRows reach the end of the file. */
  complete: boolean;
}

const DELIMITERS: readonly Delimiter[] = [';', '\t', ','];
const DATA_LOOKAHEAD = 40;

function numericShare(cells: readonly string[]): { filled: number; numeric: number } {
  let filled = 0;
  let numeric = 0;
  for (const cell of cells) {
    if (cell.trim() === '' || cell.trim() === '-') continue;
    filled++;
    if (looksNumeric(cell)) numeric++;
  }
  return { filled, numeric };
}

function isHeaderLike(cells: readonly string[]): boolean {
  const width = filledWidth(cells);
  if (width < 2) return false;
  const { filled, numeric } = numericShare(cells.slice(0, width));
  return filled >= 2 && filled >= width * 0.5 && numeric <= filled * 0.25;
}

/** A data line: about as wide as the header, with more number cells than the header has. */
function isDataLike(cells: readonly string[], width: number, headerNumeric: number): boolean {
  const w = filledWidth(cells);
  if (w < Math.max(2, Math.ceil(width * 0.5)) || w > width + 2) return false;
  const { filled, numeric } = numericShare(cells);
  return numeric >= 1 && numeric > headerNumeric && numeric >= filled * 0.2;
}

function tooManyColumns(width: number): ImportError {
  return new ImportError(
    'TOO_MANY_COLUMNS',
    `This file has ${width.toLocaleString('en')} columns; one import reads at most ${MAX_COLUMNS.toLocaleString('en')}. Export fewer columns and try again.`,
  );
}

interface Candidate {
  delimiter: Delimiter;
  headerIndex: number;
  unitsRow: boolean;
  score: number;
}

function findHeader(rows: string[][], delimiter: Delimiter, fixedHeader: number | undefined): Candidate | null {
  let best: Candidate | null = null;
  const first = fixedHeader ?? 0;
  const last = fixedHeader ?? rows.length - 1;
  for (let i = first; i <= last && i < rows.length; i++) {
    const cells = rows[i];
    if (fixedHeader === undefined && !isHeaderLike(cells)) continue;
    const width = filledWidth(cells);
    if (width < 1) continue;
    if (width > MAX_COLUMNS) throw tooManyColumns(width);
    const headerNumeric = numericShare(cells).numeric;
    const unitsRow = i + 1 < rows.length && isUnitsRow(rows[i + 1]);
    let data = 0;
    for (let j = i + (unitsRow ? 2 : 1), seen = 0; j < rows.length && seen < DATA_LOOKAHEAD; j++) {
      if (isBlankRow(rows[j])) continue;
      seen++;
      if (isDataLike(rows[j], width, headerNumeric)) data++;
    }
    if (data === 0 && fixedHeader === undefined) continue;
    const words = cells.filter((c) => matchHeaderName(parseHeader(c).name).some((m) => m.confidence >= 0.5)).length;
    const score = width * 10 + words * 8 + Math.min(data, DATA_LOOKAHEAD);
    if (!best || score > best.score) best = { delimiter, headerIndex: i, unitsRow, score };
  }
  return best;
}

/** Name headers uniquely: blanks become "Column N", repeats "Carry (2)", "Carry (3)". */
export function disambiguateHeaders(raw: readonly string[]): { headers: string[]; duplicates: string[] } {
  const used = new Set<string>();
  const duplicates = new Set<string>();
  const headers = raw.map((h, i) => {
    let name = h.trim() === '' ? `Column ${i + 1}` : h.trim();
    if (used.has(name)) {
      duplicates.add(name);
      let k = 2;
      while (used.has(`${name} (${k})`)) k++;
      name = `${name} (${k})`;
    }
    used.add(name);
    return name;
  });
  return { headers, duplicates: [...duplicates] };
}

/**
 * Sniff a bay file in full detail (used by suggestMapping and importBayFile). O(head of file).
 * @throws ImportError EMPTY_FILE, NOT_TEXT, NO_HEADER, NO_DATA_ROWS, TOO_MANY_COLUMNS (over MAX_COLUMNS)
 */
export function sniffDetail(input: string, hints: SniffHints = {}): SniffDetail {
  const text = stripBom(input);
  assertText(text);
  const { lines, offsets, complete } = headLines(text);
  const delimiters = hints.delimiter ? [hints.delimiter] : DELIMITERS;
  if (hints.headerRow !== undefined && (hints.headerRow >= lines.length || lines[hints.headerRow].trim() === '')) {
    throw new ImportError('NO_HEADER', `Line ${hints.headerRow + 1} is not a header row (it is blank or past the end).`);
  }
  let best: { candidate: Candidate; rows: string[][] } | null = null;
  for (const delimiter of delimiters) {
    const rows = lines.map((line) => splitLine(line, delimiter));
    const candidate = findHeader(rows, delimiter, hints.headerRow);
    if (candidate && (!best || candidate.score > best.candidate.score)) best = { candidate, rows };
  }
  if (!best) {
    const headerOnly = delimiters.some((d) => {
      const rows = lines.map((line) => splitLine(line, d));
      const i = rows.findIndex((r) => isHeaderLike(r));
      return i >= 0 && rows.slice(i + 1).every((r) => isBlankRow(r) || isUnitsRow(r) || isSummaryRow(r));
    });
    if (headerOnly) throw new ImportError('NO_DATA_ROWS', 'The file has a header but no shot rows.');
    throw new ImportError('NO_HEADER', 'No header row was found: expected a line of column names followed by rows of numbers.');
  }
  const { candidate, rows } = best;
  const headerCells = rows[candidate.headerIndex];
  const dataStartLine = candidate.headerIndex + (candidate.unitsRow ? 2 : 1);
  const headRows: { line: number; cells: string[] }[] = [];
  const widths = new Map<number, number>();
  const sampleCells: string[] = [];
  for (let i = dataStartLine; i < rows.length; i++) {
    headRows.push({ line: i, cells: rows[i] });
    if (isBlankRow(rows[i]) || isSummaryRow(rows[i])) continue;
    const w = filledWidth(rows[i]);
    widths.set(w, (widths.get(w) ?? 0) + 1);
    // one cell at a time: spreading a row into push() overflows the stack on a very wide row
    for (let c = 0; c < rows[i].length && sampleCells.length < 8000; c++) sampleCells.push(rows[i][c]);
  }
  if (headRows.every((r) => isBlankRow(r.cells) || isSummaryRow(r.cells)) && complete) {
    throw new ImportError('NO_DATA_ROWS', 'The file has a header but no shot rows.');
  }
  const modalWidth = [...widths.entries()].sort((a, b) => b[1] - a[1] || b[0] - a[0])[0]?.[0] ?? 0;
  const width = Math.max(filledWidth(headerCells), modalWidth);
  if (width > MAX_COLUMNS) throw tooManyColumns(width);
  const rawHeaders = Array.from({ length: width }, (_, i) => cutName(headerCells[i] ?? '', MAX_HEADER_CHARS));
  const { headers, duplicates } = disambiguateHeaders(rawHeaders);
  const unitCells = candidate.unitsRow ? rows[candidate.headerIndex + 1] : [];
  const units = headers.map((_, i) => {
    const t = unitCellText(unitCells[i] ?? '');
    return t === '' ? null : t;
  });
  const format = detectNumberFormat(sampleCells, candidate.delimiter);
  const doubts: string[] = [];
  let decimal = format.decimal;
  let thousands = format.thousands;
  if (hints.decimal && hints.decimal !== decimal) {
    decimal = hints.decimal;
    thousands = null;
  } else if (format.doubt) doubts.push(format.doubt);
  const result: SniffResult = {
    delimiter: candidate.delimiter,
    decimal,
    thousands,
    headerRow: candidate.headerIndex,
    unitsRow: candidate.unitsRow,
    headers,
    dataStartLine,
    rawHeaders,
    units,
    preamble: lines.slice(0, candidate.headerIndex),
    newline: detectNewline(text),
    doubts,
    duplicates,
  };
  const dataOffset = dataStartLine < offsets.length ? offsets[dataStartLine] : text.length;
  return { result, headerOffset: offsets[candidate.headerIndex], dataOffset, headRows, complete };
}

/**
 * Sniff a bay file: delimiter (comma, semicolon, tab), decimal mark and thousands separator,
 * the header row after any preamble, a units row under it. Reads the first 600 lines / 256 KiB
 * only, so its cost does not grow with the file. `hints` (from a recipe) fix what they name.
 * @throws ImportError EMPTY_FILE, NOT_TEXT, NO_HEADER (no line of names followed by numbers),
 *   NO_DATA_ROWS (a header and nothing else)
 * @example sniff('Club;Carry (m)\n7 Iron;150,2\n').decimal // => ','
 */
export function sniff(text: string, hints: SniffHints = {}): SniffResult {
  return sniffDetail(text, hints).result;
}
