/**
 * The suggested mapping of a bay file: for every column a target (a canonical field, the club,
 * the build, or ignore), its unit and side notation, a confidence, the reason in plain words and
 * a few sample values. Nothing is guessed silently: every doubtful choice is listed in
 * `ambiguous`, every suspicious unit in `warnings`.
 */
import { FIELD_UNITS, SIDE_FIELDS, type ShotField } from '@/analysis/fields';
import { CANONICAL_UNIT, fieldDimension, findUnit, unitSystemOf, type UnitInfo, type UnitSystem } from '@/analysis/units';
import { parseClubName } from './club-name';
import { matchHeaderName, parseHeader, type HeaderCandidate, type ParsedHeader } from './header-match';
import { compileNumberReader, isMissingCell, newCellState, type NumberReader } from './number-format';
import type { ColumnTarget, Recipe, RecipeColumn, SideNotation } from './recipe';
import { isBlankRow, isSummaryRow } from './row-kinds';
import { compileSideReader, detectSideNotation } from './side-notation';
import { targetWords } from './shot-limits';
import { sniffDetail, type SniffDetail, type SniffHints, type SniffResult } from './sniff';
import { unitWarnings, type ImportWarning, type SampleColumn } from './unit-plausibility';

export type { ImportWarning } from './unit-plausibility';

export interface ColumnSuggestion {
  header: string;
  index: number;
  field: ColumnTarget;
  /** Unit name (units.ts) for a shot field; the text as written when the unit is unknown. */
  unit: string | null;
  side: SideNotation | null;
  /** Signed values written for the player's hand (only from a recipe; recipe.ts, `handed`). */
  handed?: boolean;
  /** 0..1: how sure the suggestion is. */
  confidence: number;
  reason: string;
  /** Up to five non-empty cells, as written. */
  samples: string[];
}

export interface MappingSuggestion {
  sniff: SniffResult;
  /** The suggestion as a recipe (every column), ready to save or to correct. */
  recipe: Recipe;
  suggestions: ColumnSuggestion[];
  warnings: ImportWarning[];
  /** Columns whose suggestion is a guess the fitter should confirm. */
  ambiguous: AmbiguousColumn[];
}

/**
 * A guess to confirm, and of which kind: two columns claim one field (`conflict`, `field` the
 * field claimed), the header reads two ways (`header`), the unit is unknown or inferred
 * (`unit`), the sign convention is assumed (`sign`).
 */
export interface AmbiguousColumn {
  column: string;
  reason: string;
  kind: 'conflict' | 'header' | 'unit' | 'sign';
  field: ColumnTarget;
}

/** Data rows of the head sample used for suggestions. */
const SAMPLE_ROWS = 500;

function isShotField(target: ColumnTarget): target is ShotField {
  return target !== 'club' && target !== 'build' && target !== 'ignore';
}

interface ColumnFacts {
  header: string;
  index: number;
  parsed: ParsedHeader;
  /** The stated unit: header first, then the units row. */
  unit: UnitInfo | null;
  unknownUnit: string | null;
  cells: string[];
  samples: string[];
}

function columnFacts(detail: SniffDetail, rows: string[][]): ColumnFacts[] {
  const { headers, rawHeaders, units } = detail.result;
  return headers.map((header, index) => {
    const parsed = parseHeader(rawHeaders[index]);
    let unit = parsed.unit;
    let unknownUnit = parsed.unknownUnit;
    const unitsCell = units[index];
    if (!unit && unitsCell) {
      unit = findUnit(unitsCell);
      if (!unit && !/^[lr+\-/\s]+$/i.test(unitsCell)) unknownUnit ??= unitsCell;
      if (/^(l\s*\/\s*r|r\s*\/\s*l|lr)$/i.test(unitsCell)) parsed.side ??= 'lettered';
    }
    if (unit) unknownUnit = null;
    const cells: string[] = [];
    for (const row of rows) {
      const cell = row[index];
      if (cell !== undefined && !isMissingCell(cell)) cells.push(cell.trim());
    }
    return { header, index, parsed, unit, unknownUnit, cells, samples: cells.slice(0, 5) };
  });
}

function share(cells: readonly string[], test: (cell: string) => boolean): number {
  if (cells.length === 0) return 0;
  let n = 0;
  for (const cell of cells) if (test(cell)) n++;
  return n / cells.length;
}

