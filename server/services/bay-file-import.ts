/**
 * The CPU-heavy part of a bay-file import, as one task: decode the upload, parse, map and
 * validate every row (analysis/import), fill flight fields, and pack the result for storing.
 * It runs in a worker thread (server/workers/import-worker.ts, through the pool in
 * import-pool.ts) so a large file never holds up other requests; the answer is plain data.
 */
import { createHash } from 'node:crypto';
import { SHOT_FIELDS, type Shot, type ShotValues } from '../../analysis/fields';
import { fillFlightFields, type Conditions } from '../../analysis/flight';
import { ImportError, importBayFile, type ImportResult, type Recipe } from '../../analysis/import';
import type { Hand } from '../../analysis/plain-words/handed-words';
import { derivedMask } from './shot-mask';
import type { BuildAssignment, ImportReport } from '../schemas';

export interface BayFileLimits {
  maxRows: number;
}

export interface ImportTask {
  /** The upload as sent (decoded in the worker) … */
  bytes?: Uint8Array;
  /** … or text already decoded (a stored file being re-mapped). */
  text?: string;
  recipe?: Recipe;
  builds: BuildAssignment;
  limits: BayFileLimits;
  /** The fitting's air and ground (filled totals roll on its ground). */
  air: Conditions;
  /** The player's hand: columns written for it (recipe `handed`) are turned round for a left-hander. */
  hand?: Hand;
  /** Whether the caller stores the shots (then they come packed in `table`). */
  store: boolean;
}

/** Every accepted shot of a file, column-wise: typed arrays and two short name lists. */
export interface ShotTable {
  count: number;
  rows: Int32Array;
  /** Index into `clubs` per shot. */
  clubIds: Int32Array;
  clubs: string[];
  /** Index into `builds` per shot, −1 for none. */
  buildIds: Int32Array;
  builds: string[];
  /** count × SHOT_FIELDS.length values, NaN where missing. */
  values: Float64Array;
  derivedMasks: Int32Array;
}

export interface ImportTaskResult {
  text: string;
  contentHash: string;
  sniff: ImportResult['sniff'];
  recipe: Recipe;
  suggestions: ImportResult['suggestions'];
  /** Guesses the fitter should confirm (a sign convention assumed, a unit inferred…). */
  ambiguous: ImportResult['ambiguous'];
  report: ImportReport;
  /** The first 25 shots, for the preview. */
  firstShots: Shot[];
  table: ShotTable | null;
}

/** A failure the caller answers with its status and code (HttpError on the main thread). */
export interface ImportTaskFailure {
  failed: { status: number; code: string; message: string };
}

export class ImportTaskError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
  ) {
    super(message);
  }
}

/**
 * Decodes an upload as text: UTF-16 with a byte-order mark, UTF-8 (BOM dropped), or
 * Windows-1252 when it is not valid UTF-8. Any other file with NUL bytes is not text.
 */
export function decodeUpload(bytes: Uint8Array): string {
  // Some spreadsheet programs save "Unicode text" as UTF-16 with a byte-order mark.
  if (bytes.length >= 2 && bytes[0] === 0xff && bytes[1] === 0xfe) return new TextDecoder('utf-16le').decode(bytes.subarray(2));
  if (bytes.length >= 2 && bytes[0] === 0xfe && bytes[1] === 0xff) return new TextDecoder('utf-16be').decode(bytes.subarray(2));
  if (bytes.includes(0)) throw new ImportTaskError(400, 'NOT_TEXT', 'This file is not a text (CSV) file. Export the session as CSV and try again.');
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    text = new TextDecoder('windows-1252').decode(bytes);
  }
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

function countLines(text: string): number {
  let n = 1;
  for (let i = text.indexOf('\n'); i !== -1; i = text.indexOf('\n', i + 1)) n += 1;
  return n;
}

export const contentHash = (text: string) => createHash('sha256').update(text).digest('hex');

function buildOptions(builds: BuildAssignment): { defaultBuild: string | null; buildByClub?: Record<string, string>; forceBuild?: string } {
  if (builds.mode === 'file') return { defaultBuild: null, forceBuild: builds.build };
  if (builds.mode === 'club') return { defaultBuild: null, buildByClub: builds.byClub };
  return { defaultBuild: builds.fallback ?? null };
}

/**
 * Runs the import library, mapping its errors to 400s a fitter can read. Shots with launch
 * conditions but no carry, total, offline, apex, descent or flight time get them from the
 * ball-flight model in the fitting's air and on its ground, marked as derived.
 */
