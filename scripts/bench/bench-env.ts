/**
 * What the load figures of `npm run bench` run against: a throwaway private MariaDB on a free
 * loopback port with an invented shop (owner, player, one fitting), and the bench server
 * (scripts/bench/api-server.ts) started on another free port with 1 or more processes.
 * Everything is removed afterwards.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { buildFitting, buildPlayer, buildShop, buildUser, TEST_PASSWORD } from '../../fixtures/builders';
import { createSequelize } from '@/server/db';
import { migrateUp } from '@/server/migrate';
import { freePort, startPrivateMariadb } from '../lib/private-mariadb';

const ROOT = path.resolve(__dirname, '../..');

export interface BenchServer {
  url: string;
  workers: number;
  stop: () => Promise<void>;
}

export interface BenchEnv {
  tmpDir: string;
  ownerEmail: string;
  password: string;
  fittingId: string;
  /** Starts the bench server (serving dist/ too when web is set). */
  startServer: (options: { workers: number; web?: boolean; env?: Record<string, string>; nodeArgs?: string[] }) => Promise<BenchServer>;
  stop: () => Promise<void>;
}

async function waitForHealth(url: string, child: ChildProcess, log: string[]): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`bench server exited (${child.exitCode}):\n${log.join('')}`);
    try {
      const r = await fetch(`${url}/api/health`);
      if (r.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`bench server did not answer within 60 s:\n${log.join('')}`);
}

export async function startBenchEnv(): Promise<BenchEnv> {
  const tmpDir = fs.mkdtempSync(path.join(os.tmpdir(), 'ovy-bench-api-'));
  const dbPort = await freePort();
  const password = 'bench-only-password';
  const mariadb = await startPrivateMariadb({ dataDir: path.join(tmpDir, 'db'), port: dbPort, database: 'bench', user: 'bench', password });
  const db = { host: '127.0.0.1', port: dbPort, name: 'bench', user: 'bench', password };
  const sequelize = createSequelize(db);
  let owner: { email: string };
  let fittingId: string;
  try {
    await migrateUp(sequelize);
    const shop = await buildShop('Bench shop (invented)');
    owner = await buildUser(shop, 'owner');
    const player = await buildPlayer(shop);
    fittingId = (await buildFitting(shop, player, null)).id;
  } finally {
    await sequelize.close();
  }
  const servers = new Set<ChildProcess>();

  const startServer: BenchEnv['startServer'] = async ({ workers, web = false, env = {}, nodeArgs = [] }) => {
    const port = await freePort();
    const log: string[] = [];
    const child = spawn(process.execPath, [...nodeArgs, '--import', 'tsx', path.join(ROOT, 'scripts/bench/api-server.ts')], {
      cwd: ROOT,
      stdio: ['ignore', 'pipe', 'pipe'],
      env: {
        ...process.env,
        NODE_ENV: 'production',
        HOST: '127.0.0.1',
        PORT: String(port),
        APP_URL: `http://127.0.0.1:${port}`,
        DB_HOST: '127.0.0.1',
        DB_PORT: String(dbPort),
        DB_NAME: 'bench',
        DB_USER: 'bench',
        DB_PASSWORD: password,
        JWT_SECRET: 'bench-only-secret-bench-only-secret-0000',
        COOKIE_SECURE: '0',
        SIGN_IN_LIMIT: '100000',
        UPLOAD_MAX_BYTES: String(64 * 1024 * 1024),
        WORKERS: String(workers),
        SERVE_WEB: web ? '1' : '0',
        WEB_DIST: path.join(ROOT, 'dist'),
        BENCH_FLOOR_FILE: path.join(tmpDir, 'floor.json'),
        ...env,
      },
    });
    child.stdout?.on('data', (d: Buffer) => log.push(d.toString()));
    child.stderr?.on('data', (d: Buffer) => log.push(d.toString()));
    servers.add(child);
    const url = `http://127.0.0.1:${port}`;
    await waitForHealth(url, child, log);
    return {
      url,
      workers,
      stop: async () => {
        if (child.exitCode === null) {
          const exited = new Promise((r) => child.once('exit', r));
          child.kill('SIGTERM');
          await Promise.race([exited, new Promise((r) => setTimeout(r, 10_000))]);
          if (child.exitCode === null) child.kill('SIGKILL');
        }
        servers.delete(child);
      },
    };
  };

  return {
    tmpDir,
    ownerEmail: owner.email,
    password: TEST_PASSWORD,
    fittingId,
    startServer,
    stop: async () => {
      for (const child of servers) if (child.exitCode === null) child.kill('SIGKILL');
      await mariadb.stop();
      fs.rmSync(tmpDir, { recursive: true, force: true });
    },
  };
}

/** Signs in through the API; returns the Cookie header value. */
export async function signInCookie(url: string, email: string, password: string): Promise<string> {
  const r = await fetch(`${url}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', 'x-ovalyard-request': '1' },
    body: JSON.stringify({ email, password }),
  });
  if (!r.ok) throw new Error(`bench sign-in failed: ${r.status} ${await r.text()}`);
  const cookie = r.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  if (!cookie) throw new Error('bench sign-in set no cookie');
  return cookie;
}

/** Commits a bay file through the API; returns the time it took. */
export async function commitBayFile(url: string, cookie: string, fittingId: string, name: string, text: string): Promise<number> {
  const form = new FormData();
  form.append('file', new Blob([text], { type: 'text/csv' }), name);
  const started = performance.now();
  const r = await fetch(`${url}/api/fittings/${fittingId}/bay-files`, {
    method: 'POST',
    headers: { cookie, 'x-ovalyard-request': '1' },
    body: form,
  });
  const ms = performance.now() - started;
  if (r.status !== 201) throw new Error(`bench import of ${name} failed: ${r.status} ${(await r.text()).slice(0, 500)}`);
  return ms;
}
