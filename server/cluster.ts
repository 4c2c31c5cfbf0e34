/**
 * Several API processes on one machine with Node's cluster module: the primary runs the one-time
 * work (migrations, demo), then forks the workers, which all listen on the same port; the
 * primary hands each new connection to the next worker in turn. Whatever must be shared between
 * the processes lives in MariaDB (the fitting revisions the analysis cache keys on); each worker
 * keeps only its own bounded cache.
 */
import cluster from 'node:cluster';

export interface ClusterPlan {
  /** Processes that serve requests; 1 serves in this process without a cluster. */
  workers: number;
  /** Runs once, in the primary, before any worker starts. */
  prepare: () => Promise<void>;
  /** Runs in each worker (or here, with one worker). */
  serve: () => Promise<void>;
  log?: (line: string) => void;
}

/** A worker that dies this soon after starting is not restarted (it would only die again). */
const MIN_UPTIME_MS = 5000;

/** Whether this process is the first (or only) server process: the one that prints the banner. */
export function isFirstServer(): boolean {
  return !cluster.isWorker || cluster.worker?.id === 1;
}

export async function runCluster({ workers, prepare, serve, log = console.log }: ClusterPlan): Promise<void> {
  if (workers <= 1) {
    await prepare();
    await serve();
    return;
  }
  if (!cluster.isPrimary) {
    await serve();
    return;
  }
  await prepare();
  let stopping = false;
  const started = new Map<number, number>();
  const fork = () => {
    const worker = cluster.fork();
    started.set(worker.id, Date.now());
  };
  for (let i = 0; i < workers; i++) fork();
  log(`Serving with ${workers} processes (WORKERS=${workers}).`);
  cluster.on('exit', (worker, code, signal) => {
    const ranMs = Date.now() - (started.get(worker.id) ?? 0);
    started.delete(worker.id);
    if (stopping) {
      if (started.size === 0) process.exit(0);
      return;
    }
    if (ranMs < MIN_UPTIME_MS) {
      log(`A server process stopped right after starting (${signal ?? `exit ${code}`}); stopping all.`);
      stopping = true;
      for (const w of Object.values(cluster.workers ?? {})) w?.process.kill('SIGTERM');
      process.exitCode = 1;
      if (started.size === 0) process.exit(1);
      return;
    }
    log(`A server process stopped (${signal ?? `exit ${code}`}); starting another.`);
    fork();
  });
  const stop = (signal: NodeJS.Signals) => {
    if (stopping) return;
    stopping = true;
    for (const w of Object.values(cluster.workers ?? {})) w?.process.kill(signal);
    const force = setTimeout(() => process.exit(0), 8000) as unknown as { unref?: () => void };
    force.unref?.();
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));
}
