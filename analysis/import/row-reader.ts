/**
 * Reading one split row of a bay file: a shot in canonical units, a rejected row with its number,
 * column and reason, or a skipped line (blank, summary). The reader keeps what it has read; the
 * rows themselves are not kept.
 */
import { SHOT_FIELDS, type Shot, type ShotField, type ShotValues } from '@/analysis/fields';
import { parseClubName } from './club-name';
import type { ColumnPlan } from './column-plans';
import { deriveSlotsInPlace, derivedFields } from './derive-fields';
import { cutName, MAX_BUILD_CHARS, MAX_CLUB_CHARS } from './import-limits';
import { newCellState, quickDecimal, quickDecimalRange } from './number-format';
import { isBlankRow, isSummaryRow } from './row-kinds';
import { checkLimit, checkShotValues, SHOT_LIMITS } from './shot-limits';
import { smashFactorLimit } from '@/analysis/physics';
import { impactMisreadReason } from './impact-check';
import { newSlots, SLOT, SLOT_COUNT, valuesFromSlots } from './shot-slots';
import type { RowBounds, RowHandler } from './split-rows';

export interface RejectedRow {
  /** 1-based data row number (as Shot.row). */
  row: number;
  /** 1-based line number in the file (a quoted cell that spans lines shifts later numbers). */
  line: number;
  column?: string;
  reason: string;
}

export interface RowReaderOptions {
  plans: readonly ColumnPlan[];
  /** Cells of a well-formed row. */
  width: number;
  /** 1-based line number of the first data row. */
  firstLine: number;
  decimal: '.' | ',';
  /** Column of the club, or −1. */
  clubIndex: number;
  buildIndexes: readonly number[];
  defaultClub: { code: string; known: boolean } | null;
  buildByClub: Record<string, string>;
  defaultBuild: string | null;
  fillFlight?: (values: ShotValues) => { values: ShotValues; derived: ShotField[] };
  /** The bounds splitRows fills for rows handed over without cells. */
  bounds: RowBounds;
}

/** What a reader has read so far. */
export interface RowsRead {
  rows: number;
  shots: Shot[];
  rejected: RejectedRow[];
  skipped: { line: number; reason: string }[];
  unknownClubs: Set<string>;
  /** Shot rows with no club although the file has a club column. */
  missingClub: number;
  /** Names cut to MAX_CLUB_CHARS / MAX_BUILD_CHARS. */
  shortenedNames: number;
  /** Line of the last blank line, and of the last row read. */
  lastBlankLine: number;
  lastLine: number;
}

const MIN = SHOT_FIELDS.map((f) => SHOT_LIMITS[f].min);
const MAX = SHOT_FIELDS.map((f) => SHOT_LIMITS[f].max);
const SMASH_SLOT = SLOT.smashFactor;

/**
 * A row handler for splitRows and what it reads. O(mapped columns) a row.
 * @example const { onRow, read } = createRowReader(options); splitRows(data, split, options.bounds, onRow); read.shots
 */
export function createRowReader(options: RowReaderOptions): { onRow: RowHandler; read: RowsRead } {
  const { plans, width, firstLine, clubIndex, buildIndexes, defaultClub, buildByClub, defaultBuild, fillFlight, bounds } = options;
  const read: RowsRead = { rows: 0, shots: [], rejected: [], skipped: [], unknownClubs: new Set(), missingClub: 0, shortenedNames: 0, lastBlankLine: -1, lastLine: firstLine - 1 };
  const { shots, rejected, skipped, unknownClubs } = read;
  const state = newCellState();
  const clubCache = new Map<string, { code: string; known: boolean }>();
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
  const decimalCode = options.decimal.charCodeAt(0);
  const { starts, ends } = bounds;
  const smashHeader = plans.find((p) => p.field === 'smashFactor')?.header;
  // the impact bound on smash factor per club code (a misread is rejected; see impact-check.ts)
  const smashLimits = new Map<string, number>();
  const cellOf = (cells: string[] | null, i: number): string => (cells !== null ? cells[i] : bounds.line.slice(starts[i], ends[i]));
  const clubOf = (name: string) => {
    const parsed = parseClubName(name);
    const code = cutName(parsed.code, MAX_CLUB_CHARS);
    if (code.length < parsed.code.length) read.shortenedNames++;
    return { code, known: parsed.known };
  };

  const onRow: RowHandler = (cells, splitError) => {
    const line = ++read.lastLine;
    if (cells !== null && ((cells.length === 1 && cells[0] === '') || blank(cells))) {
      skipped.push({ line, reason: 'blank line' });
      read.lastBlankLine = line;
      return;
    }
    if (cells !== null && summary(cells)) {
      skipped.push({ line, reason: 'summary row' });
      return;
    }
    const row = ++read.rows;
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
      let v = plan.plain ? (cells !== null ? fast(cells[k], decimalCode) : fastRange(bounds.line, starts[k], ends[k], decimalCode)) : NaN;
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
      canonical *= plan.sign;
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
      const name = cellOf(cells, clubIndex) ?? '';
      const cached = clubCache.get(name);
      if (cached !== undefined) club = cached;
      else if (name.trim() !== '') {
        club = clubOf(name);
        clubCache.set(name, club);
      }
    }
    if (club === null) read.missingClub++;
    else if (!club.known) unknownClubs.add(club.code);
    const code = club?.code ?? '';
    let build: string | null = null;
    for (let b = 0; b < buildIndexes.length; b++) {
      const part = (cellOf(cells, buildIndexes[b]) ?? '').trim();
      if (part !== '') build = build === null ? part : `${build} / ${part}`;
    }
    if (build === null) build = buildByClub[code] ?? defaultBuild;
    if (build !== null && build.length > MAX_BUILD_CHARS) {
      build = cutName(build, MAX_BUILD_CHARS);
      read.shortenedNames++;
    }

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
      rejected.push({ row, line, column: smashHeader, reason: impactMisreadReason(code, slots[SMASH_SLOT])! });
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
  return { onRow, read };
}
