/**
 * A private MariaDB server on loopback: its own data directory, port and socket, never the
 * system's service or its /etc/mysql settings. Used by `npm start` (a kept data directory under
 * .data/) and by the tests (a throwaway one in the temp directory).
 */
import { execFileSync, spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';

export interface PrivateMariadbOptions {
  dataDir: string;
  port: number;
  database: string;
  user: string;
  password: string;
  /** Print progress lines. */
  log?: (line: string) => void;
}

export interface RunningMariadb {
  host: '127.0.0.1';
  port: number;
  socket: string;
  database: string;
  user: string;
  password: string;
  pid: number;
  /** False when a server was already running on this data directory (then leave it running). */
  startedHere: boolean;
  stop: () => Promise<void>;
}

const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

function which(cmd: string): string | null {
  const r = spawnSync('sh', ['-c', `command -v ${cmd}`], { encoding: 'utf8' });
  return r.status === 0 ? r.stdout.trim() : null;
}

/** Finds mariadbd, which Debian installs in /usr/sbin (not always on PATH). */
export function findServerBinary(): string | null {
  for (const candidate of ['/usr/sbin/mariadbd', '/usr/bin/mariadbd']) {
    if (fs.existsSync(candidate)) return candidate;
  }
  return which('mariadbd');
}

/**
 * Makes sure Debian's mariadb-server is installed; installs it when allowed (root), else throws
 * with a message saying what to install.
 */
export function ensureMariadbInstalled(log: (line: string) => void = console.log): string {
  let bin = findServerBinary();
  if (bin) return bin;
  if (!isRoot || !which('apt-get')) {
    throw new Error(
      'MariaDB server not found. Install Debian\'s package first: sudo apt-get install -y mariadb-server',
    );
  }
  log('Installing Debian\'s mariadb-server (one time)…');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const lists = fs.existsSync('/var/lib/apt/lists') ? fs.readdirSync('/var/lib/apt/lists') : [];
  if (lists.filter((f) => f.endsWith('Packages') || f.endsWith('Packages.lz4')).length === 0) {
    execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  }
  const install = () => spawnSync('apt-get', ['install', '-y', '-qq', 'mariadb-server'], { stdio: 'inherit', env });
  if (install().status !== 0) {
    execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
    if (install().status !== 0) throw new Error('apt-get install mariadb-server failed');
  }
  bin = findServerBinary();
  if (!bin) throw new Error('mariadb-server installed but mariadbd was not found');
  return bin;
}

/** A free TCP port on 127.0.0.1. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.unref();
    srv.on('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const address = srv.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      srv.close(() => resolve(port));
    });
  });
}

function clientBinary(): string {
  return which('mariadb') ?? which('mysql') ?? '/usr/bin/mariadb';
}

function adminBinary(): string {
  return which('mariadb-admin') ?? which('mysqladmin') ?? '/usr/bin/mariadb-admin';
}

function sql(socket: string, statement: string): { ok: boolean; out: string } {
  const r = spawnSync(clientBinary(), ['--no-defaults', `--socket=${socket}`, '-uroot', '-N', '-e', statement], {
    encoding: 'utf8',
  });
  return { ok: r.status === 0, out: (r.stdout ?? '') + (r.stderr ?? '') };
}

function sleep(ms: number) {
  return new Promise((r) => setTimeout(r, ms));
}

function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    // A zombie answers kill(0); check its state where /proc tells.
    const stat = `/proc/${pid}/stat`;
    if (fs.existsSync(stat) && fs.readFileSync(stat, 'utf8').split(' ')[2] === 'Z') return false;
    return true;
  } catch {
    return false;
  }
}

/** SQL string literal for a value we generated or validated. */
function quote(value: string): string {
  return `'${value.replace(/\\/g, '\\\\').replace(/'/g, "\\'")}'`;
}

/**
 * Initialises the data directory on first use, starts mariadbd on 127.0.0.1, waits until it
 * answers, creates the database and a password user. Reuses a server already running on the
 * same data directory.
 */
export async function startPrivateMariadb(opts: PrivateMariadbOptions): Promise<RunningMariadb> {
  const log = opts.log ?? (() => {});
  const bin = ensureMariadbInstalled(log);
  const dataDir = path.resolve(opts.dataDir);
  const socket = path.join(dataDir, 'mysqld.sock');
  const pidFile = path.join(dataDir, 'mysqld.pid');
  if (socket.length > 100) throw new Error(`socket path too long for a Unix socket: ${socket}`);
  fs.mkdirSync(dataDir, { recursive: true });
  fs.chmodSync(dataDir, 0o700); // the socket (root's only way in) is reachable by this user only

  const userArgs = isRoot ? ['--user=root'] : [];
  if (!fs.existsSync(path.join(dataDir, 'mysql'))) {
    log(`Initialising a private MariaDB data directory in ${dataDir}…`);
    const installDb = which('mariadb-install-db') ?? which('mysql_install_db') ?? '/usr/bin/mariadb-install-db';
    const r = spawnSync(
      installDb,
      ['--no-defaults', ...userArgs, `--datadir=${dataDir}`, '--auth-root-authentication-method=normal', '--skip-test-db', '--skip-name-resolve'],
      { encoding: 'utf8' },
    );
    if (r.status !== 0) throw new Error(`mariadb-install-db failed:\n${r.stdout}\n${r.stderr}`);
  }

  let pid = fs.existsSync(pidFile) ? Number(fs.readFileSync(pidFile, 'utf8').trim()) : 0;
  let started = false;
  if (!(pid && alive(pid) && sql(socket, 'SELECT 1').ok)) {
    const child = spawn(
      bin,
      [
        '--no-defaults',
        ...userArgs,
        `--datadir=${dataDir}`,
        `--socket=${socket}`,
        `--pid-file=${pidFile}`,
        `--port=${opts.port}`,
        '--bind-address=127.0.0.1',
        '--skip-name-resolve',
        `--log-error=${path.join(dataDir, 'error.log')}`,
        '--character-set-server=utf8mb4',
        '--collation-server=utf8mb4_unicode_ci',
        '--max-allowed-packet=64M',
        '--innodb-buffer-pool-size=128M',
        '--innodb-flush-log-at-trx-commit=2',
      ],
      { detached: true, stdio: 'ignore' },
    );
    child.unref();
    pid = child.pid ?? 0;
    started = true;
    const deadline = Date.now() + 30_000;
    while (!sql(socket, 'SELECT 1').ok) {
      if (!alive(pid)) {
        const errLog = path.join(dataDir, 'error.log');
        const tail = fs.existsSync(errLog) ? fs.readFileSync(errLog, 'utf8').split('\n').slice(-15).join('\n') : '';
        throw new Error(`mariadbd exited during start-up. Its log:\n${tail}`);
      }
      if (Date.now() > deadline) throw new Error('mariadbd did not answer within 30 s');
      await sleep(100);
    }
  }
  const db = opts.database.replace(/[^A-Za-z0-9_]/g, '');
  const user = opts.user.replace(/[^A-Za-z0-9_]/g, '');
  const setup = sql(
    socket,
    [
      `CREATE DATABASE IF NOT EXISTS \`${db}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
      `CREATE USER IF NOT EXISTS '${user}'@'127.0.0.1' IDENTIFIED BY ${quote(opts.password)}`,
      `ALTER USER '${user}'@'127.0.0.1' IDENTIFIED BY ${quote(opts.password)}`,
      `GRANT ALL PRIVILEGES ON *.* TO '${user}'@'127.0.0.1'`,
      'FLUSH PRIVILEGES',
    ].join('; '),
  );
  if (!setup.ok) throw new Error(`creating the database and user failed: ${setup.out}`);
  lockDownRoot(socket);
  if (started) log(`Private MariaDB started on 127.0.0.1:${opts.port} (data in ${dataDir}).`);

  const stop = () => shutdown(socket, pid);
  return { host: '127.0.0.1', port: opts.port, socket, database: db, user, password: opts.password, pid, startedHere: started, stop };
}

/**
 * Root only through the socket: mariadb-install-db makes password-less root (and anonymous)
 * accounts for 127.0.0.1, ::1 and the host name, which anyone on the machine could use over TCP.
 * They are dropped (on every start, so older data directories are fixed too); root@localhost stays,
 * and 'localhost' matches socket connections only (the server runs with --skip-name-resolve).
 * The socket sits in the data directory, which only its owner may enter.
 */
function lockDownRoot(socket: string): void {
  const list = sql(socket, "SELECT CONCAT(QUOTE(User), '@', QUOTE(Host)) FROM mysql.user WHERE (User = 'root' AND Host <> 'localhost') OR User = ''");
  if (!list.ok) throw new Error(`listing MariaDB accounts failed: ${list.out}`);
  const accounts = list.out.split('\n').map((l) => l.trim()).filter((l) => /^'[^']*'@'[^']*'$/.test(l));
  if (accounts.length === 0) return;
  const drop = sql(socket, `DROP USER ${accounts.join(', ')}; FLUSH PRIVILEGES`);
  if (!drop.ok) throw new Error(`dropping MariaDB's TCP root accounts failed: ${drop.out}`);
}

/** Stops a private server found by its data directory, if one runs. */
export async function stopPrivateMariadb(dataDir: string): Promise<boolean> {
  const socket = path.join(path.resolve(dataDir), 'mysqld.sock');
  const pidFile = path.join(path.resolve(dataDir), 'mysqld.pid');
  if (!fs.existsSync(pidFile)) return false;
  const pid = Number(fs.readFileSync(pidFile, 'utf8').trim());
  if (!alive(pid)) return false;
  await shutdown(socket, pid);
  return true;
}

/** Asks the server to shut down, waits up to 20 s, then kills it. */
async function shutdown(socket: string, pid: number): Promise<void> {
  spawnSync(adminBinary(), ['--no-defaults', `--socket=${socket}`, '-uroot', 'shutdown'], { stdio: 'ignore' });
  const until = Date.now() + 20_000;
  while (alive(pid) && Date.now() < until) await sleep(100);
  if (alive(pid)) process.kill(pid, 'SIGKILL');
}
