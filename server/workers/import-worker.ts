/** The worker thread's entry (see import-worker.cjs): one bay-file task per call. */
import { neutraliseCsv } from '../../analysis/export';
import { runImportTask, type ImportTask } from '../services/bay-file-import';

/** A stored file made safe to open in a spreadsheet (the raw download). */
export interface NeutraliseTask {
  neutralise: { text: string; delimiter: string };
}

export function importTask(task: ImportTask | NeutraliseTask) {
  if ('neutralise' in task) return { text: neutraliseCsv(task.neutralise.text, task.neutralise.delimiter) };
  return runImportTask(task);
}
