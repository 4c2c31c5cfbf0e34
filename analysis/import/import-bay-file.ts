/**
 * Importing a bay file: sniff, suggest, apply a recipe on top, then parse once with papaparse
 * and convert every mapped column with a converter compiled for it (number format, side
 * notation, unit factor, limits). Rows that cannot be read are reported with the reason; the
 * others become shots in canonical units.
 */
import Papa from 'papaparse';
import { SHOT_FIELDS, SIDE_FIELDS, type Shot, type ShotField, type ShotValues } from '@/analysis/fields';
import { fieldDimension, findUnit, type UnitInfo } from '@/analysis/units';
import { parseClubName } from './club-name';
import { deriveSlotsInPlace, derivedFields } from './derive-fields';
import { newSlots, SLOT, SLOT_COUNT, valuesFromSlots } from './shot-slots';
import { parseHeader } from './header-match';
import { smashFactorLimit } from '@/analysis/physics';
import { impactMisreadReason } from './impact-check';
import { ImportError, type ImportErrorCode } from './import-error';
import { compileNumberReader, newCellState, quickDecimal, quickDecimalRange, type DecimalMark, type NumberReader } from './number-format';
import { recipeSchema, type ColumnTarget, type Recipe, type RecipeColumn, type SideNotation } from './recipe';
import { isBlankRow, isSummaryRow } from './row-kinds';
import { checkLimit, checkShotValues, SHOT_LIMITS } from './shot-limits';
import { compileSideReader } from './side-notation';
import { sniffDetail, type SniffResult } from './sniff';
import { recipeOf, sampleColumns, sampleRows, suggestFromDetail, type AmbiguousColumn, type ColumnSuggestion } from './suggest-mapping';
import { stripBom } from './text-lines';
import { unitWarnings, type ImportWarning } from './unit-plausibility';

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
}

