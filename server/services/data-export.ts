/**
 * Everything a shop holds (or everything it holds about one player) as a zip of one JSON and
 * one CSV file per table, streamed: each table is read a page at a time (keyset on its key
 * column) only when the zip reaches it, so memory stays bounded by a page whatever the size.
 * CSV cells go through csvLine (formulas neutralised, RFC 4180 quoting). Secrets (password
 * and link hashes) are left out.
 */
import type { Archiver, ArchiverOptions } from 'archiver';
import archiverModule = require('archiver');
import { Readable, type Writable } from 'node:stream';
import { QueryTypes, type Sequelize } from 'sequelize';
import { csvLine } from '@/analysis/export/csv-cell';

interface TableSpec {
  /** The file name (the table's). */
  name: string;
  /** SELECT … FROM … WHERE … with `?` for the scope id, the table aliased t. */
  from: string;
  /** A unique column of t to page by. */
  key: string;
  /** Rows per page (small for tables with big text). */
  page: number;
  omit?: readonly string[];
}

const SECRET = ['password_hash', 'token_hash', 'token_version'];

const viaFitting = (table: string, scope: string) => `SELECT t.* FROM ${table} t JOIN fittings f ON f.id = t.fitting_id WHERE ${scope}`;

/** A shop's tables; the scope id is the shop's. */
export const SHOP_TABLES: readonly TableSpec[] = [
  { name: 'shops', from: 'SELECT t.* FROM shops t WHERE t.id = ?', key: 'id', page: 1 },
  { name: 'users', from: 'SELECT t.* FROM users t WHERE t.shop_id = ?', key: 'id', page: 500, omit: SECRET },
  { name: 'players', from: 'SELECT t.* FROM players t WHERE t.shop_id = ?', key: 'id', page: 500 },
  { name: 'fittings', from: 'SELECT t.* FROM fittings t WHERE t.shop_id = ?', key: 'id', page: 500 },
  { name: 'bay_files', from: viaFitting('bay_files', 'f.shop_id = ?'), key: 'id', page: 2 },
  { name: 'shots', from: viaFitting('shots', 'f.shop_id = ?'), key: 'id', page: 2000 },
  { name: 'builds', from: viaFitting('builds', 'f.shop_id = ?'), key: 'id', page: 500 },
  { name: 'recipes', from: 'SELECT t.* FROM recipes t WHERE t.shop_id = ?', key: 'id', page: 200 },
  { name: 'shop_margins', from: 'SELECT t.* FROM shop_margins t WHERE t.shop_id = ?', key: 'shop_id', page: 1 },
  { name: 'workshop_settings', from: 'SELECT t.* FROM workshop_settings t WHERE t.shop_id = ?', key: 'shop_id', page: 1 },
  { name: 'bag_clubs', from: 'SELECT t.* FROM bag_clubs t WHERE t.shop_id = ?', key: 'id', page: 500 },
  { name: 'bag_club_history', from: 'SELECT t.* FROM bag_club_history t WHERE t.shop_id = ?', key: 'id', page: 500 },
  { name: 'chosen_builds', from: viaFitting('chosen_builds', 'f.shop_id = ?'), key: 'id', page: 500 },
  { name: 'chosen_take_outs', from: viaFitting('chosen_take_outs', 'f.shop_id = ?'), key: 'id', page: 500 },
  { name: 'chosen_build_confirmations', from: viaFitting('chosen_build_confirmations', 'f.shop_id = ?'), key: 'fitting_id', page: 500 },
  { name: 'spec_sheets', from: 'SELECT t.* FROM spec_sheets t WHERE t.shop_id = ?', key: 'id', page: 20 },
  { name: 'invitations', from: 'SELECT t.* FROM invitations t WHERE t.shop_id = ?', key: 'id', page: 500, omit: SECRET },
  { name: 'fitting_course_steps', from: 'SELECT t.* FROM fitting_course_steps t WHERE t.shop_id = ?', key: 'id', page: 500 },
  { name: 'fitting_intakes', from: 'SELECT t.* FROM fitting_intakes t WHERE t.shop_id = ?', key: 'fitting_id', page: 500 },
  { name: 'fitting_messages', from: 'SELECT t.* FROM fitting_messages t WHERE t.shop_id = ?', key: 'id', page: 500 },
  { name: 'shop_request_links', from: 'SELECT t.* FROM shop_request_links t WHERE t.shop_id = ?', key: 'shop_id', page: 1 },
  // fitting_message_reads (who read up to where) are markers, not data: left out.
];

