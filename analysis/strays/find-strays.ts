import { predictionScale2 } from '@/analysis/ovals';
import { smashFactorLimit } from '@/analysis/physics';
import { medianInPlace } from '@/analysis/statistics';
import { MODIFIED_Z_LIMIT, modifiedZScores } from './modified-z-score';
import { GROUND_DISTANCE_LIMIT, GROUND_STRAY_LEVEL, robustGroundDistances } from './robust-ground-distance';
import { madFloor, offlineMadFloor, type ScoredField } from './stray-floors';

/** Which rule flagged a shot. */
export type StrayRule = 'misread' | ScoredField | 'ground';

/**
 * What a flag means for the shot: a misread (a value no real shot gives) and a mishit (struck
 * clearly worse than the player's normal ones) are left out of the figures unless the fitter
 * keeps them; a shot far off the pattern on the ground is only shown for review and stays in.
 */
export type StrayKind = 'misread' | 'mishit' | 'review';

/** One rule's flag on one shot, with the numbers behind it (canonical units). */
export type StrayFlag =
  | {
      rule: 'misread';
      kind: 'misread';
      field: 'smashFactor';
      value: number;
      /** The highest value the impact allows for the club, measurement error included. */
      limit: number;
    }
  | {
      rule: ScoredField;
      kind: 'mishit';
      value: number;
      median: number;
      modifiedZ: number;
      /** The MAD the score used: the group's, or the floor when that was larger. */
      madUsed: number;
      floored: boolean;
    }
  | {
      rule: 'ground';
      kind: 'review';
      /** Left or right: a directional miss (the player's dispersion); short: short of the pattern for its line. */
      direction: 'left' | 'right' | 'short';
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
  /** The gravest kind among its flags: misread, then mishit, then review. */
  kind: StrayKind;
  flags: StrayFlag[];
}

/** One group's shots as aligned columns (index i is one shot); NaN marks a missing value. */
export interface StrayInput {
  rows: ArrayLike<number>;
  /** Canonical club code, for the impact bound on smash factor (misreads). */
  club?: string;
  carryM?: ArrayLike<number>;
  smashFactor?: ArrayLike<number>;
  offlineM?: ArrayLike<number>;
  ballSpeedMps?: ArrayLike<number>;
  launchAngleDeg?: ArrayLike<number>;
}

/** Fewest values for the one-field rules. */
export const MIN_SHOTS_FOR_SCORE = 3;
/** Fewest shots with offline and carry for the ground rule. */
export const MIN_SHOTS_FOR_GROUND = 5;

/** The fields read for a strike, in the order their flags are listed. */
const SCORED_FIELDS: readonly ScoredField[] = ['smashFactor', 'ballSpeed', 'launchAngle', 'carry'];

/**
 * A reading that backs another: beyond this modified z (on its worse side) a field counts as a
 * sign of a mishit when another field shows one too. Our choice: with two signs at 2.8 the
 * chance that a normal shot shows both by luck is about as small as one sign at 3.5.
 */
export const SUPPORTING_Z_LIMIT = 2.8;
/** Groups up to this many shots score each shot against the others only (leave one out). */
export const LEAVE_ONE_OUT_MAX_SHOTS = 30;
/**
 * Shares of the group's median (of the other shots) below which a reading is a mishit whatever
 * the group's spread: a smash factor 6% low (about 15 yd of a drive) or a carry a quarter short.
 * Our choice (common practice, no source): a player's normal strikes rarely fall that far, and
 * a small group's scale, read from values rounded to a monitor's resolution, can be too coarse
 * to show it.
 */
export const FAR_BELOW_SHARE: Readonly<Partial<Record<ScoredField, number>>> = { smashFactor: 0.06, carry: 0.25 };

const MAD_FACTOR = 0.6745;

/**
 * Modified z of each shot for one field: against the others only in small groups; excluded shots
 * never count in a centre or scale. `excluded` lists exclusion sets, most first: the first that
 * leaves MIN_SHOTS_FOR_SCORE values is used (so the second pass of a three-shot group, which
 * would leave two values once its mishit is set aside, scores as the first did).
 */
function fieldScores(values: ArrayLike<number>, excluded: readonly Uint8Array[], field: ScoredField): { z: Float64Array; median: Float64Array; mad: Float64Array; floored: Uint8Array } | null {
  const n = values.length;
  const basis = new Float64Array(n);
  let count = 0;
  for (const set of excluded) {
    count = 0;
    for (let i = 0; i < n; i++) {
      basis[i] = set[i] === 1 ? Number.NaN : values[i];
      if (Number.isFinite(basis[i])) count++;
    }
    if (count >= MIN_SHOTS_FOR_SCORE) break;
  }
  if (count < MIN_SHOTS_FOR_SCORE) return null;
  const z = new Float64Array(n).fill(Number.NaN);
  const median = new Float64Array(n).fill(Number.NaN);
  const mad = new Float64Array(n).fill(Number.NaN);
  const floored = new Uint8Array(n);
  const floorOf = (m: number) => madFloor(field, m);
  const whole = modifiedZScores(basis, floorOf);
  const leaveOneOut = n <= LEAVE_ONE_OUT_MAX_SHOTS && count > MIN_SHOTS_FOR_SCORE;
  for (let i = 0; i < n; i++) {
    const x = values[i];
    if (!Number.isFinite(x)) continue;
    let centre = whole.median;
    let scale = whole.madUsed;
    let floor = whole.scale === 'floor';
    if (leaveOneOut && Number.isFinite(basis[i])) {
      const held = basis[i];
      basis[i] = Number.NaN;
      const others = modifiedZScores(basis, floorOf);
      basis[i] = held;
      centre = others.median;
      scale = others.madUsed;
      floor = others.scale === 'floor';
    }
    median[i] = centre;
    mad[i] = scale;
    floored[i] = floor ? 1 : 0;
    z[i] = scale > 0 ? (MAD_FACTOR * (x - centre)) / scale : 0;
  }
  return { z, median, mad, floored };
}

