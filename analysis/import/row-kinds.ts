/**
 * Telling the rows of a bay file apart: blank lines, the units row under the header, summary
 * rows (averages, totals) that some exports add after the shots.
 */
import { findUnit } from '@/analysis/units';

const SUMMARY = /^\s*(avg|average|averages|mean|means|total|totals|sum|std|stdev|std\.? ?dev\.?|standard deviation|sd|median|min|max|minimum|maximum|range|count|consistency|summary|dispersion|spread)\b\.?:?/i;
const LETTERED_UNIT = /^(l\s*\/\s*r|r\s*\/\s*l|lr|[+-]\s*[lr](\s*\/\s*[+-]\s*[lr])?|[lr]\s*[+-](\s*\/\s*[lr]\s*[+-])?)$/i;

/** Whether every cell of a row is empty or white space. O(cells). */
export function isBlankRow(cells: readonly string[]): boolean {
  for (let i = 0; i < cells.length; i++) if (cells[i].trim() !== '') return false;
  return true;
}

/**
 * Whether a row is a summary row: its first non-empty cell starts with a word such as Average,
 * Mean, Total, Std Dev, Median, Min or Max. O(cells) at worst; O(1) for a shot row whose first
 * cell is a number.
 */
export function isSummaryRow(cells: readonly string[]): boolean {
  for (let i = 0; i < cells.length; i++) {
    const cell = cells[i];
    if (cell.length === 0 || cell.trim() === '') continue;
    const c = cell.trimStart().charCodeAt(0) | 32;
    return c >= 97 && c <= 122 && SUMMARY.test(cell);
  }
  return false;
}

/** A units-row cell without its brackets: "(mph)" → "mph". O(cell length). */
export function unitCellText(cell: string): string {
  const t = cell.trim();
  // by hand rather than /^[([{]\s*(.*?)\s*[)\]}]$/, whose lazy middle backtracks over white space
  return t.length >= 2 && '([{'.includes(t[0]) && ')]}'.includes(t[t.length - 1]) ? t.slice(1, -1).trim() : t;
}

/**
 * Whether a row is a units row: every non-empty cell names a known unit or a side mark
 * ("L/R", "+R"), and at least one names a unit. O(cells).
 * @example isUnitsRow(['', 'mph', '(m)', 'deg', 'L/R']) // => true
 */
export function isUnitsRow(cells: readonly string[]): boolean {
  let units = 0;
  for (const cell of cells) {
    const t = unitCellText(cell);
    if (t === '') continue;
    if (findUnit(t)) units++;
    else if (!LETTERED_UNIT.test(t)) return false;
  }
  return units > 0;
}
