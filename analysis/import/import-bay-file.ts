/**
 * Importing a bay file, in named steps: sniff the dialect, suggest a mapping, put the recipe on
 * top (merge-recipe), compile a reading plan per column (column-plans), split the rows
 * (split-rows) and read each into a shot or a rejected row (row-reader). Rows that cannot be read
 * are reported with the reason; the others become shots in canonical units.
 */
import type { Shot, ShotField, ShotValues } from '@/analysis/fields';
import { findUnit } from '@/analysis/units';
import { parseClubName } from './club-name';
import { compilePlans } from './column-plans';
import { parseHeader } from './header-match';
import { ImportError } from './import-error';
import { MAX_BUILD_CHARS, MAX_CLUB_CHARS } from './import-limits';
import { mergeRecipe, recipeError } from './merge-recipe';
import { compileNumberReader } from './number-format';
import type { Recipe } from './recipe';
import { createRowReader, type RejectedRow } from './row-reader';
import { sniffDetail, type SniffResult } from './sniff';
import { endsWithLineBreak, newRowBounds, splitRows } from './split-rows';
import { recipeOf, sampleColumns, sampleRows, suggestFromDetail, type AmbiguousColumn, type ColumnSuggestion } from './suggest-mapping';
import { stripBom } from './text-lines';
import type { Hand } from '@/analysis/plain-words/handed-words';
import { unitWarnings, type ImportWarning } from './unit-plausibility';

export type { RejectedRow } from './row-reader';

export interface ImportOptions {
  /** A saved mapping, applied on top of the automatic suggestion. */
  recipe?: Recipe;
  /** Club for shots whose file has no club column, or an empty club cell (any spelling). */
  defaultClub?: string | null;
  /** Build for shots with no build column value. */
  defaultBuild?: string | null;
  /** Build per canonical club code, for shots with no build column value (before defaultBuild). */
  buildByClub?: Record<string, string>;
  /** Hook to fill flight fields (carry, apex…) the file lacks; its fields are marked derived. */
  fillFlight?: (values: ShotValues) => { values: ShotValues; derived: ShotField[] };
  /**
   * The player's hand: for a left-handed player, columns the recipe marks as written for the
   * player's hand (`handed`) are turned round to Ovalyard's + = right. Default right.
   */
  hand?: Hand;
}

export interface ImportResult {
  /** The mapping used: the suggestion with the recipe on top (save it to reuse it). */
  recipe: Recipe;
  sniff: SniffResult;
  /** The automatic suggestion (before the recipe). */
  suggestions: ColumnSuggestion[];
  warnings: ImportWarning[];
  ambiguous: AmbiguousColumn[];
  /** Data rows seen (excluding blank and summary rows). */
  rows: number;
  /**
   * Accepted shots; row = 1-based data row. Shots that derived the same fields share one frozen
   * `derived` array: copy it before changing it.
   */
  shots: Shot[];
  rejected: RejectedRow[];
  /** Lines not read as shots: blank lines, summary rows, the units row. `line` is 1-based. */
  skipped: { line: number; reason: string }[];
  /** Club names that are not canonical, as written. */
  unknownClubs: string[];
}

/**
 * Import a bay file: every row becomes a shot in canonical units or a rejected row with its
 * number, column and reason; blank lines, summary rows and the units row are skipped and
 * listed. Derived fields (smash factor, spin rate and axis from back and side spin, face to
 * path, spin loft) are computed only where the file lacks them and are listed in `derived`.
 * One pass over the file; O(rows × mapped columns).
 * @throws ImportError EMPTY_FILE, NOT_TEXT, NO_HEADER, NO_DATA_ROWS, UNKNOWN_UNIT,
 *   UNIT_MISMATCH, BAD_RECIPE, TOO_MANY_COLUMNS
 * @example importBayFile('Club,Carry (yds)\n7 Iron,165\n').shots[0] // => { row: 1, club: '7I', build: null, values: { carry: 150.876 }, derived: [] }
 */
