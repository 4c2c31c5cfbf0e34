/**
 * A tiny server run through server/cluster.ts for tests/server/cluster.test.ts: every process
 * answers its own pid on the port in PROBE_PORT; the primary prints "prepared" once.
 */
import http from 'node:http';
import { runCluster } from '@/server/cluster';

runCluster({
  workers: Number(process.env.PROBE_WORKERS ?? 2),
  log: () => {},
  prepare: async () => {
    console.log('prepared');
  },
  serve: async () => {
    http.createServer((_req, res) => res.end(String(process.pid))).listen(Number(process.env.PROBE_PORT), '127.0.0.1');
  },
}).catch((err) => {
  console.error(err);
  process.exit(1);
});
