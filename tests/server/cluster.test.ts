import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { freePort } from '../../scripts/lib/private-mariadb';

const ROOT = path.resolve(__dirname, '../..');

function start(workers: number, port: number): { child: ChildProcess; output: () => string } {
  let output = '';
  const child = spawn(process.execPath, ['--import', 'tsx', path.join(ROOT, 'tests/support/cluster-probe.ts')], {
    cwd: ROOT,
    env: { ...process.env, PROBE_WORKERS: String(workers), PROBE_PORT: String(port) },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.on('data', (d: Buffer) => (output += d.toString()));
  child.stderr?.on('data', (d: Buffer) => (output += d.toString()));
  return { child, output: () => output };
}

/** Asks the port until `distinct` different processes have answered (or the attempts run out). */
async function pidsAnswering(port: number, distinct: number): Promise<Set<string>> {
  const pids = new Set<string>();
  for (let attempt = 0; attempt < 400 && pids.size < distinct; attempt++) {
    try {
      // A fresh connection each time: the primary hands each new connection to the next worker.
      const res = await fetch(`http://127.0.0.1:${port}/`, { headers: { connection: 'close' } });
      pids.add(await res.text());
    } catch {
      await new Promise((r) => setTimeout(r, 100));
    }
  }
  return pids;
}

async function stop(child: ChildProcess): Promise<number | null> {
  if (child.exitCode !== null) return child.exitCode;
  const exited = new Promise<number | null>((r) => child.once('exit', (code) => r(code)));
  child.kill('SIGTERM');
  return exited;
}

describe('runCluster', () => {
  it('runCluster with two workers serves one port from two processes and prepares once', async () => {
    const port = await freePort();
    const { child, output } = start(2, port);
    try {
      const pids = await pidsAnswering(port, 2);
      expect(pids.size).toBe(2);
      expect(pids.has(String(child.pid))).toBe(false); // the primary only hands connections on
      expect(output().match(/prepared/g)).toHaveLength(1);
    } finally {
      await stop(child);
    }
  });

  it('runCluster with one worker serves from this process alone', async () => {
    const port = await freePort();
    const { child } = start(1, port);
    try {
      const pids = await pidsAnswering(port, 1);
      expect([...pids]).toEqual([String(child.pid)]);
    } finally {
      await stop(child);
    }
  });
});