/**
 * The mishit rules on one group (see findStrays); in groups up to LEAVE_ONE_OUT_MAX_SHOTS in two
 * passes: the second scores every shot against the shots the first did not call mishits or
 * misreads, so two mishits in a small group do not hide each other. O(n²) for those small
 * groups, O(n) above.
 */
function scoreStrikes(columns: Record<ScoredField, ArrayLike<number> | undefined>, misread: readonly number[], n: number): StrayFlag[][] {
  const misreadOnly = Uint8Array.from(misread);
  let excluded = Uint8Array.from(misread);
  let result: StrayFlag[][] = [];
  const hasStrike = [columns.smashFactor, columns.ballSpeed].some((c) => c !== undefined && countFinite(c) >= MIN_SHOTS_FOR_SCORE);
  // A second look only in small groups, where two mishits can hide each other; in a large group
  // a few mishits barely move the median and the MAD.
  const passes = n <= LEAVE_ONE_OUT_MAX_SHOTS ? 2 : 1;
  for (let pass = 0; pass < passes; pass++) {
    const scores: Partial<Record<ScoredField, NonNullable<ReturnType<typeof fieldScores>>>> = {};
    for (const field of SCORED_FIELDS) {
      const values = columns[field];
      const s = values ? fieldScores(values, pass === 0 ? [excluded] : [excluded, misreadOnly], field) : null;
      if (s) scores[field] = s;
    }
    // Per field, each shot's z on its worse side (lower for smash, ball speed and carry, either
    // way for launch) and whether it is far below the median by share; worked out once per pass.
    const worse: Partial<Record<ScoredField, Float64Array>> = {};
    const farBelow: Partial<Record<ScoredField, Uint8Array>> = {};
    for (const field of SCORED_FIELDS) {
      const s = scores[field];
      if (!s) continue;
      const w = new Float64Array(n);
      const far = new Uint8Array(n);
      const share = FAR_BELOW_SHARE[field];
      const values = columns[field]!;
      for (let i = 0; i < n; i++) {
        const z = s.z[i];
        w[i] = !Number.isFinite(z) ? 0 : field === 'launchAngle' ? Math.abs(z) : Math.max(0, -z);
        far[i] = share !== undefined && values[i] < (1 - share) * s.median[i] ? 1 : 0;
      }
      worse[field] = w;
      farBelow[field] = far;
    }
    const zero = new Float64Array(n);
    const none = new Uint8Array(n);
    const smashW = worse.smashFactor ?? zero;
    const ballW = worse.ballSpeed ?? zero;
    const launchW = worse.launchAngle ?? zero;
    const carryW = worse.carry ?? zero;
    const smashFar = farBelow.smashFactor ?? none;
    const carryFar = farBelow.carry ?? none;
    result = new Array(n);
    const next = Uint8Array.from(misread);
    for (let i = 0; i < n; i++) {
      result[i] = [];
      const speed = Math.max(smashW[i], ballW[i]);
      const launch = launchW[i];
      const carry = carryW[i];
      const signs = (speed > SUPPORTING_Z_LIMIT ? 1 : 0) + (launch > SUPPORTING_Z_LIMIT ? 1 : 0) + (carry > SUPPORTING_Z_LIMIT ? 1 : 0);
      // Carry alone speaks for the strike only when nothing else was measured, or when far short:
      // short carry from a normal strike is the flight (a curve), the player's dispersion.
      const mishit =
        speed > MODIFIED_Z_LIMIT ||
        launch > MODIFIED_Z_LIMIT ||
        signs >= 2 ||
        smashFar[i] === 1 ||
        carryFar[i] === 1 ||
        (carry > MODIFIED_Z_LIMIT && !hasStrike);
      if (!mishit) continue;
      for (const field of SCORED_FIELDS) {
        const s = scores[field];
        if (!s || !(worse[field]![i] > SUPPORTING_Z_LIMIT || farBelow[field]![i] === 1)) continue;
        result[i].push({ rule: field, kind: 'mishit', value: columns[field]![i], median: s.median[i], modifiedZ: s.z[i], madUsed: s.mad[i], floored: s.floored[i] === 1 });
      }
      next[i] = 1;
    }
    let same = true;
    for (let i = 0; i < n; i++) if (next[i] !== excluded[i]) same = false;
    excluded = next;
    if (same) break;
  }
  return result;
}

