/**
 * Deletes every closed shop whose grace period has ended (the server also does this at start and
 * every hour). Reads the same environment as the server (DB_HOST, DB_PORT, DB_NAME, …).
 * Usage: node --import tsx scripts/purge-closed-shops.ts
 */
import { loadConfig } from '../server/config';
import { createSequelize } from '../server/db';
import { purgeClosedShops } from '../server/services/shops';

async function main(): Promise<void> {
  const config = loadConfig();
  const sequelize = createSequelize(config.db);
  try {
    const purged = await purgeClosedShops();
    console.log(`Closed shops past their grace period deleted: ${purged}`);
  } finally {
    await sequelize.close();
  }
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
