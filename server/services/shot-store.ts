/**
 * Shots in MariaDB: one row per shot, one DOUBLE column per canonical field (snake_case), the
 * derived fields as a bit mask in SHOT_FIELDS order. Inserts go through the mariadb driver's
 * batch protocol on the transaction's own connection: the whole file is one transaction, and
 * 100,000 rows store in about the time of a raw multi-row INSERT (npm run bench).
 */
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { SHOT_FIELDS, type Shot, type ShotField } from '../../analysis/fields';
import { packShots, type ShotTable } from './bay-file-import';
import { derivedMask } from './shot-mask';

export { derivedMask } from './shot-mask';

const snake = (s: string) => s.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);
export const FIELD_COLUMNS: readonly string[] = SHOT_FIELDS.map(snake);
const COLUMNS = ['bay_file_id', 'fitting_id', 'row_number', 'club', 'build', ...FIELD_COLUMNS, 'derived_mask', 'decision'];
// Column names are quoted: row_number is a reserved word in MariaDB.
const INSERT_SQL = `INSERT INTO shots (${COLUMNS.map((c) => `\`${c}\``).join(', ')}) VALUES (${COLUMNS.map(() => '?').join(', ')})`;
export const STORE_CHUNK = 5000;

interface DriverConnection {
  batch(sql: string, values: unknown[][]): Promise<unknown>;
}

export interface StoredShot extends Shot {
  id: number;
  bayFileId: string;
  decision: 'keep' | 'drop' | null;
}

function connectionOf(transaction: Transaction): DriverConnection {
  const conn = (transaction as unknown as { connection?: DriverConnection }).connection;
  if (!conn || typeof conn.batch !== 'function') throw new Error('shot store needs a mariadb transaction');
  return conn;
}

/**
 * Inserts the shots of one bay file inside a transaction, in chunks (the event loop runs between
 * chunks). Club and build names are stored as the import gives them (already cut to their
 * column lengths, analysis/import/import-limits.ts).
 * @param shots the shots, or the same packed column-wise by the import worker
 * @param decisions kept fitter decisions by row number (a re-mapped file keeps them)
 * @param afterChunk called after each chunk (tests inject failures here)
 */
export async function insertShots(
  transaction: Transaction,
  bayFileId: string,
  fittingId: string,
  shots: readonly Shot[] | ShotTable,
  decisions: ReadonlyMap<number, 'keep' | 'drop'> = new Map(),
  afterChunk?: (chunkIndex: number) => void | Promise<void>,
): Promise<void> {
  const conn = connectionOf(transaction);
  const table = 'count' in shots ? shots : packShots(shots);
  const width = SHOT_FIELDS.length;
  for (let start = 0, chunk = 0; start < table.count; start += STORE_CHUNK, chunk += 1) {
    const end = Math.min(table.count, start + STORE_CHUNK);
    const rows: unknown[][] = new Array(end - start);
    for (let i = start; i < end; i += 1) {
      const buildId = table.buildIds[i];
      const row: unknown[] = [bayFileId, fittingId, table.rows[i], table.clubs[table.clubIds[i]], buildId < 0 ? null : table.builds[buildId]];
      for (let f = 0; f < width; f++) {
        const v = table.values[i * width + f];
        row.push(Number.isFinite(v) ? v : null);
      }
      row.push(table.derivedMasks[i], decisions.get(table.rows[i]) ?? null);
      rows[i - start] = row;
    }
    await conn.batch(INSERT_SQL, rows);
    if (afterChunk) await afterChunk(chunk);
  }
}

type ShotRow = Record<string, unknown> & { id: number | string; bay_file_id: string; row_number: number; club: string; build: string | null; derived_mask: number; decision: 'keep' | 'drop' | null };

function toShot(r: ShotRow): StoredShot {
  const values: Shot['values'] = {};
  const derived: ShotField[] = [];
  SHOT_FIELDS.forEach((f, i) => {
    const v = r[FIELD_COLUMNS[i]];
    if (v !== null && v !== undefined) values[f] = Number(v);
    if (r.derived_mask & (1 << i)) derived.push(f);
  });
  return { id: Number(r.id), bayFileId: r.bay_file_id, row: r.row_number, club: r.club, build: r.build, values, derived, decision: r.decision };
}

/**
 * Every shot of a fitting, in file and row order: files by upload time, and files uploaded in the
 * same second by their shots' insertion order (ids rise along the rows of a file), never by the
 * files' random ids.
 */
export async function loadFittingShots(sequelize: Sequelize, fittingId: string): Promise<StoredShot[]> {
  const rows = await sequelize.query<ShotRow>(
    'SELECT s.* FROM shots s JOIN bay_files b ON b.id = s.bay_file_id WHERE s.fitting_id = ? ORDER BY b.created_at, s.id',
    { replacements: [fittingId], type: QueryTypes.SELECT },
  );
  return rows.map(toShot);
}

/** Shot counts of several fittings. */
export async function countShotsByFitting(sequelize: Sequelize, fittingIds: string[]): Promise<Map<string, number>> {
  if (fittingIds.length === 0) return new Map();
  const rows = await sequelize.query<{ fitting_id: string; n: number | bigint }>(
    'SELECT fitting_id, COUNT(*) AS n FROM shots WHERE fitting_id IN (?) GROUP BY fitting_id',
    { replacements: [fittingIds], type: QueryTypes.SELECT },
  );
  return new Map(rows.map((r) => [r.fitting_id, Number(r.n)]));
}

/** Kept decisions of a bay file, by row number. */
export async function decisionsOf(sequelize: Sequelize, bayFileId: string, transaction?: Transaction): Promise<Map<number, 'keep' | 'drop'>> {
  const rows = await sequelize.query<{ row_number: number; decision: 'keep' | 'drop' }>(
    'SELECT `row_number`, decision FROM shots WHERE bay_file_id = ? AND decision IS NOT NULL',
    { replacements: [bayFileId], type: QueryTypes.SELECT, transaction },
  );
  return new Map(rows.map((r) => [r.row_number, r.decision]));
}