const KIND_ORDER: Readonly<Record<StrayKind, number>> = { misread: 0, mishit: 1, review: 2 };

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

function medianOf(values: ArrayLike<number>): number {
  const finite = new Float64Array(values.length);
  let m = 0;
  for (let i = 0; i < values.length; i++) if (Number.isFinite(values[i])) finite[m++] = values[i];
  return m === 0 ? Number.NaN : medianInPlace(finite, m);
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
 * Strays of one group of shots (one club and build), as a fitter means them:
 * - misread: a smash factor above what the impact allows for the club (analysis/physics,
 *   Penner 2003, with an allowance for measurement error);
 * - mishit: smash factor, ball speed or carry far below the group, or launch far off it either
 *   way, by the modified z-score (Iglewicz & Hoaglin 1993, |M| > 3.5) with a floor under each
 *   MAD (STRAY_FLOORS) so clustered or rounded values never make normal shots strays. One-sided
 *   where the trade is: a shot is never a stray for being better;
 * - review: the landing spot far from the group's pattern (robust distance beyond
 *   `groundDistanceLimit(n)`, carry counted only when short), said as a directional miss (left,
 *   right: the player's dispersion) or short; such shots stay in the figures unless dropped.
 * Misread smash factors are left out of the smash-factor rule's median. The one-field rules need
 * 3 values, the ground rule 5 shots. Only statistics of the whole group are used, so the result
 * does not depend on the order of the shots; it is sorted by row. O(n) expected.
 * @throws RangeError when a column's length differs from rows'
 * @example findStrays({ rows: [1, 2, 3, 4, 5], carryM: [148, 150, 147, 149, 112] }) // => [{ row: 5, index: 4, kind: 'mishit', flags: [{ rule: 'carry', … }] }]
 */
export function findStrays(input: StrayInput): StrayShot[] {
  const n = input.rows.length;
  for (const column of [input.carryM, input.smashFactor, input.offlineM, input.ballSpeedMps, input.launchAngleDeg]) {
    if (column && column.length !== n) throw new RangeError('findStrays: every column needs one value per row');
  }
  const flags: (StrayFlag[] | undefined)[] = new Array(n);
  const add = (i: number, flag: StrayFlag) => {
    (flags[i] ??= []).push(flag);
  };

  // Misreads first: their smash factors do not count in the group's smash-factor median.
  let smash = input.smashFactor;
  const bound = smash && input.club !== undefined ? smashFactorLimit(input.club) : null;
  if (smash && bound) {
    let cleaned: Float64Array | undefined;
    for (let i = 0; i < n; i++) {
      if (smash[i] > bound.limit) {
        add(i, { rule: 'misread', kind: 'misread', field: 'smashFactor', value: smash[i], limit: bound.limit });
        cleaned ??= Float64Array.from({ length: n }, (_, j) => smash![j]);
        cleaned[i] = Number.NaN;
      }
    }
    if (cleaned) smash = cleaned;
  }

  const columns: Record<ScoredField, ArrayLike<number> | undefined> = {
    smashFactor: smash,
    ballSpeed: input.ballSpeedMps,
    carry: input.carryM,
    launchAngle: input.launchAngleDeg,
  };
  const scored = scoreStrikes(columns, Array.from({ length: n }, (_, i) => (flags[i] ? 1 : 0)), n);
  for (let i = 0; i < n; i++) for (const f of scored[i]) add(i, f);

  if (input.offlineM && input.carryM) {
    const pairs = countFinitePairs(input.offlineM, input.carryM);
    if (pairs >= MIN_SHOTS_FOR_GROUND) {
      const medianCarry = medianOf(input.carryM);
      const ground = robustGroundDistances(input.offlineM, input.carryM, {
        madFloorOfflineM: offlineMadFloor(medianCarry),
        madFloorCarryM: madFloor('carry', medianCarry),
        shortOnly: true,
      });
      const limit = groundDistanceLimit(pairs);
      for (let i = 0; i < n; i++) {
        const d = ground.distances[i];
        if (!(d > limit)) continue;
        const across = input.offlineM[i] - ground.centerOffline;
        const along = input.carryM[i] - ground.centerCarry;
        // Which way it is off, in standardised units (the carry part counts only when short).
        const u = Math.abs(across) / ground.scaleOffline;
        const v = along < 0 ? -along / ground.scaleCarry : 0;
        const direction = v > u ? 'short' : across < 0 ? 'left' : 'right';
        add(i, { rule: 'ground', kind: 'review', direction, distance: d, limit, offlineFromCenterM: across, carryFromCenterM: along });
      }
    }
  }

  const strays: StrayShot[] = [];
  for (let i = 0; i < n; i++) {
    const list = flags[i];
    if (!list) continue;
    let kind: StrayKind = 'review';
    for (const f of list) if (KIND_ORDER[f.kind] < KIND_ORDER[kind]) kind = f.kind;
    strays.push({ row: input.rows[i], index: i, kind, flags: list });
  }
  return strays.sort((a, b) => a.row - b.row || a.index - b.index);
}