export function importBayFile(input: string, options: ImportOptions = {}): ImportResult {
  const { recipe } = options;
  if (recipe !== undefined) {
    const error = recipeError(recipe);
    if (error) throw error;
  }
  const text = stripBom(input);
  const detail = sniffDetail(text, { delimiter: recipe?.delimiter, decimal: recipe?.decimal, headerRow: recipe?.headerRow });
  const sniffed = detail.result;
  // unit warnings are worked out below, for the mapping with the recipe on top
  const suggestion = suggestFromDetail(detail, { unitWarnings: false });
  const warnings = suggestion.warnings.filter((w) => !['NO_CLUB_COLUMN', 'UNKNOWN_UNIT'].includes(w.code));
  // the unit each header (or the units row) states, for columns the recipe gives a new field
  const statedUnits = sniffed.rawHeaders.map((h, i) => parseHeader(h).unit ?? findUnit(sniffed.units[i] ?? ''));
  const merged = mergeRecipe(suggestion.suggestions, statedUnits, recipe, warnings);
  const readNumber = compileNumberReader(sniffed.decimal, sniffed.thousands);
  const plans = compilePlans(merged, readNumber, sniffed.decimal, options.hand);
  for (const w of unitWarnings(sampleColumns(merged, sampleRows(detail), readNumber))) warnings.push(w);

  const clubIndex = merged.find((m) => m.field === 'club')?.index ?? -1;
  const defaultClub = options.defaultClub ? parseClubName(options.defaultClub) : null;
  if (clubIndex < 0 && !defaultClub) {
    warnings.push({ code: 'NO_CLUB_COLUMN', message: 'No column holds the club and no club was given; the shots have no club.' });
  }
  const width = sniffed.headers.length;
  const bounds = newRowBounds(width);
  const { onRow, read } = createRowReader({
    plans,
    width,
    firstLine: sniffed.dataStartLine + 1,
    decimal: sniffed.decimal,
    clubIndex,
    buildIndexes: merged.filter((m) => m.field === 'build').map((m) => m.index),
    defaultClub,
    buildByClub: options.buildByClub ?? {},
    defaultBuild: options.defaultBuild ?? null,
    fillFlight: options.fillFlight,
    bounds,
  });
  if (sniffed.unitsRow) read.skipped.push({ line: sniffed.headerRow + 2, reason: 'units row' });
  splitRows(text.slice(detail.dataOffset), { delimiter: sniffed.delimiter, newline: sniffed.newline, width }, bounds, onRow);
  const { rows, shots, rejected, skipped, missingClub } = read;
  // the line break that ends the last line is not a blank line
  const last = skipped[skipped.length - 1];
  if (last && last.line === read.lastBlankLine && read.lastBlankLine === read.lastLine && endsWithLineBreak(text)) skipped.pop();

  if (rows === 0) throw new ImportError('NO_DATA_ROWS', 'The file has a header but no shot rows.');
  if (missingClub > 0 && clubIndex >= 0) {
    warnings.push({ code: 'MISSING_CLUB', message: `${missingClub} shot row(s) have no club.` });
  }
  if (read.shortenedNames > 0) {
    warnings.push({
      code: 'NAME_SHORTENED',
      message: `${read.shortenedNames} club name(s) or build label(s) were longer than ${MAX_CLUB_CHARS} / ${MAX_BUILD_CHARS} characters and were cut to that length.`,
    });
  }
  const used: Recipe = recipeOf(sniffed, merged.map((m) => ({ ...m, confidence: 1, reason: '', samples: [] })));
  return {
    recipe: used,
    sniff: sniffed,
    suggestions: suggestion.suggestions,
    warnings,
    ambiguous: suggestion.ambiguous,
    rows,
    shots,
    rejected,
    skipped,
    unknownClubs: [...read.unknownClubs],
  };
}