function fileSystem(facts: readonly ColumnFacts[]): UnitSystem | null {
  let imperial = 0;
  let metric = 0;
  for (const f of facts) {
    const system = f.unit ? unitSystemOf(f.unit.unit) : null;
    if (system === 'imperial') imperial++;
    if (system === 'metric') metric++;
  }
  if (imperial > metric) return 'imperial';
  if (metric > imperial) return 'metric';
  return null;
}

interface Scored extends HeaderCandidate {
  notes: string[];
}

function scoreCandidates(facts: ColumnFacts, readNumber: NumberReader): Scored[] {
  const state = newCellState();
  const numeric = share(facts.cells, (c) => {
    const v = readNumber(c, state);
    return v === v;
  });
  const sideRead = compileSideReader('signed-right-positive', readNumber);
  const sideNumeric = share(facts.cells, (c) => {
    const v = sideRead(c, state);
    return v === v;
  });
  const candidates: Scored[] = matchHeaderName(facts.parsed.name).map((c) => ({ ...c, notes: c.note ? [c.note] : [] }));
  // a column of numbers is looked up as club names only when its header says club
  const clubShare = numeric > 0.8 && !candidates.some((c) => c.target === 'club') ? 0 : share(facts.cells, (c) => parseClubName(c).known);
  if (clubShare >= 0.8 && !candidates.some((c) => c.target === 'club')) {
    candidates.push({ target: 'club', confidence: 0.6, reason: 'its values look like club names', notes: [] });
  }
  for (const c of candidates) {
    if (isShotField(c.target)) {
      const dimension = fieldDimension(c.target);
      if (facts.unit) {
        if (facts.unit.dimension === dimension) {
          c.confidence = Math.min(1, c.confidence * 1.03);
          c.reason += `, in ${facts.unit.unit}`;
        } else {
          c.confidence *= 0.3;
          c.notes.push(`its unit ${facts.unit.unit} is not a ${dimension} unit`);
        }
      } else if (facts.unknownUnit === null && (dimension === 'speed' || dimension === 'length')) {
        c.confidence *= 0.9;
      }
      const readable = SIDE_FIELDS.has(c.target) ? sideNumeric : numeric;
      if (facts.cells.length > 0 && readable < 0.5) {
        c.confidence *= 0.3;
        c.notes.push(`only ${Math.round(readable * 100)}% of its values are numbers`);
      } else if (facts.cells.length === 0) {
        c.confidence *= 0.8;
        c.notes.push('the column is empty in the rows looked at');
      }
    } else if (c.target === 'club') {
      if (facts.cells.length > 0 && clubShare < 0.5) {
        c.confidence *= numeric > 0.8 ? 0.4 : 0.8;
        c.notes.push(`only ${Math.round(clubShare * 100)}% of its values are known club names`);
      }
    } else if (c.target === 'build' && numeric > 0.8 && facts.cells.length > 0) {
      c.confidence *= 0.7;
    }
  }
  candidates.sort((a, b) => b.confidence - a.confidence);
  return candidates;
}

/** Default unit for a shot field whose column states none. */
function defaultUnit(field: ShotField, facts: ColumnFacts, system: UnitSystem | null, readNumber: NumberReader): { unit: string; doubt: string | null } {
  const dimension = fieldDimension(field);
  if (dimension !== 'speed' && dimension !== 'length') {
    return { unit: CANONICAL_UNIT[dimension], doubt: null };
  }
  const state = newCellState();
  const values = facts.cells.map((c) => Math.abs(readNumber(c, state))).filter((v) => v === v).sort((a, b) => a - b);
  const med = values.length ? values[values.length >> 1] : null;
  if (dimension === 'speed') {
    if (system === 'imperial') return { unit: 'mph', doubt: 'no unit given; mph assumed as for the other columns' };
    if (system === 'metric') {
      const unit = med !== null && med > 100 ? 'km/h' : 'm/s';
      return { unit, doubt: `no unit given; ${unit} assumed from the other columns and the size of the values` };
    }
    const unit = med === null || med <= 90 ? 'm/s' : med <= 200 ? 'mph' : 'km/h';
    return { unit, doubt: `no unit given; ${unit} assumed from the size of the values` };
  }
  if (field === 'apexHeight') {
    const unit = system === 'imperial' || (system === null && med !== null && med > 60) ? 'ft' : system === 'metric' ? 'm' : 'yd';
    return { unit, doubt: `no unit given; ${unit} assumed` };
  }
  const unit = system === 'metric' ? 'm' : 'yd';
  return { unit, doubt: `no unit given; ${unit === 'm' ? 'metres' : 'yards'} assumed${system ? ' as for the other columns' : ''}` };
}

