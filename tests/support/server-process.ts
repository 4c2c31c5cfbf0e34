/**
 * The real server as its own process (`node --import tsx server/index.ts`, as `npm start` runs
 * it) on a free loopback port, for fault tests: kill it, run two of them on one database.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { freePort } from '../../scripts/lib/private-mariadb';
import type { Config } from '@/server/config';

export interface ServerProcess {
  url: string;
  child: ChildProcess;
  /** Resolves when the process has exited. */
  exited: Promise<number | null>;
  /** Stops it: SIGTERM by default, SIGKILL for a crash. */
  stop: (signal?: NodeJS.Signals) => Promise<void>;
  output: () => string;
}

export async function startServerProcess(db: Config['db'], env: Record<string, string> = {}): Promise<ServerProcess> {
  const port = await freePort();
  const root = path.resolve(__dirname, '../..');
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: root,
    env: {
      ...process.env,
      NODE_ENV: 'test',
      HOST: '127.0.0.1',
      PORT: String(port),
      DB_HOST: db.host,
      DB_PORT: String(db.port),
      DB_NAME: db.name,
      DB_USER: db.user,
      DB_PASSWORD: db.password,
      JWT_SECRET: 'process-secret-process-secret-0000000',
      SERVE_WEB: '0',
      SIGN_IN_LIMIT: '10000',
      UPLOAD_MAX_ROWS: '200000',
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let out = '';
  child.stdout!.on('data', (d) => (out += String(d)));
  child.stderr!.on('data', (d) => (out += String(d)));
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
  const deadline = Date.now() + 60_000;
  while (!out.includes('Ovalyard is running at')) {
    if (child.exitCode !== null) throw new Error(`the server process exited: ${out}`);
    if (Date.now() > deadline) {
      child.kill('SIGKILL');
      throw new Error(`the server process did not start within 60 s: ${out}`);
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  return {
    url: `http://127.0.0.1:${port}`,
    child,
    exited,
    stop: async (signal = 'SIGTERM') => {
      if (child.exitCode === null && child.signalCode === null) child.kill(signal);
      await exited;
    },
    output: () => out,
  };
}
