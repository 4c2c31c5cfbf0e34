/**
 * Splitting the data part of a bay file into rows of cells: papaparse for a file with quotes,
 * and a plain split for a file without any (cells then cannot hold a delimiter or a line break,
 * so the plain split reads the rows exactly as papaparse's own fast mode does, without its
 * per-row result objects). In the plain split a row may come as its line and cell bounds instead
 * of cut cells: plain numbers are then read straight from the line.
 */
import Papa from 'papaparse';
import { isSummaryRow } from './row-kinds';

/** A row handed over as its line and the bounds of its first `width` cells (no substrings made). */
export interface RowBounds {
  line: string;
  starts: Int32Array;
  ends: Int32Array;
}

/**
 * Called once per row, in order: `cells` the cut cells, or null when the row is `bounds`;
 * `splitError` papaparse's message when the row could not be split.
 */
export type RowHandler = (cells: string[] | null, splitError: string | null) => void;

export interface SplitOptions {
  delimiter: string;
  newline: '\r\n' | '\n' | '\r';
  /** Cells a well-formed row has (the header's width). */
  width: number;
}

/** New bounds for rows of `width` cells, to pass to splitRows and read in the handler. */
export function newRowBounds(width: number): RowBounds {
  return { line: '', starts: new Int32Array(width + 1), ends: new Int32Array(width + 1) };
}

/**
 * Hands every row of `data` to `onRow`, one at a time (none is kept). A row of exactly `width`
 * cells that is not blank, not indented and not a summary row comes as bounds; every other row
 * comes as cut cells. As papaparse, a final line break ends in one empty row. O(data length).
 * @example splitRows('7 Iron,150\n', { delimiter: ',', newline: '\n', width: 2 }, newRowBounds(2), onRow)
 */
export function splitRows(data: string, options: SplitOptions, bounds: RowBounds, onRow: RowHandler): void {
  if (data.indexOf('"') !== -1) {
    Papa.parse<string[]>(data, {
      delimiter: options.delimiter,
      newline: options.newline,
      header: false,
      dynamicTyping: false,
      skipEmptyLines: false,
      step: (results) => onRow(results.data, results.errors.length > 0 ? results.errors[0].message : null),
    });
    return;
  }
  const { delimiter, width } = options;
  const { starts, ends } = bounds;
  const lines = data.split(options.newline);
  if (lines.length > 0 && lines[lines.length - 1] === '') lines.pop();
  const summary = isSummaryRow; // a local: some module loaders turn every use of an import into a getter call
  for (let i = 0; i < lines.length; i++) {
    const text = lines[i];
    // Cell bounds without cutting the cells; an unusual row (blank, summary, ragged) is split.
    let count = 0;
    let pos = 0;
    for (;;) {
      const j = text.indexOf(delimiter, pos);
      if (count === width) {
        count++;
        break;
      }
      starts[count] = pos;
      ends[count] = j === -1 ? text.length : j;
      count++;
      if (j === -1) break;
      pos = j + 1;
    }
    let first = 0;
    while (first < width && starts[first] === ends[first]) first++;
    const firstCode = first < width ? text.charCodeAt(starts[first]) : 32;
    const letter = ((firstCode | 32) >= 97 && (firstCode | 32) <= 122) || firstCode > 127;
    const plainRow = count === width && firstCode !== 32 && firstCode !== 9 && (!letter || !summary([text.slice(starts[first], ends[first])]));
    if (plainRow) {
      bounds.line = text;
      onRow(null, null);
    } else onRow(text.split(delimiter), null);
  }
  if (endsWithLineBreak(data)) onRow([''], null);
}

/** Whether text ends with a line break. O(1). */
export function endsWithLineBreak(text: string): boolean {
  const c = text.charCodeAt(text.length - 1);
  return c === 10 || c === 13;
}
