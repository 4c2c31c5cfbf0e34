/**
 * findStrays against a second, naive implementation of the same written rules (its doc comment and
 * the constants it exports), on 2,000 generated sessions of 3 to 40 shots: values clustered and
 * rounded to a monitor's resolution, missing cells, rows repeated across bay files, columns absent,
 * and every kind of mishit (thin, topped, skied, far left or right, short alone, slow alone, a
 * misread smash factor). The reference is written apart from the product's code: medians and
 * median absolute deviations from simple-statistics (a reference library), the modified z-score
 * M = 0.6745·(x − median)/MAD of Iglewicz & Hoaglin ("How to Detect and Handle Outliers", ASQC
 * 1993; NIST/SEMATECH e-Handbook §1.3.5.17), each shot scored against the others in groups up to
 * 30 shots, O(n²) and with plain arrays. The ground rule's distances come from
 * robustGroundDistances, checked on its own against Gnanadesikan & Kettenring (1972); what is
 * checked here is which shots it sends to review and which way they are off. The MAD floors
 * (madFloor), the impact bound (smashFactorLimit) and the ground limit (groundDistanceLimit) are
 * also the product's, each checked in its own tests.
 * The rule constants themselves (3.5, 2.8, the shares, the floors) are our choices, common
 * practice, no source; tests/analysis/strays/find-strays.test.ts checks them at their boundaries.
 */
import { median as ssMedian, medianAbsoluteDeviation } from 'simple-statistics';
import { smashFactorLimit } from '@/analysis/physics';
import { seededRandom } from '@/fixtures/seeded-random';
import {
  findStrays,
  groundDistanceLimit,
  madFloor,
  MIN_SHOTS_FOR_GROUND,
  MIN_SHOTS_FOR_SCORE,
  MODIFIED_Z_LIMIT,
  offlineMadFloor,
  robustGroundDistances,
  type StrayInput,
} from '@/analysis/strays';
import { FAR_BELOW_SHARE, LEAVE_ONE_OUT_MAX_SHOTS, SUPPORTING_Z_LIMIT } from '@/analysis/strays/find-strays';

type Field = 'smashFactor' | 'ballSpeed' | 'launchAngle' | 'carry';
const FIELDS: Field[] = ['smashFactor', 'ballSpeed', 'launchAngle', 'carry'];

interface RefFlag {
  rule: string;
  kind: string;
  direction?: string;
  modifiedZ?: number;
  median?: number;
  madUsed?: number;
  floored?: boolean;
}
interface RefShot {
  row: number;
  index: number;
  kind: string;
  flags: RefFlag[];
}

/** Median and MAD of the finite values, with the field's floor under the MAD (null below 3 values). */
function scale(values: number[], field: Field): { median: number; mad: number; floored: boolean } | null {
  const finite = values.filter((v) => Number.isFinite(v));
  if (finite.length === 0) return null;
  const median = ssMedian(finite);
  const mad = medianAbsoluteDeviation(finite);
  const floor = madFloor(field, median);
  return mad < floor ? { median, mad: floor, floored: true } : { median, mad, floored: false };
}

