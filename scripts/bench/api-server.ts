/**
 * The server `npm run bench` measures: the real app (server/app.ts, with WORKERS processes as
 * server/index.ts runs it) plus one bench-only route that exists in this process and nowhere
 * else, never in production:
 *   GET /bench/floor — the body in BENCH_FLOOR_FILE, prepared once (serialised, tagged and
 *   compressed once, as a cached answer is), behind the same sign-in check as the API.
 * It is the floor an answer of that size cannot beat on this server: the analysis route's p99
 * over this route's p99 is api.analysisRatio. Started by scripts/bench/api.ts only.
 */
import cookieParser from 'cookie-parser';
import express from 'express';
import fs from 'node:fs';
import { createApp } from '@/server/app';
import { runCluster } from '@/server/cluster';
import { loadConfig } from '@/server/config';
import { createSequelize } from '@/server/db';
import { authenticate } from '@/server/middleware/authenticate';
import { sendPreparedJson } from '@/server/middleware/send-prepared-json';
import { prepareJsonBytes, type PreparedJson } from '@/server/services/prepared-json';

async function serve(): Promise<void> {
  const config = loadConfig();
  const sequelize = createSequelize(config.db);
  await sequelize.authenticate();
  const app = createApp({ sequelize, config, serveWeb: process.env.SERVE_WEB === '1', log: () => {} });
  let floor: PreparedJson | null = null;
  const outer = express();
  outer.disable('x-powered-by');
  outer.get('/bench/floor', cookieParser(), authenticate(config), async (req, res) => {
    floor ??= prepareJsonBytes(fs.readFileSync(process.env.BENCH_FLOOR_FILE ?? ''));
    await sendPreparedJson(req, res, floor);
  });
  outer.use(app);
  const server = outer.listen(config.port, config.host);
  process.on('SIGTERM', () => {
    server.close(() => void sequelize.close().finally(() => process.exit(0)));
    (setTimeout(() => process.exit(0), 3000) as unknown as { unref?: () => void }).unref?.();
  });
}

runCluster({ workers: loadConfig().workers, prepare: async () => {}, serve, log: () => {} }).catch((err) => {
  console.error(err);
  process.exit(1);
});
