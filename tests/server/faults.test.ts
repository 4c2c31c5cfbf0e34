/**
 * Faults, with the real server in its own process: killed (SIGKILL) during a large commit, the
 * commit is whole or absent; the database killed and restarted during writes, no acknowledged
 * write is lost and the API recovers without a restart; two API processes on one database
 * importing at once lose and double nothing and never answer 5xx.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { QueryTypes, type Sequelize } from 'sequelize';
import { buildFitting, buildShopWorld, TEST_PASSWORD } from '@/fixtures/builders';
import { generateBayFile } from '@/scripts/bench/import';
import { freePort, startPrivateMariadb, type RunningMariadb } from '../../scripts/lib/private-mariadb';
import type { Config } from '@/server/config';
import { startServerProcess, type ServerProcess } from '../support/server-process';
import { createTestDatabase } from '../support/test-db';

jest.setTimeout(240_000);

let sequelize: Sequelize;
let db: Config['db'];
let drop: () => Promise<void>;
let world: Awaited<ReturnType<typeof buildShopWorld>>;
beforeAll(async () => {
  ({ sequelize, db, drop } = await createTestDatabase());
  world = await buildShopWorld();
});
afterAll(async () => {
  await drop();
});

async function signIn(url: string, email: string, password = TEST_PASSWORD): Promise<string> {
  const res = await fetch(`${url}/api/auth/sign-in`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password }) });
  if (res.status !== 200) throw new Error(`sign-in ${res.status}`);
  return /ovy_session=([^;]+)/.exec(res.headers.get('set-cookie') ?? '')![1];
}

function commit(url: string, token: string, fittingId: string, text: string, name = 'session.csv'): Promise<Response> {
  const form = new FormData();
  form.append('options', '{}');
  form.append('file', new Blob([text], { type: 'text/csv' }), name);
  return fetch(`${url}/api/fittings/${fittingId}/bay-files`, { method: 'POST', headers: { authorization: `Bearer ${token}` }, body: form });
}

async function one(sql: string, replacements: unknown[] = []): Promise<number> {
  const [row] = await sequelize.query<{ n: number }>(sql, { replacements, type: QueryTypes.SELECT });
  return Number(row.n);
}

/** Every file's shots are all there, and no shot is without its file. */
async function assertWholeOrAbsent(fittingId: string): Promise<void> {
  const files = await sequelize.query<{ id: string; shot_count: number }>('SELECT id, shot_count FROM bay_files WHERE fitting_id = ?', { replacements: [fittingId], type: QueryTypes.SELECT });
  for (const f of files) expect(await one('SELECT COUNT(*) AS n FROM shots WHERE bay_file_id = ?', [f.id])).toBe(Number(f.shot_count));
  expect(await one('SELECT COUNT(*) AS n FROM shots s LEFT JOIN bay_files b ON b.id = s.bay_file_id WHERE b.id IS NULL')).toBe(0);
}

describe('the server killed during a large commit', () => {
  it('leaves the commit whole or absent, never part of it', async () => {
    const server = await startServerProcess(db);
    try {
      const fitting = await buildFitting(world.shop, world.player, world.fitter);
      const token = await signIn(server.url, world.fitter.email);
      const pending = commit(server.url, token, fitting.id, generateBayFile(60_000)).catch(() => null);
      // wait until the commit's transaction has written shots, then kill the process outright
      const deadline = Date.now() + 120_000;
      while (Date.now() < deadline) {
        if ((await one('SELECT COUNT(*) AS n FROM information_schema.INNODB_TRX WHERE trx_rows_modified > 5000')) > 0) break;
        if ((await one('SELECT COUNT(*) AS n FROM bay_files WHERE fitting_id = ?', [fitting.id])) > 0) break;
        await new Promise((r) => setTimeout(r, 20));
      }
      await server.stop('SIGKILL');
      await pending;
      // the database rolls back the dead connection's transaction
      const until = Date.now() + 30_000;
      while ((await one('SELECT COUNT(*) AS n FROM information_schema.INNODB_TRX')) > 0 && Date.now() < until) await new Promise((r) => setTimeout(r, 100));
      const files = await one('SELECT COUNT(*) AS n FROM bay_files WHERE fitting_id = ?', [fitting.id]);
      expect(files === 0 || files === 1).toBe(true);
      await assertWholeOrAbsent(fitting.id);
    } finally {
      await server.stop('SIGKILL');
    }
  });
});