export interface RejectedRow {
  /** 1-based data row number (as Shot.row). */
  row: number;
  /** 1-based line number in the file (a quoted cell that spans lines shifts later numbers). */
  line: number;
  column?: string;
  reason: string;
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

const MIN = SHOT_FIELDS.map((f) => SHOT_LIMITS[f].min);
const SMASH_SLOT = SLOT.smashFactor;
const MAX = SHOT_FIELDS.map((f) => SHOT_LIMITS[f].max);

interface ColumnPlan {
  header: string;
  index: number;
  field: ShotField;
  unit: UnitInfo;
  read: NumberReader;
  /** The unit's factor to canonical. */
  factor: number;
  /** Slot index of the field. */
  slot: number;
  /** Whether the column holds plain numbers (no side notation), read inline. */
  plain: boolean;
  min: number;
  max: number;
}

function recipeError(recipe: unknown): ImportError | null {
  const parsed = recipeSchema.safeParse(recipe);
  if (parsed.success) return null;
  const issue = parsed.error.issues[0];
  const params = (issue as { params?: { importCode?: ImportErrorCode } }).params;
  const column = issue.path[0] === 'columns' && typeof issue.path[1] === 'string' ? issue.path[1] : undefined;
  const where = issue.path.length ? ` at ${issue.path.join('.')}` : '';
  return new ImportError(params?.importCode ?? 'BAD_RECIPE', `The recipe is not valid${where}: ${issue.message}`, column);
}

function isShotField(target: ColumnTarget): target is ShotField {
  return target !== 'club' && target !== 'build' && target !== 'ignore';
}

interface MergedColumn {
  header: string;
  index: number;
  field: ColumnTarget;
  unit: string | null;
  side: SideNotation | null;
}

/** The suggestion with the recipe's columns on top. */
function mergeRecipe(
  suggestions: readonly ColumnSuggestion[],
  statedUnits: readonly (UnitInfo | null)[],
  recipe: Recipe | undefined,
  warnings: ImportWarning[],
): MergedColumn[] {
  const merged: MergedColumn[] = suggestions.map((s) => ({ header: s.header, index: s.index, field: s.field, unit: s.unit, side: s.side }));
  if (!recipe) return merged;
  const byHeader = new Map(merged.map((m) => [m.header, m]));
  const claimed = new Map<ColumnTarget, string>();
  for (const [header, column] of Object.entries(recipe.columns) as [string, RecipeColumn][]) {
    const target = byHeader.get(header) ?? byHeader.get(header.trim());
    if (!target) {
      warnings.push({ code: 'RECIPE_COLUMN_MISSING', column: header, message: `The recipe names a column "${header}" that this file does not have; it was ignored.` });
      continue;
    }
    if (column.field !== 'build' && column.field !== 'ignore') {
      const other = claimed.get(column.field);
      if (other !== undefined) {
        throw new ImportError('BAD_RECIPE', `The recipe maps both "${other}" and "${header}" to ${column.field}.`, header);
      }
      claimed.set(column.field, header);
    }
    const sameField = target.field === column.field;
    let unit: string | null = null;
    if (isShotField(column.field)) {
      if (column.unit !== undefined) unit = column.unit;
      else if (sameField && target.unit !== null) unit = target.unit;
      else {
        const stated = (target.unit !== null ? findUnit(target.unit) : null) ?? statedUnits[target.index];
        const dimension = fieldDimension(column.field);
        unit = stated && stated.dimension === dimension ? stated.unit : null;
        if (unit === null) {
          unit = { speed: 'm/s', length: 'm', angle: 'deg', spin: 'rpm', time: 's', ratio: 'ratio' }[dimension];
          warnings.push({ code: 'UNIT_ASSUMED', column: header, message: `${header}: the recipe gives no unit for ${column.field}; ${unit} assumed.` });
        }
      }
    }
    let side: SideNotation | null = null;
    if (isShotField(column.field) && SIDE_FIELDS.has(column.field)) {
      side = column.side ?? (sameField && target.side !== null ? target.side : 'signed-right-positive');
    }
    target.field = column.field;
    target.unit = unit;
    target.side = side;
  }
  // a field the recipe gave to one column is taken from any other column the suggestion gave it to
  for (const m of merged) {
    const owner = claimed.get(m.field);
    if (owner !== undefined && owner !== m.header) {
      warnings.push({ code: 'RECIPE_OVERRIDE', column: m.header, message: `${m.header} was suggested as ${m.field}, but the recipe gives ${m.field} to "${owner}"; ignored.` });
      m.field = 'ignore';
      m.unit = null;
      m.side = null;
    }
  }
  return merged;
}

function compilePlans(merged: readonly MergedColumn[], readNumber: NumberReader, decimal: DecimalMark): ColumnPlan[] {
  const plans: ColumnPlan[] = [];
  for (const m of merged) {
    if (!isShotField(m.field)) continue;
    if (m.unit === null) throw new ImportError('UNKNOWN_UNIT', `${m.header}: no unit is given for ${m.field}.`, m.header);
    const unit = findUnit(m.unit);
    if (!unit) throw new ImportError('UNKNOWN_UNIT', `${m.header}: the unit "${m.unit}" is not known.`, m.header);
    const dimension = fieldDimension(m.field);
    if (unit.dimension !== dimension) {
      throw new ImportError('UNIT_MISMATCH', `${m.header}: "${m.unit}" is a ${unit.dimension} unit; ${m.field} needs a ${dimension} unit.`, m.header);
    }
    const read = m.side !== null ? compileSideReader(m.side, readNumber, decimal) : readNumber;
    const { min, max } = SHOT_LIMITS[m.field];
    plans.push({ header: m.header, index: m.index, field: m.field, unit, read, factor: unit.factor, slot: SLOT[m.field], plain: m.side === null, min, max });
  }
  return plans;
}

/**
 * Import a bay file: every row becomes a shot in canonical units or a rejected row with its
 * number, column and reason; blank lines, summary rows and the units row are skipped and
 * listed. Derived fields (smash factor, spin rate and axis from back and side spin, face to
 * path, spin loft) are computed only where the file lacks them and are listed in `derived`.
 * One papaparse pass over the file; O(rows × mapped columns) after it.
 * @throws ImportError EMPTY_FILE, NOT_TEXT, NO_HEADER, NO_DATA_ROWS, UNKNOWN_UNIT,
 *   UNIT_MISMATCH, BAD_RECIPE
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
  const plans = compilePlans(merged, readNumber, sniffed.decimal);
  warnings.push(...unitWarnings(sampleColumns(merged, sampleRows(detail), readNumber)));

  const clubIndex = merged.find((m) => m.field === 'club')?.index ?? -1;
  const smashHeader = plans.find((p) => p.field === 'smashFactor')?.header ?? null;
  // the impact bound on smash factor per club code (a misread is rejected; see impact-check.ts)
  const smashLimits = new Map<string, number>();
  const buildIndexes = merged.filter((m) => m.field === 'build').map((m) => m.index);
  const defaultClub = options.defaultClub ? parseClubName(options.defaultClub) : null;
  if (clubIndex < 0 && !defaultClub) {
    warnings.push({ code: 'NO_CLUB_COLUMN', message: 'No column holds the club and no club was given; the shots have no club.' });
  }
  const buildByClub = options.buildByClub ?? {};
  const defaultBuild = options.defaultBuild ?? null;
  const fillFlight = options.fillFlight;

  const skipped: { line: number; reason: string }[] = [];
  if (sniffed.unitsRow) skipped.push({ line: sniffed.headerRow + 2, reason: 'units row' });
  const width = sniffed.headers.length;
  const firstLine = sniffed.dataStartLine + 1;
  const state = newCellState();
  const clubCache = new Map<string, { code: string; known: boolean }>();
  const unknownClubs = new Set<string>();
  const shots: Shot[] = [];
  const rejected: RejectedRow[] = [];
  let rows = 0;
  let r = -1;
  let lastBlankLine = -1;
  let missingClub = 0;
  const nPlans = plans.length;
  const slots = newSlots();
  // imported functions as locals: some module loaders turn every use of an import into a getter call
  const blank = isBlankRow;
  const summary = isSummaryRow;
  const derive = deriveSlotsInPlace;
  const derivedOf = derivedFields;
  const toValues = valuesFromSlots;
  const slotCount = SLOT_COUNT;
  const fast = quickDecimal;
  const fastRange = quickDecimalRange;
  const decimalCode = sniffed.decimal.charCodeAt(0);

  // For an unquoted file a row may come as its line and cell bounds instead of split cells:
  // plain numbers are then read straight from the line, and only the few text cells are cut out.
  let rowLine = '';
  const starts = new Int32Array(width + 1);
  const ends = new Int32Array(width + 1);
  const cellOf = (cells: string[] | null, i: number): string => (cells !== null ? cells[i] : rowLine.slice(starts[i], ends[i]));
  // Club and build cells repeat a few texts row after row: compared in place against the texts
  // seen so far in that column, a repeat costs no new string (100,000 rows made 200,000).
  const seenTexts = new Map<number, string[]>();
  const textOf = (cells: string[] | null, i: number): string => {
    if (cells !== null) return cells[i];
    const from = starts[i];
    const length = ends[i] - from;
    let seen = seenTexts.get(i);
    if (seen === undefined) {
      seen = [];
      seenTexts.set(i, seen);
    }
    for (let t = 0; t < seen.length; t++) {
      const candidate = seen[t];
      if (candidate.length === length && rowLine.startsWith(candidate, from)) return candidate;
    }
    const text = rowLine.slice(from, from + length);
    if (seen.length < 16) seen.push(text);
    return text;
  };

  /** One parsed row: a shot, a rejected row, or a skipped line. `cells` null: the row is rowLine within starts/ends. */
  const onRow = (cells: string[] | null, splitError: string | null): void => {
    const line = firstLine + ++r;
    if (cells !== null && ((cells.length === 1 && cells[0] === '') || blank(cells))) {
      skipped.push({ line, reason: 'blank line' });
      lastBlankLine = line;
      return;
    }
    if (cells !== null && summary(cells)) {
      skipped.push({ line, reason: 'summary row' });
      return;
    }
    const row = ++rows;
    if (splitError !== null) {
      rejected.push({ row, line, reason: `the row cannot be split into cells (${splitError.toLowerCase()})` });
      return;
    }
    if (cells !== null && cells.length !== width) {
      let extra = false;
      for (let i = width; i < cells.length; i++) if (cells[i].trim() !== '') extra = true;
      if (cells.length < width || extra) {
        rejected.push({ row, line, reason: `the row has ${cells.length} cells; the header has ${width}` });
        return;
      }
    }
    slots.fill(NaN);
    let count = 0;
    for (let p = 0; p < nPlans; p++) {
      const plan = plans[p];
      const k = plan.index;
      // plain numbers inline (the common case); side notations and anything unusual via the reader
      let v = plan.plain ? (cells !== null ? fast(cells[k], decimalCode) : fastRange(rowLine, starts[k], ends[k], decimalCode)) : NaN;
      if (v === v) state.unit = null;
      else v = plan.read(cellOf(cells, k), state);
      if (v !== v) {
        if (state.error !== null) {
          rejected.push({ row, line, column: plan.header, reason: state.error });
          return;
        }
        continue;
      }
      let canonical: number;
      if (state.unit === null) canonical = v * plan.factor;
      else if (state.unit.dimension === plan.unit.dimension) canonical = v * state.unit.factor;
      else {
        rejected.push({ row, line, column: plan.header, reason: `the cell's unit ${state.unit.unit} does not fit ${plan.field}` });
        return;
      }
      if (!(canonical >= plan.min && canonical <= plan.max)) {
        rejected.push({ row, line, column: plan.header, reason: checkLimit(plan.field, canonical)! });
        return;
      }
      slots[plan.slot] = canonical;
      count++;
    }
    if (count === 0) {
      rejected.push({ row, line, reason: 'the row has no shot values' });
      return;
    }
    let club = defaultClub;
    if (clubIndex >= 0) {
      const name = textOf(cells, clubIndex) ?? '';
      const cached = clubCache.get(name);
      if (cached !== undefined) club = cached;
      else if (name.trim() !== '') {
        club = parseClubName(name);
        clubCache.set(name, club);
      }
    }
    if (club === null) missingClub++;
    else if (!club.known) unknownClubs.add(club.code);
    const code = club?.code ?? '';
    let build: string | null = null;
    for (let b = 0; b < buildIndexes.length; b++) {
      const part = (textOf(cells, buildIndexes[b]) ?? '').trim();
      if (part !== '') build = build === null ? part : `${build} / ${part}`;
    }
    if (build === null) build = buildByClub[code] ?? defaultBuild;

    const mask = derive(slots);
    if (mask !== 0) {
      for (let i = 0; i < slotCount; i++) {
        if ((mask & (1 << i)) !== 0 && !(slots[i] >= MIN[i] && slots[i] <= MAX[i])) {
          rejected.push({ row, line, column: SHOT_FIELDS[i], reason: `${checkLimit(SHOT_FIELDS[i], slots[i])} (derived)` });
          return;
        }
      }
    }
    let smashLimit = smashLimits.get(code);
    if (smashLimit === undefined) {
      smashLimit = smashFactorLimit(code)?.limit ?? Infinity;
      smashLimits.set(code, smashLimit);
    }
    if (slots[SMASH_SLOT] > smashLimit) {
      rejected.push({ row, line, column: smashHeader ?? undefined, reason: impactMisreadReason(code, slots[SMASH_SLOT])! });
      return;
    }
    let derived = derivedOf(mask);
    let finalValues = toValues(slots);
    if (fillFlight) {
      // Values the model computes never reject a row: a fill that falls outside the limits is
      // left out and the shot keeps what the file measured.
      const filled = fillFlight(finalValues);
      if (filled.derived.length > 0 && checkShotValues(filled.values) === null) {
        finalValues = filled.values;
        derived = [...derived, ...filled.derived.filter((f) => !derived.includes(f))];
      }
    }
    shots.push({ row, club: code, build, values: finalValues, derived });
  };

