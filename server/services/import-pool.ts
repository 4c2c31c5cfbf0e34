/**
 * A pool of worker threads (piscina) that parse, map and validate bay files, so the event loop
 * keeps answering other requests while a 200,000-row file is read.
 */
import path from 'node:path';
import { Piscina } from 'piscina';
import { HttpError } from '../errors';
import type { ImportTask, ImportTaskFailure, ImportTaskResult } from './bay-file-import';

export interface ImportPool {
  run(task: ImportTask): Promise<ImportTaskResult>;
  /** A CSV text with formula-looking cells neutralised (analysis/export neutraliseCsv). */
  neutralise(text: string, delimiter: string): Promise<string>;
  close(): Promise<void>;
}

/** A pool of `threads` import workers; idle workers end after 30 s and never keep the process alive. */
export function createImportPool(threads = 1): ImportPool {
  const pool = new Piscina({
    filename: path.join(__dirname, '..', 'workers', 'import-worker.cjs'),
    minThreads: 0,
    maxThreads: threads,
    idleTimeout: 30_000,
  });
  return {
    async run(task) {
      const answer = (await pool.run(task)) as ImportTaskResult | ImportTaskFailure;
      if ('failed' in answer) throw new HttpError(answer.failed.status, answer.failed.code, answer.failed.message);
      return answer;
    },
    async neutralise(text, delimiter) {
      const answer = (await pool.run({ neutralise: { text, delimiter } })) as { text: string };
      return answer.text;
    },
    async close() {
      await pool.destroy();
    },
  };
}
