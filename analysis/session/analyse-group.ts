import { SHOT_FIELDS } from '@/analysis/fields';
import type { ShotField } from '@/analysis/fields';
import { DEFAULT_FAIRWAY_WIDTH_M, DEFAULT_GREEN_RADIUS_M } from '@/analysis/odds';
import { ovalFromMoments } from '@/analysis/ovals';
import { sampleCovariance2, summarizeInPlace } from '@/analysis/statistics';
import type { FieldSummary } from '@/analysis/statistics';
import { describeStray, findStrays, isShotKept } from '@/analysis/strays';
import type { StrayDecision, StrayShot, StrayValueFormatter } from '@/analysis/strays';
import type { GroupAnalysis, SessionStray } from './session-types';
import type { ShotColumns } from './shot-columns';

/** A group's analysis plus its kept shots (for the head-to-head and the ladder). */
export interface AnalysedGroup {
  analysis: GroupAnalysis;
  /** 1 where the shot counts in the statistics. */
  kept: Uint8Array;
  columns: ShotColumns;
}

/** Kept, finite values of a column into scratch; returns how many. */
function gatherKept(column: Float64Array, kept: Uint8Array, scratch: Float64Array): number {
  let m = 0;
  for (let j = 0; j < column.length; j++) {
    const v = column[j];
    if (kept[j] === 1 && v === v && v !== Infinity && v !== -Infinity) scratch[m++] = v;
  }
  return m;
}

/**
 * The strays of one group's columns (analysis/strays: misreads, mishits, shots for review). O(n).
 * @example groupStrays(shotColumns(shots)[0]) // => [{ row: 5, index: 4, kind: 'mishit', flags: […] }]
 */
export function groupStrays(columns: ShotColumns): StrayShot[] {
  const { fields, rows } = columns;
  return findStrays({
    rows,
    club: columns.club,
    carryM: fields.carry,
    smashFactor: columns.smashFactor,
    offlineM: fields.offline,
    ballSpeedMps: fields.ballSpeed,
    launchAngleDeg: fields.launchAngle,
  });
}

/**
 * One group's summaries, ovals and strays. Strays are found on all the group's shots (or given:
 * the strays of the measured shots when the figures were carried over to other conditions);
 * the fitter's decisions then override, and the statistics use the kept shots. A shot flagged
 * only for review stays in the figures unless dropped. O(n · fields).
 * @param scratch working space of at least 2 × the group's shots (reused across groups)
 * @param strays the group's strays when decided elsewhere, indexed as `columns`
 * @throws RangeError when level is not in (0, 1) and the group has an oval
 * @example analyseGroup(shotColumns(shots)[0], { level: 0.95, includeStrays: false, decisions: {} }).analysis.kept
 */
export function analyseGroup(
  columns: ShotColumns,
  options: { level: number; includeStrays: boolean; decisions: Record<number, StrayDecision>; formatValue?: StrayValueFormatter },
  scratch: Float64Array = new Float64Array(columns.rows.length * 2),
  strays?: readonly StrayShot[],
): AnalysedGroup {
  const n = columns.rows.length;
  const { fields, rows } = columns;
  const found = strays ?? groupStrays(columns);
  // 0 not flagged, 1 left out by default (misread, mishit), 2 for review only
  const flagged = new Uint8Array(n);
  for (const stray of found) flagged[stray.index] = stray.kind === 'review' ? 2 : 1;

  const kept = new Uint8Array(n);
  let keptCount = 0;
  for (let j = 0; j < n; j++) {
    const decision = options.decisions[rows[j]];
    if (isShotKept({ flagged: flagged[j] !== 0, reviewOnly: flagged[j] === 2, decision, includeStrays: options.includeStrays })) {
      kept[j] = 1;
      keptCount++;
    }
  }

  const listed: SessionStray[] = [];
  for (let j = 0; j < n; j++) {
    // Fitter drops of unflagged shots are listed too, so every left-out shot has its reason.
    if (flagged[j] === 0 && options.decisions[rows[j]] === 'drop') listed.push({ row: rows[j], kind: null, reason: 'Dropped by the fitter', inFigures: false });
  }
  for (const stray of found) {
    const decision = options.decisions[stray.row];
    const note = decision === 'keep' ? ' (kept by the fitter)' : decision === 'drop' ? ' (dropped by the fitter)' : '';
    listed.push({ row: stray.row, kind: stray.kind, reason: describeStray(stray, options.formatValue) + note, inFigures: kept[stray.index] === 1 });
  }
  listed.sort((a, b) => a.row - b.row);

  const values = scratch.length >= n ? scratch.subarray(0, n) : new Float64Array(n);
  const summaries: Partial<Record<ShotField, FieldSummary>> = {};
  for (const field of SHOT_FIELDS) {
    const column = fields[field];
    if (!column) continue;
    const m = gatherKept(column, kept, values);
    if (m > 0) summaries[field] = summarizeInPlace(values, m);
  }
  const smashCount = gatherKept(columns.smashFactor, kept, values);
  const smashFactor = smashCount > 0 ? summarizeInPlace(values, smashCount) : null;

  let oval: GroupAnalysis['oval'] = null;
  let predictionOval: GroupAnalysis['predictionOval'] = null;
  const offline = fields.offline;
  const carry = fields.carry;
  if (offline && carry) {
    const x = scratch.length >= 2 * n ? scratch.subarray(0, n) : new Float64Array(n);
    const y = scratch.length >= 2 * n ? scratch.subarray(n, 2 * n) : new Float64Array(n);
    let m = 0;
    for (let j = 0; j < n; j++) {
      const a = offline[j];
      const b = carry[j];
      if (kept[j] === 1 && Number.isFinite(a) && Number.isFinite(b)) {
        x[m] = a;
        y[m] = b;
        m++;
      }
    }
    if (m >= 3) {
      const moments = sampleCovariance2(x, y, m);
      oval = ovalFromMoments(moments, options.level, 'descriptive');
      predictionOval = ovalFromMoments(moments, options.level, 'prediction');
    }
  }

  return {
    analysis: {
      club: columns.club,
      build: columns.build,
      n,
      kept: keptCount,
      fields: summaries,
      smashFactor,
      oval,
      predictionOval,
      strays: listed,
      odds: { fairway: { widthM: DEFAULT_FAIRWAY_WIDTH_M, p: null }, green: { radiusM: DEFAULT_GREEN_RADIUS_M, carryM: null, p: null } },
    },
    kept,
    columns,
  };
}
