import { SHOT_FIELDS } from '@/analysis/fields';
import type { Shot, ShotField } from '@/analysis/fields';

/** One group's shots as aligned typed columns; NaN marks a missing value. */
export interface ShotColumns {
  club: string;
  build: string | null;
  rows: Float64Array;
  /** Only fields that at least one shot of the group has. */
  fields: Partial<Record<ShotField, Float64Array>>;
  /** smashFactor where the shot has it, else ballSpeed / clubSpeed (NaN when neither). */
  smashFactor: Float64Array;
}

const FIELD_SLOT: ReadonlyMap<string, number> = new Map(SHOT_FIELDS.map((field, k) => [field, k]));

/**
 * Splits shots into groups (club × build) and lays each group out as typed columns: one pass to
 * group, one pass over each shot's own values (so absent fields cost nothing). Groups come in
 * order of first appearance; within a group, shots keep their input order. O(n · fields).
 * @example shotColumns(shots)[0].fields.carry // => Float64Array of that group's carries
 */
export function shotColumns(shots: readonly Shot[]): ShotColumns[] {
  const byClub = new Map<string, Map<string | null, number>>();
  const refs: { club: string; build: string | null }[] = [];
  const counts: number[] = [];
  const groupOf = new Int32Array(shots.length);
  const position = new Int32Array(shots.length);
  for (let i = 0; i < shots.length; i++) {
    const shot = shots[i];
    let builds = byClub.get(shot.club);
    if (!builds) {
      builds = new Map();
      byClub.set(shot.club, builds);
    }
    let g = builds.get(shot.build);
    if (g === undefined) {
      g = refs.length;
      builds.set(shot.build, g);
      refs.push({ club: shot.club, build: shot.build });
      counts.push(0);
    }
    groupOf[i] = g;
    position[i] = counts[g]++;
  }

  const fieldCount = SHOT_FIELDS.length;
  const columns: (Float64Array | undefined)[] = new Array(refs.length * fieldCount);
  const rows = counts.map((n) => new Float64Array(n));
  const lastKeys: string[] = [];
  const lastSlots: (number | undefined)[] = [];
  for (let i = 0; i < shots.length; i++) {
    const shot = shots[i];
    const g = groupOf[i];
    const j = position[i];
    rows[g][j] = shot.row;
    const values = shot.values as Record<string, number | undefined>;
    let q = 0;
    for (const key in values) {
      // Shots of one file share their keys in the same order: match the last shot's keys first.
      let k: number | undefined;
      if (q < lastKeys.length && lastKeys[q] === key) k = lastSlots[q];
      else {
        k = FIELD_SLOT.get(key);
        lastKeys[q] = key;
        lastSlots[q] = k;
      }
      q++;
      const value = values[key];
      if (k === undefined || typeof value !== 'number') continue;
      const c = g * fieldCount + k;
      let column = columns[c];
      if (!column) {
        column = new Float64Array(counts[g]).fill(Number.NaN);
        columns[c] = column;
      }
      column[j] = value;
    }
  }

  return refs.map((ref, g) => {
    const n = counts[g];
    const fields: Partial<Record<ShotField, Float64Array>> = {};
    for (let k = 0; k < fieldCount; k++) {
      const column = columns[g * fieldCount + k];
      if (column) fields[SHOT_FIELDS[k]] = column;
    }
    const smashFactor = new Float64Array(n).fill(Number.NaN);
    const given = fields.smashFactor;
    const ball = fields.ballSpeed;
    const club = fields.clubSpeed;
    for (let j = 0; j < n; j++) {
      if (given && Number.isFinite(given[j])) smashFactor[j] = given[j];
      else if (ball && club && club[j] > 0) smashFactor[j] = ball[j] / club[j];
    }
    return { club: ref.club, build: ref.build, rows: rows[g], fields, smashFactor };
  });
}
