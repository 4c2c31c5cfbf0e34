import Papa from 'papaparse';
import { isFormulaLike } from '@/analysis/import';
import { csvCell } from './csv-cell';

/**
 * A CSV text rewritten so no cell runs as a spreadsheet formula (OWASP, "CSV Injection"): every
 * text cell goes through csvCell (formula-looking text gets a leading apostrophe, RFC 4180
 * quoting), while a plain number such as "-12.5" or "150,2" stays as written. Rows and line
 * breaks are kept; quoting may change. O(text length).
 * @example neutraliseCsv('Club,Note\n7 Iron,=HYPERLINK("x")\n', ',') // => 'Club,Note\n7 Iron,"\'=HYPERLINK(""x"")"\n'
 */
export function neutraliseCsv(text: string, delimiter: string): string {
  const newline = text.includes('\r\n') ? '\r\n' : text.includes('\r') && !text.includes('\n') ? '\r' : '\n';
  const out: string[] = [];
  Papa.parse<string[]>(text, {
    delimiter,
    newline,
    skipEmptyLines: false,
    step: (results) => {
      const cells = results.data;
      let line = '';
      for (let i = 0; i < cells.length; i++) {
        // a plain number is written as it was ("-12.50", "150,2"): it needs no quotes and runs nothing
        line += (i > 0 ? delimiter : '') + (isPlainNumber(cells[i], delimiter) ? cells[i] : csvCell(cells[i], delimiter));
      }
      out.push(line);
    },
  });
  // a final line break parses as one empty row: it comes back as the final line break
  return out.join(newline);
}

/** Digits with at most one decimal mark and a leading sign; nothing a spreadsheet could run. O(length). */
function isPlainNumber(cell: string, delimiter: string): boolean {
  if (isFormulaLike(cell) || cell.length === 0 || cell.length > 32 || cell.includes(delimiter)) return false;
  let i = cell[0] === '-' || cell[0] === '+' ? 1 : 0;
  let digits = 0;
  let marks = 0;
  for (; i < cell.length; i++) {
    const c = cell.charCodeAt(i);
    if (c >= 48 && c <= 57) digits++;
    else if ((c === 46 || c === 44) && marks === 0) marks++;
    else return false;
  }
  return digits > 0;
}
