import fs from 'node:fs';
import type { RunningMariadb } from '../../scripts/lib/private-mariadb';

export default async function globalTeardown(): Promise<void> {
  const db = (globalThis as Record<string, unknown>).__ovalyardDb as RunningMariadb | undefined;
  if (!db) return;
  (globalThis as Record<string, unknown>).__ovalyardDb = undefined;
  await db.stop();
  const dir = process.env.OVALYARD_TEST_DB_DIR;
  if (dir && dir.includes('ovy-db-')) fs.rmSync(dir, { recursive: true, force: true });
  delete process.env.OVALYARD_TEST_DB_PORT;
}
