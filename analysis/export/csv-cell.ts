/** Characters that make a spreadsheet read a cell as a formula (OWASP, "CSV Injection"). */
const FORMULA_START = new Set(['=', '+', '-', '@', '\t', '\r']);

/**
 * One CSV cell, safe to open in a spreadsheet: text that starts with `=`, `+`, `-`, `@`, a tab
 * or a carriage return gets a leading apostrophe so it is shown, never run (OWASP, "CSV
 * Injection"); then the cell is quoted (RFC 4180) when it holds the delimiter, a quote, CR or
 * LF. Finite numbers are written as numbers (a negative number stays a number: it is not text
 * a spreadsheet could run). O(length).
 * https://owasp.org/www-community/attacks/CSV_Injection
 * @example csvCell('=HYPERLINK("x")') // => "'=HYPERLINK(""x"")" quoted
 * @example csvCell(-12.5) // => '-12.5'
 */
export function csvCell(value: string | number | null | undefined, delimiter = ','): string {
  if (value == null) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  let text = value;
  if (text.length > 0 && FORMULA_START.has(text[0])) text = `'${text}`;
  const needsQuotes = text.includes(delimiter) || text.includes('"') || text.includes('\n') || text.includes('\r');
  return needsQuotes ? `"${text.replaceAll('"', '""')}"` : text;
}

/** One CSV line (no line ending) from its cells. O(total length). */
export function csvLine(cells: readonly (string | number | null | undefined)[], delimiter = ','): string {
  let line = '';
  for (let i = 0; i < cells.length; i++) line += (i > 0 ? delimiter : '') + csvCell(cells[i], delimiter);
  return line;
}