function referenceStrays(input: StrayInput): RefShot[] {
  const n = input.rows.length;
  const get = (c: ArrayLike<number> | undefined) => (c ? Array.from(c) : undefined);
  const columns: Record<Field, number[] | undefined> = {
    smashFactor: get(input.smashFactor),
    ballSpeed: get(input.ballSpeedMps),
    launchAngle: get(input.launchAngleDeg),
    carry: get(input.carryM),
  };
  const flags: RefFlag[][] = Array.from({ length: n }, () => []);

  // Misreads: above the impact bound; their smash factors are not scored.
  const misread = new Array<boolean>(n).fill(false);
  const limit = input.club !== undefined ? smashFactorLimit(input.club) : null;
  if (columns.smashFactor && limit) {
    for (let i = 0; i < n; i++) {
      if (columns.smashFactor[i] > limit.limit) {
        misread[i] = true;
        flags[i].push({ rule: 'misread', kind: 'misread' });
      }
    }
    columns.smashFactor = columns.smashFactor.map((v, i) => (misread[i] ? Number.NaN : v));
  }
  const finiteCount = (c: number[] | undefined) => (c ? c.filter((v) => Number.isFinite(v)).length : 0);
  const hasStrike = finiteCount(columns.smashFactor) >= MIN_SHOTS_FOR_SCORE || finiteCount(columns.ballSpeed) >= MIN_SHOTS_FOR_SCORE;
  const small = n <= LEAVE_ONE_OUT_MAX_SHOTS;

  let excluded = misread.slice();
  let mishitFlags: RefFlag[][] = Array.from({ length: n }, () => []);
  for (let pass = 0; pass < (small ? 2 : 1); pass++) {
    // Per field and shot: the z the shot gets, on its worse side, and whether it is far below.
    const worse: Partial<Record<Field, number[]>> = {};
    const far: Partial<Record<Field, boolean[]>> = {};
    const zOf: Partial<Record<Field, number[]>> = {};
    const medianOf: Partial<Record<Field, number[]>> = {};
    const scaleOf: Partial<Record<Field, { mad: number; floored: boolean }[]>> = {};
    for (const field of FIELDS) {
      const values = columns[field];
      if (!values) continue;
      // The shots that count: those not excluded, or (second pass) all but misreads when that
      // would leave fewer than three.
      let counted = values.map((v, i) => (excluded[i] ? Number.NaN : v));
      if (finiteCount(counted) < MIN_SHOTS_FOR_SCORE) counted = values.map((v, i) => (misread[i] ? Number.NaN : v));
      const count = finiteCount(counted);
      if (count < MIN_SHOTS_FOR_SCORE) continue;
      const whole = scale(counted, field)!;
      const z: number[] = [];
      const med: number[] = [];
      const used: { mad: number; floored: boolean }[] = [];
      for (let i = 0; i < n; i++) {
        if (!Number.isFinite(values[i])) {
          z.push(Number.NaN);
          med.push(Number.NaN);
          used.push({ mad: Number.NaN, floored: false });
          continue;
        }
        const own = small && count > MIN_SHOTS_FOR_SCORE && Number.isFinite(counted[i]) ? scale(counted.filter((_, j) => j !== i), field)! : whole;
        z.push(own.mad > 0 ? (0.6745 * (values[i] - own.median)) / own.mad : 0);
        med.push(own.median);
        used.push({ mad: own.mad, floored: own.floored });
      }
      const share = FAR_BELOW_SHARE[field];
      zOf[field] = z;
      medianOf[field] = med;
      scaleOf[field] = used;
      worse[field] = z.map((v) => (!Number.isFinite(v) ? 0 : field === 'launchAngle' ? Math.abs(v) : Math.max(0, -v)));
      far[field] = values.map((v, i) => share !== undefined && v < (1 - share) * med[i]);
    }
    const w = (field: Field, i: number) => worse[field]?.[i] ?? 0;
    const next = misread.slice();
    mishitFlags = Array.from({ length: n }, () => []);
    for (let i = 0; i < n; i++) {
      const speed = Math.max(w('smashFactor', i), w('ballSpeed', i));
      const launch = w('launchAngle', i);
      const carry = w('carry', i);
      const signs = [speed, launch, carry].filter((v) => v > SUPPORTING_Z_LIMIT).length;
      const isMishit =
        speed > MODIFIED_Z_LIMIT ||
        launch > MODIFIED_Z_LIMIT ||
        signs >= 2 ||
        far.smashFactor?.[i] === true ||
        far.carry?.[i] === true ||
        (carry > MODIFIED_Z_LIMIT && !hasStrike);
      if (!isMishit) continue;
      next[i] = true;
      for (const field of FIELDS) {
        if (!worse[field]) continue;
        if (w(field, i) > SUPPORTING_Z_LIMIT || far[field]![i]) {
          mishitFlags[i].push({
            rule: field,
            kind: 'mishit',
            modifiedZ: zOf[field]![i],
            median: medianOf[field]![i],
            madUsed: scaleOf[field]![i].mad,
            floored: scaleOf[field]![i].floored,
          });
        }
      }
    }
    const changed = next.some((v, i) => v !== excluded[i]);
    excluded = next;
    if (!changed) break;
  }
  mishitFlags.forEach((list, i) => flags[i].push(...list));

  // The ground rule: far from the pattern on the ground, for review.
  const offline = get(input.offlineM);
  const carryM = columns.carry;
  if (offline && carryM) {
    const pairs = offline.filter((v, i) => Number.isFinite(v) && Number.isFinite(carryM[i])).length;
    if (pairs >= MIN_SHOTS_FOR_GROUND) {
      const medianCarry = ssMedian(carryM.filter((v) => Number.isFinite(v)));
      const g = robustGroundDistances(offline, carryM, { madFloorOfflineM: offlineMadFloor(medianCarry), madFloorCarryM: madFloor('carry', medianCarry), shortOnly: true });
      const limitD = groundDistanceLimit(pairs);
      for (let i = 0; i < n; i++) {
        if (!(g.distances[i] > limitD)) continue;
        const across = offline[i] - g.centerOffline;
        const along = carryM[i] - g.centerCarry;
        const sideways = Math.abs(across) / g.scaleOffline;
        const short = along < 0 ? -along / g.scaleCarry : 0;
        flags[i].push({ rule: 'ground', kind: 'review', direction: short > sideways ? 'short' : across < 0 ? 'left' : 'right' });
      }
    }
  }

  const order = ['misread', 'mishit', 'review'];
  return flags
    .map((list, index) => ({ row: input.rows[index], index, list }))
    .filter((s) => s.list.length > 0)
    .map(({ row, index, list }) => ({ row, index, kind: order[Math.min(...list.map((f) => order.indexOf(f.kind)))], flags: list }))
    .sort((a, b) => a.row - b.row || a.index - b.index);
}

// ---- generated sessions ----

const normal = (r: () => number) => Math.sqrt(-2 * Math.log(r() + 1e-12)) * Math.cos(2 * Math.PI * r());