export function runImport(text: string, recipe: Recipe | undefined, builds: BuildAssignment, limits: BayFileLimits, air: Conditions = {}, hand: Hand = 'right'): ImportResult {
  if (countLines(text) > limits.maxRows + 50) {
    throw new ImportTaskError(400, 'TOO_MANY_ROWS', `This file has more than ${limits.maxRows.toLocaleString('en')} rows, the most one import takes. Split it and import the parts.`);
  }
  const b = buildOptions(builds);
  try {
    const fillFlight = (values: ShotValues) => fillFlightFields(values, air);
    const result = importBayFile(text, { recipe, defaultBuild: b.defaultBuild, buildByClub: b.buildByClub, fillFlight, hand });
    if (b.forceBuild) for (const s of result.shots) s.build = b.forceBuild;
    if (result.rows > limits.maxRows) {
      throw new ImportTaskError(400, 'TOO_MANY_ROWS', `This file has ${result.rows.toLocaleString('en')} rows; one import takes at most ${limits.maxRows.toLocaleString('en')}.`);
    }
    return result;
  } catch (err) {
    if (err instanceof ImportError) throw new ImportTaskError(400, err.code, err.message);
    throw err;
  }
}

function groupsOf(shots: readonly Shot[]): ImportReport['groups'] {
  const counts = new Map<string, { club: string; build: string | null; n: number }>();
  for (const s of shots) {
    const key = `${s.club}\u0000${s.build ?? ''}`;
    const g = counts.get(key) ?? { club: s.club, build: s.build, n: 0 };
    g.n += 1;
    counts.set(key, g);
  }
  return [...counts.values()];
}

export function reportOf(result: ImportResult): ImportReport {
  return {
    rows: result.rows,
    imported: result.shots.length,
    rejected: result.rejected.slice(0, 1000),
    skipped: result.skipped.slice(0, 1000),
    warnings: result.warnings,
    unknownClubs: result.unknownClubs.slice(0, 1000),
    groups: groupsOf(result.shots),
  };
}

/** Packs shots column-wise (typed arrays copy between threads as plain memory). O(shots). */
export function packShots(shots: readonly Shot[]): ShotTable {
  const n = shots.length;
  const width = SHOT_FIELDS.length;
  const table: ShotTable = {
    count: n,
    rows: new Int32Array(n),
    clubIds: new Int32Array(n),
    clubs: [],
    buildIds: new Int32Array(n),
    builds: [],
    values: new Float64Array(n * width),
    derivedMasks: new Int32Array(n),
  };
  const clubIds = new Map<string, number>();
  const buildIds = new Map<string, number>();
  for (let i = 0; i < n; i++) {
    const s = shots[i];
    table.rows[i] = s.row;
    let c = clubIds.get(s.club);
    if (c === undefined) {
      c = table.clubs.push(s.club) - 1;
      clubIds.set(s.club, c);
    }
    table.clubIds[i] = c;
    if (s.build === null) table.buildIds[i] = -1;
    else {
      let b = buildIds.get(s.build);
      if (b === undefined) {
        b = table.builds.push(s.build) - 1;
        buildIds.set(s.build, b);
      }
      table.buildIds[i] = b;
    }
    for (let f = 0; f < width; f++) {
      const v = s.values[SHOT_FIELDS[f]];
      table.values[i * width + f] = v === undefined ? NaN : v;
    }
    table.derivedMasks[i] = derivedMask(s.derived);
  }
  return table;
}

/** The whole task: what preview shows, and for a commit the packed shots. */
export function runImportTask(task: ImportTask): ImportTaskResult | ImportTaskFailure {
  try {
    const text = task.text ?? decodeUpload(task.bytes ?? new Uint8Array());
    const result = runImport(text, task.recipe, task.builds, task.limits, task.air, task.hand);
    return {
      text: task.text !== undefined ? '' : text,
      contentHash: contentHash(text),
      sniff: result.sniff,
      recipe: result.recipe,
      suggestions: result.suggestions,
      ambiguous: result.ambiguous,
      report: reportOf(result),
      firstShots: result.shots.slice(0, 25),
      table: task.store ? packShots(result.shots) : null,
    };
  } catch (err) {
    if (err instanceof ImportTaskError) return { failed: { status: err.status, code: err.code, message: err.message } };
    throw err;
  }
}