describe('two API processes on one database', () => {
  it('importing into one fitting at once: every file stored once, no shot lost or doubled, no 5xx', async () => {
    const a = await startServerProcess(db);
    const b = await startServerProcess(db);
    try {
      const fitting = await buildFitting(world.shop, world.player, world.fitter);
      const tokens = [await signIn(a.url, world.fitter.email), await signIn(b.url, world.owner.email)];
      const urls = [a.url, b.url];
      const file = (i: number) => generateBayFile(300 + i * 37);
      const sends = Array.from({ length: 8 }, (_, i) => commit(urls[i % 2], tokens[i % 2], fitting.id, file(i), `s${i}.csv`));
      // and one file sent through both processes at the same moment
      const same = generateBayFile(333);
      sends.push(commit(a.url, tokens[0], fitting.id, same), commit(b.url, tokens[1], fitting.id, same));
      const answers = await Promise.all(sends);
      const statuses = answers.map((r) => r.status);
      expect(statuses.filter((s) => s >= 500)).toEqual([]);
      expect(statuses.slice(0, 8)).toEqual([201, 201, 201, 201, 201, 201, 201, 201]);
      expect(statuses.slice(8).sort()).toEqual([201, 409]);
      const bodies = await Promise.all(answers.map((r) => r.json() as Promise<{ shotCount?: number }>));
      const stored = bodies.reduce((sum, body, i) => sum + (statuses[i] === 201 ? body.shotCount! : 0), 0);
      expect(await one('SELECT COUNT(*) AS n FROM bay_files WHERE fitting_id = ?', [fitting.id])).toBe(9);
      expect(await one('SELECT COUNT(*) AS n FROM shots WHERE fitting_id = ?', [fitting.id])).toBe(stored);
      await assertWholeOrAbsent(fitting.id);
    } finally {
      await a.stop('SIGKILL');
      await b.stop('SIGKILL');
    }
  });
});

describe('the database restarted during writes', () => {
  let dataDir: string;
  let maria: RunningMariadb;
  let server: ServerProcess | undefined;
  const settings = { database: 'ovalyard_fault', user: 'ovalyard_fault', password: 'fault-test-password' };

  beforeAll(async () => {
    dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'ovy-fault-'));
    maria = await startPrivateMariadb({ dataDir, port: await freePort(), ...settings });
  });
  afterAll(async () => {
    await server?.stop('SIGKILL');
    await maria.stop();
    fs.rmSync(dataDir, { recursive: true, force: true });
  });

  it('loses no acknowledged write, answers 503 (never 500) while it is down, and recovers without a restart', async () => {
    const dbSettings = { host: '127.0.0.1', port: maria.port, name: maria.database, user: maria.user, password: maria.password };
    server = await startServerProcess(dbSettings, { DEMO_SEED: '1' });
    const token = await signIn(server.url, 'oskar@larchmere.example', 'ovalyard-demo');
    const headers = { authorization: `Bearer ${token}`, 'content-type': 'application/json' };
    const acknowledged: string[] = [];
    const statuses: number[] = [];
    let restarted = false;
    const writer = (async () => {
      for (let i = 0; i < 400 && !(restarted && acknowledged.length > 0 && statuses.length > 60 && statuses.slice(-5).every((s) => s === 201)); i++) {
        try {
          const res = await fetch(`${server!.url}/api/players`, { method: 'POST', headers, body: JSON.stringify({ name: `Fault player ${i}` }) });
          statuses.push(res.status);
          if (res.status === 201) acknowledged.push(((await res.json()) as { id: string }).id);
          else await res.text();
        } catch {
          statuses.push(0);
        }
        await new Promise((r) => setTimeout(r, 25));
      }
    })();
    while (acknowledged.length < 10) await new Promise((r) => setTimeout(r, 20));
    process.kill(maria.pid, 'SIGKILL'); // the database dies mid-write
    await new Promise((r) => setTimeout(r, 500));
    maria = await startPrivateMariadb({ dataDir, port: maria.port, ...settings });
    restarted = true;
    await writer;
    expect(statuses.filter((s) => s >= 500 && s !== 503)).toEqual([]);
    expect(statuses.slice(-5)).toEqual([201, 201, 201, 201, 201]); // writes work again, same process
    const health = await fetch(`${server.url}/api/health`);
    expect(health.status).toBe(200);
    for (const id of acknowledged) {
      const res = await fetch(`${server.url}/api/players/${id}`, { headers });
      expect(res.status).toBe(200);
    }
  });
});
