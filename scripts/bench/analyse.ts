// Benchmark of the analysis core: 100,000 invented shots, 14 clubs × 3 builds.
// Run: node --import tsx -e "console.log(require('./scripts/bench/analyse.ts').benchAnalyse())"
import type { Shot, ShotField } from '@/analysis/fields';
import { analyseSession } from '@/analysis/session';
import { seededRandom } from '@/fixtures/seeded-random';

const CLUBS = ['DR', '3W', '5W', '4H', '5I', '6I', '7I', '8I', '9I', 'PW', 'GW', 'SW', 'LW', 'W58'];
const BUILDS = ['A', 'B', 'C'];
const FIELDS: ShotField[] = [
  'clubSpeed', 'ballSpeed', 'launchAngle', 'launchDirection', 'spinRate', 'backSpin', 'sideSpin',
  'spinAxis', 'carry', 'total', 'offline', 'apexHeight', 'descentAngle', 'flightTime',
];


/** Invented shots for the benchmark: plausible numbers, no real player or device. */
export function benchShots(count = 100_000, seed = 7): Shot[] {
  const next = seededRandom(seed);
  const normal = () => Math.sqrt(-2 * Math.log(1 - next())) * Math.cos(2 * Math.PI * next());
  const shots: Shot[] = new Array(count);
  for (let i = 0; i < count; i++) {
    const c = i % CLUBS.length;
    const b = Math.floor(i / CLUBS.length) % BUILDS.length;
    const mishit = next() < 0.02 ? 0.75 : 1;
    const clubSpeed = 48 - 1.6 * c + 1.2 * normal();
    const ballSpeed = clubSpeed * (1.48 - 0.02 * c) * mishit + 0.6 * normal();
    const carry = (235 - 11 * c + 2 * b) * mishit + 4 * normal();
    const offline = 6 * normal() + 0.3 * c;
    const values: Partial<Record<ShotField, number>> = {};
    for (const field of FIELDS) values[field] = 0;
    values.clubSpeed = clubSpeed;
    values.ballSpeed = ballSpeed;
    values.launchAngle = 11 + 1.8 * c + 1.5 * normal();
    values.launchDirection = 1.5 * normal();
    values.backSpin = 2600 + 550 * c + 300 * normal();
    values.sideSpin = 400 * normal();
    values.spinRate = Math.hypot(values.backSpin, values.sideSpin);
    values.spinAxis = (Math.atan2(values.sideSpin, values.backSpin) * 180) / Math.PI;
    values.carry = carry;
    values.total = carry + 15 - c + 2 * normal();
    values.offline = offline;
    values.apexHeight = 28 + 0.5 * c + 2 * normal();
    values.descentAngle = 38 + 1.5 * c + 2 * normal();
    values.flightTime = 6.2 - 0.1 * c + 0.3 * normal();
    shots[i] = { row: i + 1, club: CLUBS[c], build: BUILDS[b], values, derived: [] };
  }
  return shots;
}

/** A bare single pass of count, mean and variance per field over the same shots. */
function bareLoop(shots: readonly Shot[]): number {
  let check = 0;
  for (const field of FIELDS) {
    let n = 0;
    let sum = 0;
    let squares = 0;
    for (let i = 0; i < shots.length; i++) {
      const x = shots[i].values[field];
      if (x === undefined) continue;
      n++;
      sum += x;
      squares += x * x;
    }
    const mean = sum / n;
    check += mean + (squares - n * mean * mean) / (n - 1);
  }
  return check;
}

function fastest(run: () => unknown, times: number): number {
  let best = Number.POSITIVE_INFINITY;
  for (let i = 0; i < times; i++) {
    const start = performance.now();
    run();
    best = Math.min(best, performance.now() - start);
  }
  return best;
}

/**
 * Times analyseSession (summaries, ovals, strays, ladder) on 100,000 invented shots in 14 clubs
 * × 3 builds, against a bare single-pass mean/variance loop over the same shots and fields.
 * Each figure is the fastest of several runs after a warm-up. Targets: ms < 150, ratio ≤ 4.
 */
export function benchAnalyse(): { ms: number; loopMs: number; ratio: number } {
  const shots = benchShots();
  let sink = 0;
  const analyse = () => {
    sink += analyseSession(shots).groups.length;
  };
  const loop = () => {
    sink += bareLoop(shots);
  };
  fastest(analyse, 2);
  fastest(loop, 2);
  const ms = fastest(analyse, 7);
  const loopMs = fastest(loop, 7);
  if (!Number.isFinite(sink)) throw new Error('benchmark lost its results');
  return { ms, loopMs, ratio: ms / loopMs };
}
