/**
 * The limits of one bay file, in one place. They bound the work and the stored text per file
 * (every pattern runs on bounded cells; the recipe and report fit their database columns), and
 * the messages quote them, so a fitter learns what the limit is.
 */

/** Columns one import reads. A wider header is refused (TOO_MANY_COLUMNS). */
export const MAX_COLUMNS = 1_000;

/** Characters of a column header (the recipe keys headers up to this length). Longer ones are cut. */
export const MAX_HEADER_CHARS = 200;

/**
 * Characters of a club name and of a build label, as stored and compared. The import cuts longer
 * names to these lengths (and says so in a warning), so the preview shows the groups that commit
 * stores. Names are compared exactly, as written (the database compares them the same way).
 */
export const MAX_CLUB_CHARS = 40;
export const MAX_BUILD_CHARS = 80;

/**
 * A name cut to `max` characters, without white space at its ends. O(max).
 * @example cutName(' Steel 105 ', 80) // => 'Steel 105'
 */
export function cutName(name: string, max: number): string {
  const t = name.trim();
  return t.length <= max ? t : t.slice(0, max).trimEnd();
}