/** The head sample's data rows: not blank, not summary, at most SAMPLE_ROWS. */
export function sampleRows(detail: SniffDetail): string[][] {
  const rows: string[][] = [];
  for (const { cells } of detail.headRows) {
    if (rows.length >= SAMPLE_ROWS) break;
    if (!isBlankRow(cells) && !isSummaryRow(cells)) rows.push(cells);
  }
  return rows;
}

/**
 * Build the suggestion from a sniffed file. Used by suggestMapping and importBayFile.
 * O(columns × (sample rows + header words)).
 */
export function suggestFromDetail(detail: SniffDetail, options: { unitWarnings?: boolean } = {}): MappingSuggestion {
  const sniffed = detail.result;
  const rows = sampleRows(detail);
  const readNumber = compileNumberReader(sniffed.decimal, sniffed.thousands);
  const facts = columnFacts(detail, rows);
  const system = fileSystem(facts);
  const ambiguous: AmbiguousColumn[] = [];
  const warnings: ImportWarning[] = [];
  for (const doubt of sniffed.doubts) warnings.push({ code: 'NUMBER_FORMAT_DOUBT', message: doubt });
  for (const name of sniffed.duplicates) {
    warnings.push({ code: 'DUPLICATE_HEADER', column: name, message: `The header "${name}" appears more than once; the repeats are named "${name} (2)" and so on.` });
  }

  const scored = facts.map((f) => scoreCandidates(f, readNumber));
  const chosen = scored.map((candidates) => candidates[0] ?? null);
  // one column per shot field and one club column: the most confident keeps it
  const owner = new Map<ColumnTarget, number>();
  chosen.forEach((c, i) => {
    if (!c || c.target === 'build' || c.target === 'ignore') return;
    const j = owner.get(c.target);
    if (j === undefined || c.confidence > chosen[j]!.confidence) owner.set(c.target, i);
  });

  const suggestions: ColumnSuggestion[] = facts.map((f, i) => {
    const best = chosen[i];
    const base = { header: f.header, index: f.index, samples: f.samples };
    if (!best) {
      return { ...base, field: 'ignore', unit: null, side: null, confidence: 0.5, reason: f.parsed.name ? `no field matches the header "${f.header}"` : 'the column has no header' };
    }
    if (best.target !== 'build' && best.target !== 'ignore' && owner.get(best.target) !== i) {
      const winner = facts[owner.get(best.target)!].header;
      ambiguous.push({ column: f.header, reason: `also looks like ${targetWords(best.target)}, but "${winner}" matches better; ignored`, kind: 'conflict', field: best.target });
      return { ...base, field: 'ignore', unit: null, side: null, confidence: 0.4, reason: `${best.reason}; "${winner}" was taken for ${targetWords(best.target)}` };
    }
    let confidence = best.confidence;
    const reasons = [best.reason, ...best.notes];
    // A header that reads two ways is settled when its stated unit fits only the chosen field's kind.
    const unitSettles = isShotField(best.target) && f.unit !== null && f.unit !== undefined && f.unit.dimension === fieldDimension(best.target);
    if (best.note && !unitSettles) ambiguous.push({ column: f.header, reason: best.note, kind: 'header', field: best.target });
    if (!isShotField(best.target)) {
      return { ...base, field: best.target, unit: null, side: null, confidence: round(confidence), reason: reasons.join('; ') };
    }
    const field = best.target;
    let unit: string | null;
    if (f.unit && f.unit.dimension === fieldDimension(field)) unit = f.unit.unit;
    else if (f.unknownUnit !== null) {
      unit = f.unknownUnit;
      confidence *= 0.5;
      reasons.push(`unit "${f.unknownUnit}" is not one Ovalyard knows`);
      warnings.push({ code: 'UNKNOWN_UNIT', column: f.header, message: `${f.header}: the unit "${f.unknownUnit}" is not known; choose the unit before importing.` });
      ambiguous.push({ column: f.header, reason: `unknown unit "${f.unknownUnit}"`, kind: 'unit', field });
    } else {
      const guess = defaultUnit(field, f, system, readNumber);
      unit = guess.unit;
      if (guess.doubt) {
        confidence *= 0.8;
        reasons.push(guess.doubt);
        ambiguous.push({ column: f.header, reason: guess.doubt, kind: 'unit', field });
      } else reasons.push(`no unit given; ${FIELD_UNITS[field]} assumed`);
    }
    let side: SideNotation | null = null;
    if (SIDE_FIELDS.has(field)) {
      const detected = detectSideNotation(f.cells);
      if (detected.lettered > 0) {
        side = detected.notation;
        reasons.push(`values carry L/R marks (${side})`);
      } else if (f.parsed.side === 'signed-right-positive' || f.parsed.side === 'signed-left-positive') {
        side = f.parsed.side;
        reasons.push(`the header states the sign (${side === 'signed-right-positive' ? '+ is right' : '+ is left'})`);
      } else {
        side = 'signed-right-positive';
        confidence *= 0.9;
        const doubt = 'signed values, sign convention not stated; + is right assumed';
        reasons.push(doubt);
        ambiguous.push({ column: f.header, reason: doubt, kind: 'sign', field });
      }
    }
    return { ...base, field, unit, side, confidence: round(confidence), reason: reasons.join('; ') };
  });

  if (!suggestions.some((s) => s.field === 'club')) {
    warnings.push({ code: 'NO_CLUB_COLUMN', message: 'No column holds the club; choose the club for these shots.' });
  }
  if (options.unitWarnings !== false) warnings.push(...unitWarnings(sampleColumns(suggestions, rows, readNumber)));
  return { sniff: sniffed, recipe: recipeOf(sniffed, suggestions), suggestions, warnings, ambiguous };
}