  // step mode: rows are handed over one at a time and not kept, which spares the collector
  const data = text.slice(detail.dataOffset);
  if (data.indexOf('"') === -1) {
    // No quote anywhere: cells cannot hold a delimiter or a line break, so a plain split reads
    // the rows exactly as papaparse's own fast mode does, without its per-row result objects.
    // Lines are read in place (offsets into the text) rather than split into strings.
    const newline = sniffed.newline;
    const delimiter = sniffed.delimiter;
    rowLine = data;
    for (let lineStart = 0; lineStart < data.length; ) {
      const lineBreak = data.indexOf(newline, lineStart);
      const lineEnd = lineBreak === -1 ? data.length : lineBreak;
      // Cell bounds without cutting the cells; an unusual row (blank, summary, ragged) is split.
      let count = 0;
      let pos = lineStart;
      for (;;) {
        let j = data.indexOf(delimiter, pos);
        if (j > lineEnd) j = -1;
        if (count === width) {
          count++;
          break;
        }
        starts[count] = pos;
        ends[count] = j === -1 ? lineEnd : j;
        count++;
        if (j === -1) break;
        pos = j + 1;
      }
      let first = 0;
      while (first < width && starts[first] === ends[first]) first++;
      const firstCode = first < width ? data.charCodeAt(starts[first]) : 32;
      const letter = ((firstCode | 32) >= 97 && (firstCode | 32) <= 122) || firstCode > 127;
      const plainRow =
        count === width && firstCode !== 32 && firstCode !== 9 && (!letter || !summary([data.slice(starts[first], ends[first])]));
      if (plainRow) onRow(null, null);
      else onRow(data.slice(lineStart, lineEnd).split(delimiter), null);
      if (lineBreak === -1) break;
      lineStart = lineBreak + newline.length;
    }
    if (/(\r\n|\n|\r)$/.test(data)) onRow([''], null); // as papaparse: the final break ends in an empty line
  } else {
    Papa.parse<string[]>(data, {
      delimiter: sniffed.delimiter,
      newline: sniffed.newline,
      header: false,
      dynamicTyping: false,
      skipEmptyLines: false,
      step: (results) => {
        const error = results.errors.length > 0 ? results.errors[0].message : null;
        onRow(results.data, error);
      },
    });
  }
  // the line break that ends the last line is not a blank line
  const last = skipped[skipped.length - 1];
  if (last && last.line === lastBlankLine && lastBlankLine === firstLine + r && /(\r\n|\n|\r)$/.test(text)) skipped.pop();

  if (rows === 0) throw new ImportError('NO_DATA_ROWS', 'The file has a header but no shot rows.');
  if (missingClub > 0 && clubIndex >= 0) {
    warnings.push({ code: 'MISSING_CLUB', message: `${missingClub} shot row(s) have no club.` });
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
    unknownClubs: [...unknownClubs],
  };
}
