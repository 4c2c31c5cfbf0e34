/**
 * The body of `npm start` (after npm ci): private MariaDB in .data/mariadb, web build, server.
 */
import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { startLocalInbox, type LocalInbox } from './lib/local-inbox';
import { startPrivateMariadb } from './lib/private-mariadb';
import { buildWebIfChanged } from './lib/web-build';

const ROOT = path.resolve(__dirname, '..');
const DATA = path.resolve(ROOT, process.env.OVALYARD_DATA_DIR ?? '.data');

/** A secret kept in .data so restarts keep sessions and the database password. */
function keptSecret(name: string): string {
  const file = path.join(DATA, name);
  if (!fs.existsSync(file)) {
    fs.mkdirSync(DATA, { recursive: true });
    fs.writeFileSync(file, randomBytes(32).toString('base64url'), { mode: 0o600 });
  }
  return fs.readFileSync(file, 'utf8').trim();
}

async function main() {
  const dbPort = Number(process.env.DB_PORT ?? 3307);
  const host = process.env.HOST ?? '127.0.0.1';
  const port = Number(process.env.PORT ?? 8080);
  const db = await startPrivateMariadb({
    dataDir: path.join(DATA, 'mariadb'),
    port: dbPort,
    database: process.env.DB_NAME ?? 'ovalyard',
    user: process.env.DB_USER ?? 'ovalyard',
    password: process.env.DB_PASSWORD ?? keptSecret('db-password'),
    log: console.log,
  });
  let stopping = false;
  // Ctrl-C stops what this run started; a MariaDB that was already running stays up.
  const stopDb = async () => {
    if (!db.startedHere) return;
    console.log('Stopping the private MariaDB…');
    await db.stop();
  };
  try {
    buildWebIfChanged();
  } catch (err) {
    await stopDb();
    throw err;
  }
  // E-mail: SMTP_URL when set; otherwise a local inbox (maildev) that shows every message sent.
  let inbox: LocalInbox | null = null;
  if (!process.env.SMTP_URL) {
    try {
      inbox = await startLocalInbox(ROOT);
      console.log(`Local inbox (every e-mail Ovalyard sends): ${inbox.webUrl}`);
    } catch (err) {
      console.log(`Local inbox not started (${err instanceof Error ? err.message : err}); e-mails go to the log.`);
    }
  }
  const server = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: ROOT,
    stdio: 'inherit',
    env: {
      ...process.env,
      NODE_ENV: 'production',
      DB_HOST: '127.0.0.1',
      DB_PORT: String(db.port),
      DB_NAME: db.database,
      DB_USER: db.user,
      DB_PASSWORD: db.password,
      JWT_SECRET: process.env.JWT_SECRET ?? keptSecret('jwt-secret'),
      // E-mailed links point here; behind a proxy or a name set APP_URL (https://… makes cookies Secure).
      APP_URL: process.env.APP_URL ?? `http://${host === '0.0.0.0' ? '127.0.0.1' : host}:${port}`,
      // COOKIE_SECURE is left to the server: Secure whenever a request comes over HTTPS or APP_URL is https.
      DEMO_SEED: process.env.DEMO_SEED ?? '1',
      WEB_DIST: path.join(ROOT, 'dist'),
      ...(inbox ? { SMTP_URL: inbox.smtpUrl } : {}),
    },
  });
  const stop = (signal: NodeJS.Signals) => {
    if (stopping) return;
    stopping = true;
    server.kill(signal);
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));
  server.on('exit', async (code) => {
    inbox?.stop();
    await stopDb();
    process.exit(stopping ? 0 : (code ?? 1));
  });
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
