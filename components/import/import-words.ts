import { plural } from '../format';

/**
 * Words for the import page: a title for each warning code the importer sends and for each error
 * code the upload may answer with. The server's message stays the body; pages branch on codes.
 */

const WARNING_TITLES: Readonly<Record<string, string>> = {
  UNIT_SUSPECT: 'A unit looks wrong',
  UNIT_MIXED: 'Units from different systems',
  UNIT_ASSUMED: 'Unit assumed',
  UNKNOWN_UNIT: 'Unit not recognised',
  NO_CLUB_COLUMN: 'No club column',
  MISSING_CLUB: 'Shots without a club',
  DUPLICATE_HEADER: 'Two columns share a name',
  NUMBER_FORMAT_DOUBT: 'Number format uncertain',
  RECIPE_COLUMN_MISSING: 'The recipe names a column this file lacks',
  RECIPE_OVERRIDE: 'The recipe overrides a suggestion',
};

/** A short title for an import warning; unknown codes get a general one. */
export function warningTitle(code: string): string {
  return WARNING_TITLES[code] ?? 'Check this';
}

const ERROR_TITLES: Readonly<Record<string, string>> = {
  DUPLICATE_FILE: 'Already imported',
  NO_SHOTS: 'No shots to import',
  FILE_TOO_LARGE: 'File too large',
  TOO_MANY_ROWS: 'Too many rows',
  NOT_TEXT: 'Not a CSV file',
  EMPTY_FILE: 'The file is empty',
  NO_HEADER: 'No header row found',
  NO_DATA_ROWS: 'No shot rows found',
  UNKNOWN_UNIT: 'Unit not recognised',
  UNIT_MISMATCH: 'Unit does not fit the field',
  BAD_RECIPE: 'The mapping cannot be used',
  NO_FILE: 'No file chosen',
  BAD_UPLOAD: 'The upload failed',
  FORBIDDEN: 'Not allowed',
  NOT_FOUND: 'Not found',
  NETWORK: 'No connection',
  RECIPE_NAME_TAKEN: 'Recipe name taken',
  VALIDATION_FAILED: 'Check the choices',
};

/** A title for an error code of the upload (the message says what to do). */
export function importErrorTitle(code: string | undefined): string {
  return (code && ERROR_TITLES[code]) || 'The import did not work';
}

/** Whether sending the same request again may help (network, server trouble) — not a 4xx. */
export function isRetryable(status: number): boolean {
  return status === 0 || status >= 500;
}

/** "12.4 kB" / "1.3 MB" for a file size in bytes (1 kB = 1000 bytes, SI prefixes). */
export function formatFileSize(bytes: number): string {
  if (bytes < 1000) return `${bytes} bytes`;
  if (bytes < 1_000_000) return `${(bytes / 1000).toFixed(1)} kB`;
  return `${(bytes / 1_000_000).toFixed(1)} MB`;
}

/** "2 summary rows (lines 14, 15)" per reason. */
export function summarizeSkipped(skipped: readonly { line: number; reason: string }[]): string[] {
  const byReason = new Map<string, number[]>();
  for (const s of skipped) byReason.set(s.reason, [...(byReason.get(s.reason) ?? []), s.line]);
  return [...byReason].map(([reason, lines]) => {
    const shown = lines.slice(0, 6).join(', ') + (lines.length > 6 ? ', …' : '');
    return `${plural(lines.length, reason)} (${lines.length === 1 ? 'line' : 'lines'} ${shown})`;
  });
}


/**
 * The question before a bay file is deleted, naming what leaves with it.
 * @example deleteBayFileQuestion('bay-1.csv', 48) // => 'Delete bay-1.csv? Its 48 shots leave the analysis.'
 */
export function deleteBayFileQuestion(fileName: string, shotCount: number): string {
  if (shotCount === 0) return `Delete ${fileName}? It has no shots in the analysis.`;
  return `Delete ${fileName}? Its ${plural(shotCount, 'shot')} ${shotCount === 1 ? 'leaves' : 'leave'} the analysis.`;
}

/** The question before a saved recipe is deleted; files imported with it keep their mapping. */
export function deleteRecipeQuestion(name: string): string {
  return `Delete the recipe "${name}"? Bay files already imported with it keep their mapping.`;
}
