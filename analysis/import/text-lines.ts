/**
 * Line-level helpers for sniffing: the first lines of a file, split into cells. The full parse
 * is papaparse's; these only look at the head of the file, so a 10 MB file costs no more here
 * than a small one.
 */
import { ImportError } from './import-error';

/** How much of the file the sniffer reads (characters). */
export const HEAD_CHARS = 256 * 1024;
/** How many lines the sniffer reads at most. */
export const HEAD_LINES = 600;

/** Strip a byte-order mark. O(1). */
export function stripBom(text: string): string {
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

/**
 * Refuse a file that is empty or is not text. Looks at the first 64 KiB only. O(64 Ki).
 * @throws ImportError EMPTY_FILE when there is nothing but white space; NOT_TEXT for NUL bytes,
 *   many control characters, or many undecodable characters (U+FFFD)
 */
export function assertText(text: string): void {
  if (text.trim().length === 0) throw new ImportError('EMPTY_FILE', 'The file is empty.');
  const n = Math.min(text.length, 65536);
  let control = 0;
  let replacement = 0;
  for (let i = 0; i < n; i++) {
    const c = text.charCodeAt(i);
    if (c === 0) throw new ImportError('NOT_TEXT', 'The file is not a text file (it holds NUL bytes).');
    if (c < 32 && c !== 9 && c !== 10 && c !== 13 && c !== 12) control++;
    else if (c === 0xfffd) replacement++;
  }
  if (control > n * 0.01 + 2 || replacement > n * 0.05 + 2) {
    throw new ImportError('NOT_TEXT', 'The file is not a text file (it holds binary data).');
  }
}

/** The line break the file uses. */
export function detectNewline(text: string): '\r\n' | '\n' | '\r' {
  const i = text.search(/\r\n|\n|\r/);
  if (i < 0) return '\n';
  if (text[i] === '\n') return '\n';
  return text[i + 1] === '\n' ? '\r\n' : '\r';
}

/**
 * The first lines of the text (at most HEAD_LINES, within HEAD_CHARS), and the character offset
 * where each starts. A last line cut by the character limit is dropped. O(head).
 */
export function headLines(text: string): { lines: string[]; offsets: number[]; complete: boolean } {
  const limit = Math.min(text.length, HEAD_CHARS);
  const lines: string[] = [];
  const offsets: number[] = [];
  let start = 0;
  while (start <= limit && lines.length < HEAD_LINES) {
    let end = start;
    while (end < text.length && text.charCodeAt(end) !== 10 && text.charCodeAt(end) !== 13) end++;
    if (end > limit && end < text.length) break;
    lines.push(text.slice(start, end));
    offsets.push(start);
    if (end >= text.length) return { lines, offsets, complete: true };
    start = end + (text.charCodeAt(end) === 13 && text.charCodeAt(end + 1) === 10 ? 2 : 1);
    if (start >= text.length) return { lines, offsets, complete: true };
  }
  return { lines, offsets, complete: false };
}

/**
 * Split one line into cells at `delimiter`, honouring double quotes ("a;b" is one cell, "" is a
 * quote). O(line length).
 * @example splitLine('7 Iron;"50,1";150', ';') // => ['7 Iron', '50,1', '150']
 */
export function splitLine(line: string, delimiter: string): string[] {
  if (line.indexOf('"') < 0) return line.split(delimiter);
  const cells: string[] = [];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const ch = line[i];
    if (quoted) {
      if (ch === '"') {
        if (line[i + 1] === '"') {
          cell += '"';
          i++;
        } else quoted = false;
      } else cell += ch;
    } else if (ch === '"' && cell.trim() === '') {
      quoted = true;
      cell = '';
    } else if (ch === delimiter) {
      cells.push(cell);
      cell = '';
    } else cell += ch;
  }
  cells.push(cell);
  return cells;
}

/** Number of cells up to the last non-empty one (trailing empty cells do not count). */
export function filledWidth(cells: readonly string[]): number {
  for (let i = cells.length - 1; i >= 0; i--) if (cells[i].trim() !== '') return i + 1;
  return 0;
}
