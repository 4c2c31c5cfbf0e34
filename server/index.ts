import type { Server } from 'node:http';
import { closeApp, createApp } from './app';
import { isFirstServer, runCluster } from './cluster';
import { loadConfig, type Config } from './config';
import { createSequelize } from './db';
import { migrateUp } from './migrate';
import { createMailer } from './services/mailer';
import { demoSignInHint, seedDemo } from './seed/demo';
import { purgeClosedShops } from './services/shops';

const PURGE_EVERY_MS = 60 * 60 * 1000;

/** Once per start, before any request: migrations, and the demo into an empty database. */
async function prepare(config: Config): Promise<void> {
  const sequelize = createSequelize(config.db);
  try {
    await sequelize.authenticate();
    const applied = await migrateUp(sequelize);
    if (applied.length) console.log(`Migrations applied: ${applied.join(', ')}`);
    const purged = await purgeClosedShops();
    if (purged) console.log(`Closed shops past their grace period deleted: ${purged}`);
    if (process.env.DEMO_SEED === '1') {
      const seeded = await seedDemo(sequelize, new Date());
      console.log(seeded ? 'Demo data loaded into the empty database.' : 'Database has data: demo not loaded.');
    }
  } finally {
    await sequelize.close();
  }
}

/** One server process: its own connection pool, app and listener. */
async function serve(config: Config): Promise<void> {
  const sequelize = createSequelize(config.db);
  await sequelize.authenticate();
  const mailer = createMailer(config.mail.smtpUrl, config.mail.from);
  const app = createApp({ sequelize, config, mailer, serveWeb: process.env.SERVE_WEB !== '0' });
  const server: Server = app.listen(config.port, config.host, () => {
    if (!isFirstServer()) return;
    const url = `http://${config.host === '0.0.0.0' ? 'localhost' : config.host}:${config.port}`;
    console.log(`\nOvalyard is running at ${url}`);
    if (process.env.DEMO_SEED === '1') console.log(demoSignInHint());
    console.log('Press Ctrl-C to stop.\n');
  });
  // Closed shops past their grace period: deleted every hour by the first process (and at start).
  if (isFirstServer()) {
    const purge = setInterval(() => {
      purgeClosedShops().catch((err: unknown) => console.error('Purging closed shops failed:', err));
    }, PURGE_EVERY_MS) as unknown as { unref?: () => void };
    purge.unref?.();
  }
  let stopping = false;
  const shutdown = (signal: string) => {
    if (stopping) return;
    stopping = true;
    if (isFirstServer()) console.log(`\n${signal}: stopping the server…`);
    server.close(() => {
      void closeApp(app)
        .then(() => sequelize.close())
        .finally(() => process.exit(0));
    });
    const force = setTimeout(() => process.exit(0), 5000) as unknown as { unref?: () => void };
    force.unref?.();
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

async function main(): Promise<void> {
  const config = loadConfig();
  await runCluster({ workers: config.workers, prepare: () => prepare(config), serve: () => serve(config) });
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
