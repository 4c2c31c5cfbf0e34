/**
 * How the shots of a file get their build, as the page edits it, and the `builds` option the
 * server takes (server/schemas/bay-files.ts, buildAssignmentSchema).
 */
import { compareClubs } from '@/analysis/clubs';
import type { Recipe } from '@/analysis/import';
import type { BuildAssignment } from '@/server/schemas';

export type BuildMode = BuildAssignment['mode'];

/** Everything the build controls hold; only the chosen mode's part is sent. */
export type BuildChoice = {
  mode: BuildMode;
  /** Column mode: the build of shots whose build cell is empty (blank: none). */
  fallback: string;
  /** File mode: one build for every shot. */
  fileBuild: string;
  /** Club mode: a build per club code (blank: the shots of that club get none). */
  byClub: Readonly<Record<string, string>>;
};

export const INITIAL_BUILD_CHOICE: BuildChoice = { mode: 'column', fallback: '', fileBuild: '', byClub: {} };

export const BUILD_MODE_OPTIONS: readonly { value: BuildMode; label: string }[] = [
  { value: 'column', label: 'From the file' },
  { value: 'file', label: 'One for the file' },
  { value: 'club', label: 'Per club' },
];

/**
 * The `builds` option for a choice, or null while the choice is incomplete (file mode without a
 * name): the page keeps the last preview and does not commit then. Names are trimmed; blank
 * per-club names are left out; a build name is cut at the server's 80 characters.
 * @example buildAssignmentFor({ ...INITIAL_BUILD_CHOICE, mode: 'file', fileBuild: ' Set B ' }) // => { mode: 'file', build: 'Set B' }
 */
export function buildAssignmentFor(choice: BuildChoice): BuildAssignment | null {
  const name = (s: string) => s.trim().slice(0, 80);
  if (choice.mode === 'file') {
    const build = name(choice.fileBuild);
    return build ? { mode: 'file', build } : null;
  }
  if (choice.mode === 'club') {
    const byClub: Record<string, string> = {};
    for (const [club, build] of Object.entries(choice.byClub)) if (name(build)) byClub[club] = name(build);
    return { mode: 'club', byClub };
  }
  const fallback = name(choice.fallback);
  return fallback ? { mode: 'column', fallback } : { mode: 'column' };
}

/** The clubs of a preview's groups, each once, in bag order (unknown names last). */
export function clubsOfGroups(groups: readonly { club: string }[]): string[] {
  return [...new Set(groups.map((g) => g.club))].sort(compareClubs);
}

/**
 * The build choice a stored file was most likely imported with, read back from its recipe and
 * the groups of its report (the file keeps no record of the choice itself): a recipe with a build
 * column → from the file; no build on any shot → from the file (nothing to read); one build for
 * every shot → one for the file; one build per club → per club. A column fallback cannot be told
 * apart from the file's own values and is not recovered. O(groups).
 * @example buildChoiceOfStored({ columns: {} }, [{ club: 'DR', build: 'Set B' }, { club: '7I', build: 'Set B' }]).mode // => 'file'
 */
export function buildChoiceOfStored(recipe: Recipe, groups: readonly { club: string; build: string | null }[]): BuildChoice {
  if (Object.values(recipe.columns).some((c) => c.field === 'build')) return INITIAL_BUILD_CHOICE;
  const builds = new Set(groups.map((g) => g.build));
  if (builds.size === 0 || (builds.size === 1 && builds.has(null))) return INITIAL_BUILD_CHOICE;
  if (builds.size === 1 && groups.length > 0) return { ...INITIAL_BUILD_CHOICE, mode: 'file', fileBuild: groups[0].build ?? '' };
  const byClub: Record<string, string> = {};
  for (const g of groups) {
    const seen = byClub[g.club];
    // two builds for one club cannot come from a per-club choice: leave it to the fitter
    if (seen !== undefined && seen !== (g.build ?? '')) return INITIAL_BUILD_CHOICE;
    byClub[g.club] = g.build ?? '';
  }
  for (const club of Object.keys(byClub)) if (!byClub[club]) delete byClub[club];
  return { ...INITIAL_BUILD_CHOICE, mode: 'club', byClub };
}