const CLUBS = ['driver', '7-iron', 'hybrid-4', 'pitching-wedge', undefined];
const SIZES = [3, 4, 5, 6, 7, 8, 10, 12, 20, 30, 31, 40];

/** One club's group: a player's normal strikes around invented centres, with mishits of every kind. */
function generatedSession(seed: number): StrayInput {
  const r = seededRandom(seed);
  const n = SIZES[Math.floor(r() * SIZES.length)];
  const club = CLUBS[Math.floor(r() * CLUBS.length)];
  const speed0 = 50 + r() * 25;
  const smash0 = 1.3 + r() * 0.17;
  const launch0 = 8 + r() * 12;
  const carry0 = 120 + r() * 100;
  const rounded = r() < 0.5; // a monitor that shows 1.45, 12°, 187 m
  const rows: number[] = [];
  const cols = { carryM: [] as number[], smashFactor: [] as number[], offlineM: [] as number[], ballSpeedMps: [] as number[], launchAngleDeg: [] as number[] };
  for (let i = 0; i < n; i++) {
    let speed = speed0 + normal(r) * 0.8;
    let smash = smash0 + normal(r) * 0.012;
    let launch = launch0 + normal(r);
    let carry = carry0 + normal(r) * 3;
    let offline = normal(r) * 6;
    const kind = r();
    if (kind < 0.08) {
      smash -= 0.12; // thin
      speed *= 0.9;
      carry *= 0.8;
    } else if (kind < 0.13) {
      launch -= 8; // topped
      carry *= 0.6;
      speed *= 0.85;
    } else if (kind < 0.17) {
      launch += 7; // skied
      carry *= 0.85;
    } else if (kind < 0.22) offline += (r() < 0.5 ? -1 : 1) * 35; // far left or right
    else if (kind < 0.25) carry *= 0.7; // short alone
    else if (kind < 0.27) smash = 1.7; // a misread
    else if (kind < 0.3) speed *= 0.93; // slow alone
    else if (kind < 0.33) carry *= 0.88; // a little short
    if (rounded) {
      smash = Math.round(smash * 100) / 100;
      launch = Math.round(launch);
      carry = Math.round(carry);
      speed = Math.round(speed);
      offline = Math.round(offline);
    }
    const cell = (v: number) => (r() < 0.04 ? Number.NaN : v); // a missing cell
    rows.push(r() < 0.1 && i > 0 ? rows[i - 1] : i + 1); // rows repeat across bay files
    cols.carryM.push(cell(carry));
    cols.smashFactor.push(cell(smash));
    cols.offlineM.push(cell(offline));
    cols.ballSpeedMps.push(cell(speed));
    cols.launchAngleDeg.push(cell(launch));
  }
  const input: StrayInput = { rows };
  if (r() < 0.9) input.carryM = cols.carryM;
  if (r() < 0.7) input.smashFactor = cols.smashFactor;
  if (r() < 0.8) input.offlineM = cols.offlineM;
  if (r() < 0.7) input.ballSpeedMps = cols.ballSpeedMps;
  if (r() < 0.7) input.launchAngleDeg = cols.launchAngleDeg;
  if (club) input.club = club;
  return input;
}

/** The shots, kinds, rules and directions, with z to 1e-6, medians and MADs to 1e-9, and whether the floor was used. */
function summary(shots: { row: number; index: number; kind: string; flags: readonly object[] }[]): unknown {
  return shots.map((s) => ({
    row: s.row,
    index: s.index,
    kind: s.kind,
    flags: s.flags.map((f) => {
      const g = f as RefFlag;
      return {
        rule: g.rule,
        kind: g.kind,
        ...(g.direction ? { direction: g.direction } : {}),
        ...(g.modifiedZ !== undefined
          ? {
              modifiedZ: Math.round(g.modifiedZ * 1e6) / 1e6,
              median: Math.round(g.median! * 1e9) / 1e9,
              madUsed: Math.round(g.madUsed! * 1e9) / 1e9,
              floored: g.floored,
            }
          : {}),
      };
    }),
  }));
}

describe('findStrays agrees with a naive implementation of its written rules', () => {
  const sessions = Array.from({ length: 2000 }, (_, i) => generatedSession(i + 1));
  const expected = sessions.map(referenceStrays);

  it('on 2,000 generated sessions of 3–40 shots: the same shots, kinds, rules, directions, z, medians, MADs and floors', () => {
    // Stops at the first session that disagrees and shows it.
    sessions.forEach((session, i) => expect(summary(findStrays(session))).toEqual(summary(expected[i])));
  });

  it('the generated sessions exercise every rule: misreads, mishits of each field, each direction on the ground, and groups above the leave-one-out size', () => {
    const seen = new Set<string>();
    for (const strays of expected) {
      for (const shot of strays) for (const f of shot.flags) seen.add(f.direction ?? f.rule);
    }
    expect([...seen].sort()).toEqual(['ballSpeed', 'carry', 'launchAngle', 'left', 'misread', 'right', 'short', 'smashFactor']);
    expect(sessions.some((s) => s.rows.length > LEAVE_ONE_OUT_MAX_SHOTS)).toBe(true);
  });
});