function round(x: number): number {
  return Math.round(x * 100) / 100;
}

/** The suggestion written as a recipe. */
export function recipeOf(sniffed: SniffResult, suggestions: readonly ColumnSuggestion[]): Recipe {
  const columns: Record<string, RecipeColumn> = {};
  for (const s of suggestions) {
    const column: RecipeColumn = { field: s.field };
    if (s.unit !== null) column.unit = s.unit;
    if (s.side !== null) column.side = s.side;
    if (s.handed) column.handed = true;
    columns[s.header] = column;
  }
  return { delimiter: sniffed.delimiter, decimal: sniffed.decimal, headerRow: sniffed.headerRow, columns };
}

/** Canonical values of the sample for the mapped numeric columns with known units. */
export function sampleColumns(
  mapping: readonly { header: string; index: number; field: ColumnTarget; unit: string | null; side: SideNotation | null }[],
  rows: readonly string[][],
  readNumber: NumberReader,
): SampleColumn[] {
  const state = newCellState();
  const out: SampleColumn[] = [];
  for (const m of mapping) {
    if (!isShotField(m.field) || m.unit === null) continue;
    const unit = findUnit(m.unit);
    if (!unit || unit.dimension !== fieldDimension(m.field)) continue;
    const read = m.side ? compileSideReader(m.side, readNumber) : readNumber;
    const values = rows.map((row) => {
      const v = read(row[m.index] ?? '', state);
      return v === v ? v * (state.unit?.dimension === unit.dimension ? state.unit.factor : unit.factor) : undefined;
    });
    out.push({ header: m.header, field: m.field, unit, values });
  }
  return out;
}

/**
 * Suggest a mapping for a bay file: sniff it, then match every header to a canonical field, the
 * club, the build or nothing, with the unit from the header or the units row, the side notation
 * from the values or the header, a confidence, the reason and sample values. Reads only the
 * head of the file (the first 500 data rows), so its cost does not grow with the file.
 * @throws ImportError EMPTY_FILE, NOT_TEXT, NO_HEADER, NO_DATA_ROWS
 * @example suggestMapping('Club,Carry (yds)\n7 Iron,165.3\n').suggestions[1] // => { field: 'carry', unit: 'yd', … }
 */
export function suggestMapping(text: string, hints: SniffHints = {}): MappingSuggestion {
  return suggestFromDetail(sniffDetail(text, hints));
}
