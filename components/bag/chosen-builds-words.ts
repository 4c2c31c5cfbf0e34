import type { BagChange } from '@/analysis/bag';
import type { BagClub, ChosenBuildsBody, ChosenBuildsView } from '@/server/schemas';
import { buildName } from '../builds/build-summary';
import { specNumber } from '@/analysis/bag';
import { clubName } from './bag-words';

/** Where a chosen build goes: beside the others ('add') or in place of a bag club (its id). */
export type Placement = 'add' | string;

/** The fitter's draft: per club code the chosen build id ('' for none) and where it goes; clubs to take out. */
export type ChoiceDraft = { byClub: Record<string, { buildId: string; placement: Placement }>; takeOut: string[] };

/** A bag club as an option: "Driver, 10.5°". */
export const bagClubLabel = (c: Pick<BagClub, 'club' | 'loftDeg'>): string => `${clubName(c.club)}${c.loftDeg === null ? '' : `, ${specNumber(c.loftDeg)}°`}`;

/** The default place of a new build: the first club of the same code still in the bag, else beside the others. */
export function defaultPlacement(club: string, bag: readonly Pick<BagClub, 'id' | 'club' | 'status'>[]): Placement {
  return bag.find((c) => c.club === club && c.status !== 'out')?.id ?? 'add';
}

/** The draft from the saved choice. */
export function draftOf(view: ChosenBuildsView): ChoiceDraft {
  const byClub: ChoiceDraft['byClub'] = {};
  for (const b of view.builds) byClub[b.club] = { buildId: b.buildId, placement: b.replacesBagClubId ?? 'add' };
  return { byClub, takeOut: [...view.takeOut] };
}

/** The PUT body of a draft. */
export function bodyOf(draft: ChoiceDraft): ChosenBuildsBody {
  return {
    builds: Object.values(draft.byClub)
      .filter((c) => c.buildId !== '')
      .map((c) => ({ buildId: c.buildId, replacesBagClubId: c.placement === 'add' ? null : c.placement })),
    takeOut: draft.takeOut,
  };
}

/**
 * A proposed change in plain words. O(1).
 * @example changeText({ kind: 'take-out', club: '4I', bagClubId: 'x', version: 1 }, {}) // => 'Take the 4 iron out'
 */
export function changeText(change: BagChange, bagLabels: Readonly<Record<string, string>>): string {
  if (change.kind === 'take-out') return `Take the ${(bagLabels[change.bagClubId] ?? clubName(change.club)).toLowerCase()} out`;
  const build = `${clubName(change.club)} (${buildName(change.label)})`;
  if (change.kind === 'add') return `Add the ${build.charAt(0).toLowerCase()}${build.slice(1)}`;
  return `Replace the ${(bagLabels[change.bagClubId] ?? clubName(change.replacedClub)).toLowerCase()} with the ${build.charAt(0).toLowerCase()}${build.slice(1)}`;
}

/** The versions the fitter saw, per bag club the proposal changes (sent with the confirmation). */
export function versionsOf(proposal: readonly BagChange[]): Record<string, number> {
  const out: Record<string, number> = {};
  for (const c of proposal) if (c.kind !== 'add') out[c.bagClubId] = c.version;
  return out;
}
