import { MODIFIED_Z_LIMIT, modifiedZScores } from './modified-z-score';
import { predictionScale2 } from '@/analysis/ovals';
import { GROUND_DISTANCE_LIMIT, GROUND_STRAY_LEVEL, robustGroundDistances } from './robust-ground-distance';

/** Which rule flagged a shot. */
export type StrayRule = 'carry' | 'smashFactor' | 'ground';

/** One rule's flag on one shot, with the numbers behind it (canonical units). */
export type StrayFlag =
  | { rule: 'carry' | 'smashFactor'; value: number; median: number; modifiedZ: number }
  | {
      rule: 'ground';
      /** Robust distance from the group's pattern (standardised units). */
      distance: number;
      limit: number;
      /** The shot's offline and carry less the group's median centre, m. */
      offlineFromCenterM: number;
      carryFromCenterM: number;
    };

/** A shot flagged by at least one rule. */
export interface StrayShot {
  row: number;
  /** Position of the shot in the input columns (rows need not be unique across bay files). */
  index: number;
  flags: StrayFlag[];
}

/** One group's shots as aligned columns (index i is one shot); NaN marks a missing value. */
export interface StrayInput {
  rows: ArrayLike<number>;
  carryM?: ArrayLike<number>;
  smashFactor?: ArrayLike<number>;
  offlineM?: ArrayLike<number>;
}

/** Fewest values for the one-field rules (carry, smash factor). */
export const MIN_SHOTS_FOR_SCORE = 3;
/** Fewest shots with offline and carry for the ground rule. */
export const MIN_SHOTS_FOR_GROUND = 5;

function countFinite(values: ArrayLike<number>): number {
  let n = 0;
  for (let i = 0; i < values.length; i++) if (Number.isFinite(values[i])) n++;
  return n;
}

function countFinitePairs(x: ArrayLike<number>, y: ArrayLike<number>): number {
  let n = 0;
  const length = Math.min(x.length, y.length);
  for (let i = 0; i < length; i++) if (Number.isFinite(x[i]) && Number.isFinite(y[i])) n++;
  return n;
}

/**
 * The robust-distance limit for a group of n shots: the 99.9% prediction region of the next
 * shot, sqrt(k²) with Hotelling's k² = 2(n−1)(n+1)/(n(n−2))·F(2, n−2; 0.999), which allows for
 * the centre and spread being estimated from few shots and falls to sqrt(χ²₂(0.999)) ≈ 3.72 as n
 * grows. With the bare χ² limit, groups of 8–12 shots lost a third of their good shots to the
 * ground rule (MAD scales from so few shots are noisy). O(1).
 * @example groundDistanceLimit(10) // => 6.77
 */
export function groundDistanceLimit(n: number): number {
  if (n < 3) return Infinity;
  return Math.max(GROUND_DISTANCE_LIMIT, Math.sqrt(predictionScale2(n, GROUND_STRAY_LEVEL)));
}

/**
 * Strays of one group of shots (one club and build) by three robust rules:
 * carry and smash factor each by the modified z-score within the group (|M| > 3.5; Iglewicz &
 * Hoaglin 1993), and the landing spot by its robust distance from the group's pattern (median
 * centre, MAD scales, Gnanadesikan–Kettenring correlation) beyond `groundDistanceLimit(n)`.
 * The one-field rules need 3 values, the ground rule 5 shots. Only statistics of the whole group
 * are used, so the result does not depend on the order of the shots; it is sorted by row.
 * O(n) expected.
 * @throws RangeError when a column's length differs from rows'
 * @example findStrays({ rows: [1, 2, 3, 4, 5], carryM: [148, 150, 147, 149, 112] }) // => [{ row: 5, index: 4, flags: [{ rule: 'carry', … }] }]
 */
export function findStrays(input: StrayInput): StrayShot[] {
  const n = input.rows.length;
  for (const column of [input.carryM, input.smashFactor, input.offlineM]) {
    if (column && column.length !== n) throw new RangeError('findStrays: every column needs one value per row');
  }
  const flags: (StrayFlag[] | undefined)[] = new Array(n);
  const add = (i: number, flag: StrayFlag) => {
    (flags[i] ??= []).push(flag);
  };
  for (const rule of ['carry', 'smashFactor'] as const) {
    const values = rule === 'carry' ? input.carryM : input.smashFactor;
    if (!values || countFinite(values) < MIN_SHOTS_FOR_SCORE) continue;
    const z = modifiedZScores(values);
    for (let i = 0; i < n; i++) {
      const m = z.scores[i];
      if (Math.abs(m) > MODIFIED_Z_LIMIT) add(i, { rule, value: values[i], median: z.median, modifiedZ: m });
    }
  }
  if (input.offlineM && input.carryM && countFinitePairs(input.offlineM, input.carryM) >= MIN_SHOTS_FOR_GROUND) {
    const ground = robustGroundDistances(input.offlineM, input.carryM);
    const limit = groundDistanceLimit(countFinitePairs(input.offlineM, input.carryM));
    for (let i = 0; i < n; i++) {
      const d = ground.distances[i];
      if (d > limit) {
        add(i, {
          rule: 'ground',
          distance: d,
          limit,
          offlineFromCenterM: input.offlineM[i] - ground.centerOffline,
          carryFromCenterM: input.carryM[i] - ground.centerCarry,
        });
      }
    }
  }
  const strays: StrayShot[] = [];
  for (let i = 0; i < n; i++) {
    const list = flags[i];
    if (list) strays.push({ row: input.rows[i], index: i, flags: list });
  }
  return strays.sort((a, b) => a.row - b.row || a.index - b.index);
}