/** One player's records; the scope id is the player's. */
export const PLAYER_TABLES: readonly TableSpec[] = [
  { name: 'person', from: 'SELECT t.* FROM players t WHERE t.id = ?', key: 'id', page: 1 },
  { name: 'sign_in', from: 'SELECT t.id, t.email, t.name, t.units, t.created_at FROM users t JOIN players p ON p.user_id = t.id WHERE p.id = ?', key: 'id', page: 1 },
  { name: 'fittings', from: 'SELECT t.* FROM fittings t WHERE t.player_id = ?', key: 'id', page: 500 },
  { name: 'bay_files', from: viaFitting('bay_files', 'f.player_id = ?'), key: 'id', page: 2 },
  { name: 'shots', from: viaFitting('shots', 'f.player_id = ?'), key: 'id', page: 2000 },
  { name: 'builds', from: viaFitting('builds', 'f.player_id = ?'), key: 'id', page: 500 },
  { name: 'chosen_builds', from: viaFitting('chosen_builds', 'f.player_id = ?'), key: 'id', page: 500 },
  { name: 'bag_clubs', from: 'SELECT t.* FROM bag_clubs t WHERE t.player_id = ?', key: 'id', page: 500 },
  { name: 'bag_club_history', from: 'SELECT t.* FROM bag_club_history t WHERE t.player_id = ?', key: 'id', page: 500 },
  { name: 'spec_sheets', from: 'SELECT t.* FROM spec_sheets t WHERE t.player_id = ?', key: 'id', page: 20 },
  { name: 'fitting_course_steps', from: viaFitting('fitting_course_steps', 'f.player_id = ?'), key: 'id', page: 500 },
  { name: 'fitting_intakes', from: viaFitting('fitting_intakes', 'f.player_id = ?'), key: 'fitting_id', page: 500 },
  { name: 'fitting_messages', from: viaFitting('fitting_messages', 'f.player_id = ?'), key: 'id', page: 500 },
];

type Row = Record<string, unknown>;

// archiver 7 (installed) exports a function; @types/archiver 8 describes version 8's classes.
const archiver = archiverModule as unknown as (format: 'zip', options?: ArchiverOptions) => Archiver;

/** A database value as JSON can hold it (BIGINT as a number when safe, dates as ISO text). */
function plain(value: unknown): string | number | boolean | null {
  if (value == null) return null;
  if (typeof value === 'bigint') return Number.isSafeInteger(Number(value)) ? Number(value) : value.toString();
  if (value instanceof Date) return value.toISOString();
  if (Buffer.isBuffer(value)) return value.toString('base64');
  if (typeof value === 'number' || typeof value === 'boolean' || typeof value === 'string') return value;
  return String(value);
}

/** The table's rows a page at a time, secrets left out. */
async function* pages(sequelize: Sequelize, spec: TableSpec, scopeId: string): AsyncGenerator<Row[]> {
  let after: unknown = null;
  for (;;) {
    const sql = `${spec.from} AND (? IS NULL OR t.${spec.key} > ?) ORDER BY t.${spec.key} LIMIT ${spec.page}`;
    const rows = await sequelize.query<Row>(sql, { replacements: [scopeId, after, after], type: QueryTypes.SELECT });
    if (rows.length === 0) return;
    after = rows[rows.length - 1][spec.key];
    yield rows.map((row) => {
      const out: Row = {};
      for (const [k, v] of Object.entries(row)) if (!spec.omit?.includes(k)) out[k] = plain(v);
      return out;
    });
    if (rows.length < spec.page) return;
  }
}

async function* jsonText(sequelize: Sequelize, spec: TableSpec, scopeId: string): AsyncGenerator<string> {
  let first = true;
  yield '[';
  for await (const rows of pages(sequelize, spec, scopeId)) {
    let chunk = '';
    for (const row of rows) {
      chunk += `${first ? '' : ','}\n${JSON.stringify(row)}`;
      first = false;
    }
    yield chunk;
  }
  yield '\n]\n';
}

async function* csvText(sequelize: Sequelize, spec: TableSpec, scopeId: string): AsyncGenerator<string> {
  let columns: string[] | null = null;
  for await (const rows of pages(sequelize, spec, scopeId)) {
    let chunk = '';
    if (!columns) {
      columns = Object.keys(rows[0]);
      chunk += `${csvLine(columns)}\r\n`;
    }
    for (const row of rows) chunk += `${csvLine(columns.map((c) => row[c] as string | number | null))}\r\n`;
    yield chunk;
  }
}

const README = [
  'Ovalyard export',
  '',
  'One JSON file and one CSV file per table, with the same rows. Column names are the database’s.',
  'Measures are in the canonical units: speeds in m/s, distances and heights in m (height_cm and',
  'wrist_to_floor_cm in cm), angles in degrees, spin in rpm, time in s, temperatures in °C.',
  'Offline, launch direction, club path, face angle, spin axis and side spin: + is right.',
  'CSV cells that would start like a spreadsheet formula begin with an apostrophe.',
  '',
].join('\r\n');

/**
 * Writes the zip of these tables to `out` (an HTTP response); resolves when it is finished.
 * @throws what the database or the stream throws (the response is then cut short)
 */
export async function writeExportZip(sequelize: Sequelize, tables: readonly TableSpec[], scopeId: string, out: Writable): Promise<void> {
  const archive = archiver('zip', { zlib: { level: 6 } });
  const done = new Promise<void>((resolve, reject) => {
    archive.on('error', reject);
    out.on('error', reject);
    out.on('close', resolve);
    out.on('finish', resolve);
  });
  archive.pipe(out);
  archive.append(README, { name: 'README.txt' });
  for (const spec of tables) {
    archive.append(Readable.from(jsonText(sequelize, spec, scopeId)), { name: `json/${spec.name}.json` });
    archive.append(Readable.from(csvText(sequelize, spec, scopeId)), { name: `csv/${spec.name}.csv` });
  }
  await archive.finalize();
  await done;
}
