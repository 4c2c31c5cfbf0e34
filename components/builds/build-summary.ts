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

/** A no-break space: a number stays with its unit and label when a line wraps ("Length 46 in"). */
export const NBSP = '\u00a0';

/** Adds `word` after `value` unless the value already says it ("R" → "R flex", "Stiff flex" stays). */
const withWord = (value: string, word: string): string => (value.toLowerCase().includes(word) ? value : `${value}${NBSP}${word}`);

/** "Label: value" for free text, unless the value already starts with the label ("Hosel 3"). */
const labelled = (label: string, value: string): string =>
  value.toLowerCase().startsWith(label.toLowerCase()) ? value : `${label}: ${value}`;

const joinParts = (parts: readonly (string | null)[]): string | null => {
  const kept = parts.filter((p): p is string => Boolean(p));
  // The dot stays at the end of a line when the line wraps.
  return kept.length > 0 ? kept.join(`${NBSP}· `) : null;
};

/**
 * A build's specs as labelled lines, in workshop order: the head and its geometry (head, loft,
 * hosel, lie, length), the shaft (name, weight, flex, torque), then grip, swing weight and added
 * mass. Every part says what it is, so a number in a shaft's name is not read as its weight.
 * A number is joined to its unit and label by no-break spaces, so a narrow screen wraps between
 * parts, not inside one. Notes are left out; lines with nothing set are left out. O(1).
 * @example buildSpecLines({ shaft: 'Test graphite 75', shaftWeightG: 75, shaftFlex: 'R' }) // => ['Shaft: Test graphite 75 · 75 g · R flex']
 */
export function buildSpecLines(spec: Partial<BuildSpec>): string[] {
  const head = text(spec.head);
  const hosel = text(spec.hoselSetting);
  const shaft = text(spec.shaft);
  const flex = text(spec.shaftFlex);
  const grip = text(spec.grip);
  const swingWeight = text(spec.swingWeight);
  const where = text(spec.addedMassWhere);
  const shaftParts = [
    spec.shaftWeightG == null ? null : `${specNumber(spec.shaftWeightG)}${NBSP}g`,
    flex && withWord(flex, 'flex'),
    spec.torqueDeg == null ? null : `${specNumber(spec.torqueDeg)}°${NBSP}torque`,
  ];
  const shaftLine = joinParts([shaft, ...shaftParts]);
  let mass: string | null = null;
  if (spec.addedMassG != null) mass = `Added mass: ${specNumber(spec.addedMassG)}${NBSP}g${where ? ` ${where}` : ''}`;
  else if (where) mass = `Added mass: ${where}`;
  const lines = [
    joinParts([
      head && labelled('Head', head),
      spec.loftDeg == null ? null : `Loft${NBSP}${specNumber(spec.loftDeg)}°`,
      hosel && labelled('Hosel', hosel),
      spec.lieDeg == null ? null : `Lie${NBSP}${specNumber(spec.lieDeg)}°`,
      spec.lengthIn == null ? null : `Length${NBSP}${specNumber(spec.lengthIn)}${NBSP}in`,
    ]),
    shaftLine && (shaft ? labelled('Shaft', shaftLine) : `Shaft: ${shaftLine}`),
    joinParts([grip && labelled('Grip', grip), swingWeight && `Swing${NBSP}weight${NBSP}${swingWeight}`, mass]),
  ];
  return lines.filter((l): l is string => l !== null);
}

/**
 * A build's specs for a list: the labelled lines of `buildSpecLines`, one under the other. Null
 * when no spec is set.
 * @example buildSummary({ loftDeg: 10.5, hoselSetting: '+1', lengthIn: 45.75 }) // => 'Loft 10.5° · Hosel: +1 · Length 45.75 in'
 */
export function buildSummary(spec: Partial<BuildSpec>): string | null {
  const lines = buildSpecLines(spec);
  return lines.length > 0 ? lines.join('\n') : null;
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
