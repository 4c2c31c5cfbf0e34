/** MariaDB error numbers worth one more try: a deadlock (1213) and a lock wait timeout (1205). */
const RETRYABLE = new Set([1213, 1205]);

function errnoOf(err: unknown): number | undefined {
  const e = err as { errno?: number; parent?: { errno?: number }; original?: { errno?: number } } | null;
  return e?.errno ?? e?.parent?.errno ?? e?.original?.errno;
}

/** Whether an error is a deadlock or a lock wait timeout (the transaction was rolled back whole). */
export function isRetryable(err: unknown): boolean {
  const errno = errnoOf(err);
  return errno !== undefined && RETRYABLE.has(errno);
}

/**
 * Runs a whole transaction again when the database chose it as a deadlock's victim (it was
 * rolled back, so running it again is safe), up to `tries` times with a short random wait.
 */
export async function withDeadlockRetry<T>(run: () => Promise<T>, tries = 5): Promise<T> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await run();
    } catch (err) {
      if (attempt >= tries || !isRetryable(err)) throw err;
      await new Promise((resolve) => setTimeout(resolve, 20 * attempt + Math.random() * 50));
    }
  }
}
