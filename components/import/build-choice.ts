/**
 * How the shots of a file get their build, as the page edits it, and the `builds` option the
 * server takes (server/schemas/bay-files.ts, buildAssignmentSchema).
 */
import { compareClubs } from '@/analysis/clubs';
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
