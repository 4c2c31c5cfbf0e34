import { clubInfo, compareClubs } from '@/analysis/clubs';
import type { Build } from '@/server/schemas';

/** The spec fields of a build (what PATCH /api/builds/:id changes). */
export type BuildSpec = Omit<Build, 'id' | 'fittingId' | 'club' | 'label'>;

/** A spec number as written: at most three decimals (lengths come in eighths, 45.875), no trailing zeros. */
export function specNumber(n: number): string {
  return String(Math.round(n * 1000) / 1000);
}

const text = (s: string | null | undefined): string | null => {
  const t = s?.trim();
  return t ? t : null;
};

/** Adds `word` after `value` unless the value already says it ("Midsize" → "Midsize grip"). */
const withWord = (value: string, word: string): string => (value.toLowerCase().includes(word) ? value : `${value} ${word}`);

/**
 * A build's specs on one line, in workshop order: head, loft, hosel, lie, length, shaft (name,
 * weight, flex, torque), grip, swing weight, added mass. Notes are left out. Null when no spec is set.
 * @example buildSummary({ loftDeg: 10.5, hoselSetting: '+1', lengthIn: 45.75, … }) // => '10.5° · +1 hosel · 45.75 in'
 */
export function buildSummary(spec: Partial<BuildSpec>): string | null {
  const shaft = [
    text(spec.shaft),
    spec.shaftWeightG == null ? null : `${specNumber(spec.shaftWeightG)} g`,
    text(spec.shaftFlex),
    spec.torqueDeg == null ? null : `${specNumber(spec.torqueDeg)}° torque`,
  ].filter((p): p is string => p !== null);
  const hosel = text(spec.hoselSetting);
  const grip = text(spec.grip);
  const swingWeight = text(spec.swingWeight);
  const where = text(spec.addedMassWhere);
  let mass: string | null = null;
  if (spec.addedMassG != null) mass = `${specNumber(spec.addedMassG)} g ${where ?? 'added'}`;
  else if (where) mass = `mass ${where}`;
  const parts = [
    text(spec.head),
    spec.loftDeg == null ? null : `${specNumber(spec.loftDeg)}°`,
    hosel && withWord(hosel, 'hosel'),
    spec.lieDeg == null ? null : `lie ${specNumber(spec.lieDeg)}°`,
    spec.lengthIn == null ? null : `${specNumber(spec.lengthIn)} in`,
    shaft.length > 0 ? shaft.join(' ') : null,
    grip && withWord(grip, 'grip'),
    swingWeight && `${swingWeight} swing weight`,
    mass,
  ].filter((p): p is string => Boolean(p));
  return parts.length > 0 ? parts.join(' · ') : null;
}

/** How a build is named on screen: its label, or "No build named" for the shots whose file named none. */
export const buildName = (label: string): string => (label === '' ? 'No build named' : label);

export type ClubBuilds = { club: string; clubLabel: string; builds: Build[] };

/**
 * The builds grouped by club in bag order (driver first); within a club by label, the unnamed
 * group last. O(n log n).
 */
export function groupBuildsByClub(builds: readonly Build[]): ClubBuilds[] {
  const byClub = new Map<string, Build[]>();
  for (const b of builds) {
    const list = byClub.get(b.club);
    if (list) list.push(b);
    else byClub.set(b.club, [b]);
  }
  return [...byClub.keys()].sort(compareClubs).map((club) => ({
    club,
    clubLabel: clubInfo(club)?.label ?? club,
    builds: byClub.get(club)!.sort(compareLabels),
  }));
}

/** Named builds by label; the unnamed group ('') after them. */
function compareLabels(a: Build, b: Build): number {
  if (a.label === '' && b.label !== '') return 1;
  if (b.label === '' && a.label !== '') return -1;
  return a.label.localeCompare(b.label);
}
