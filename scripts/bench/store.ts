/**
 * Storing 100,000 shots: Ovalyard's shot store (one transaction, driver batch protocol, what a
 * bay-file commit does) against a raw multi-row INSERT of the same rows through the mariadb
 * driver. Runs on a throwaway private MariaDB.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import * as mariadb from 'mariadb';
import { Sequelize } from 'sequelize';
import { SHOT_FIELDS, type Shot } from '@/analysis/fields';
import { createSequelize } from '@/server/db';
import { migrateUp } from '@/server/migrate';
import { FIELD_COLUMNS, insertShots, derivedMask } from '@/server/services/shot-store';
import { freePort, startPrivateMariadb } from '../lib/private-mariadb';

function makeShots(n: number): Shot[] {
  const clubs = ['DR', '3W', '5W', '4H', '5I', '6I', '7I', '8I', '9I', 'PW', 'GW', 'SW', 'LW', 'PT'];
  const shots: Shot[] = new Array(n);
  let seed = 12345;
  const r = () => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
  for (let i = 0; i < n; i += 1) {
    const values: Shot['values'] = {};
    for (const f of SHOT_FIELDS) values[f] = 10 + 100 * r();
    shots[i] = { row: i + 1, club: clubs[i % clubs.length], build: `B${i % 3}`, values, derived: ['smashFactor'] };
  }
  return shots;
}

export async function benchStore(n = 100_000): Promise<{ ms: number; rawMs: number; ratio: number }> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'ovy-bench-'));
  const port = await freePort();
  const server = await startPrivateMariadb({ dataDir, port, database: 'bench', user: 'bench', password: 'bench-only' });
  const db = { host: '127.0.0.1', port, name: 'bench', user: 'bench', password: 'bench-only' };
  const sequelize: Sequelize = createSequelize(db);
  try {
    await migrateUp(sequelize);
    const [shop] = await sequelize.query("INSERT INTO shops (id, name, created_at, updated_at) VALUES (UUID(), 'bench', NOW(), NOW()) RETURNING id", { type: 'SELECT' as never }) as unknown as [{ id: string }];
    const [player] = await sequelize.query('INSERT INTO players (id, shop_id, name, handedness, created_at, updated_at) VALUES (UUID(), ?, \'p\', \'right\', NOW(), NOW()) RETURNING id', { replacements: [shop.id], type: 'SELECT' as never }) as unknown as [{ id: string }];
    const [fitting] = await sequelize.query('INSERT INTO fittings (id, shop_id, player_id, date, venue, remote, created_at, updated_at) VALUES (UUID(), ?, ?, \'2026-12-01\', \'indoor\', 0, NOW(), NOW()) RETURNING id', { replacements: [shop.id, player.id], type: 'SELECT' as never }) as unknown as [{ id: string }];
    const bayFile = async () => {
      const [b] = await sequelize.query("INSERT INTO bay_files (id, fitting_id, file_name, content_hash, raw_text, recipe, report, row_count, shot_count, created_at, updated_at) VALUES (UUID(), ?, 'x', SHA2(RAND(), 256), '', '{}', '{}', 0, 0, NOW(), NOW()) RETURNING id", { replacements: [fitting.id], type: 'SELECT' as never }) as unknown as [{ id: string }];
      return b.id;
    };
    const shots = makeShots(n);

    // Warm-up of both paths on a small set.
    const warm = await bayFile();
    await sequelize.transaction((t) => insertShots(t, warm, fitting.id, shots.slice(0, 2000)));

    const storeFile = await bayFile();
    let t0 = performance.now();
    await sequelize.transaction((t) => insertShots(t, storeFile, fitting.id, shots));
    const ms = performance.now() - t0;

    const rawFile = await bayFile();
    const conn = await mariadb.createConnection({ host: db.host, port: db.port, user: db.user, password: db.password, database: db.name });
    const columns = ['bay_file_id', 'fitting_id', 'row_number', 'club', 'build', ...FIELD_COLUMNS, 'derived_mask', 'decision'].map((c) => `\`${c}\``).join(', ');
    const perRow = `(${new Array(5 + FIELD_COLUMNS.length + 2).fill('?').join(', ')})`;
    const CHUNK = 2000;
    t0 = performance.now();
    await conn.beginTransaction();
    for (let start = 0; start < shots.length; start += CHUNK) {
      const part = shots.slice(start, start + CHUNK);
      const params: unknown[] = [];
      for (const s of part) {
        params.push(rawFile, fitting.id, s.row, s.club, s.build);
        for (const f of SHOT_FIELDS) params.push(s.values[f] ?? null);
        params.push(derivedMask(s.derived), null);
      }
      await conn.query(`INSERT INTO shots (${columns}) VALUES ${new Array(part.length).fill(perRow).join(', ')}`, params);
    }
    await conn.commit();
    const rawMs = performance.now() - t0;
    await conn.end();
    return { ms, rawMs, ratio: ms / rawMs };
  } finally {
    await sequelize.close();
    await server.stop();
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}
