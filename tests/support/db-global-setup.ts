/**
 * Jest global setup for the server and browser tests: a throwaway private MariaDB in the temp
 * directory on a free port. Each test file then makes its own database in it (tests/support/test-db.ts).
 * Connection details reach the workers through the environment.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { freePort, startPrivateMariadb } from '../../scripts/lib/private-mariadb';

export default async function globalSetup(): Promise<void> {
  if (process.env.OVALYARD_TEST_DB_PORT) return; // another project's setup already started one
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'ovy-db-'));
  const port = await freePort();
  const db = await startPrivateMariadb({ dataDir, port, database: 'ovalyard_test', user: 'ovalyard_test', password: 'test-only-password' });
  process.env.OVALYARD_TEST_DB_PORT = String(port);
  process.env.OVALYARD_TEST_DB_USER = db.user;
  process.env.OVALYARD_TEST_DB_PASSWORD = db.password;
  process.env.OVALYARD_TEST_DB_DIR = dataDir;
  (globalThis as Record<string, unknown>).__ovalyardDb = db;
}
