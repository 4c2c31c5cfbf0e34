/** `npm run db:stop` / `db:start`: the private MariaDB of `npm start`, by hand. */
import fs from 'node:fs';
import path from 'node:path';
import { startPrivateMariadb, stopPrivateMariadb } from './lib/private-mariadb';

const DATA = path.resolve(__dirname, '..', process.env.OVALYARD_DATA_DIR ?? '.data');

async function main(cmd: string | undefined) {
  if (cmd === 'stop') {
    console.log((await stopPrivateMariadb(path.join(DATA, 'mariadb'))) ? 'Stopped.' : 'Not running.');
  } else if (cmd === 'start') {
    const pw = path.join(DATA, 'db-password');
    const password = process.env.DB_PASSWORD ?? (fs.existsSync(pw) ? fs.readFileSync(pw, 'utf8').trim() : 'ovalyard-dev');
    const db = await startPrivateMariadb({ dataDir: path.join(DATA, 'mariadb'), port: Number(process.env.DB_PORT ?? 3307), database: 'ovalyard', user: 'ovalyard', password, log: console.log });
    console.log(`MariaDB on 127.0.0.1:${db.port}, socket ${db.socket}`);
  } else {
    console.error('usage: node --import tsx scripts/db.ts start|stop');
    process.exit(2);
  }
}

void main(process.argv[2]);
