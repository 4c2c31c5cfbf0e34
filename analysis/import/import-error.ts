/** What went wrong with a whole bay file (a bad row is reported, not thrown). */
export type ImportErrorCode =
  | 'EMPTY_FILE'
  | 'NOT_TEXT'
  | 'NO_HEADER'
  | 'NO_DATA_ROWS'
  | 'UNKNOWN_UNIT'
  | 'UNIT_MISMATCH'
  | 'BAD_RECIPE'
  | 'BAD_CELL'
  | 'TOO_MANY_COLUMNS';

/**
 * The error every import function throws for input it cannot use. Branch on `code`, never on
 * the message, which is plain words for the fitter.
 * @example
 * try { sniff('') } catch (e) { if (e instanceof ImportError && e.code === 'EMPTY_FILE') … }
 */
export class ImportError extends Error {
  readonly code: ImportErrorCode;
  /** The column concerned, when there is one. */
  readonly column?: string;
  constructor(code: ImportErrorCode, message: string, column?: string) {
    super(message);
    this.name = 'ImportError';
    this.code = code;
    if (column !== undefined) this.column = column;
  }
}
