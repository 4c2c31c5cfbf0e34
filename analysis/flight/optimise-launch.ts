import { resolveAir } from './air-conditions';
import type { Conditions } from './conditions';
import { simulateFlight, type FlightOptions } from './simulate-flight';

/** What a launch window maximises: carry, or total (carry and roll on the stated ground). */
export type WindowObjective = 'carry' | 'total';

export interface OptimiseOptions extends FlightOptions {
  /** Maximise carry (default) or total. */
  objective?: WindowObjective;
  /** Only launches that land at least this steep count (deg); default none. */
  minDescentDeg?: number;
  /** Launch angles searched (deg), inclusive. Default [2, 44]. */
  launchRangeDeg?: readonly [number, number];
  /** Spin rates searched (rpm), inclusive; equal ends fix the spin. Default [0, 12000]. */
  spinRangeRpm?: readonly [number, number];
  /** Fine grid step of launch angle (deg), over the window. Default 0.5. */
  launchStepDeg?: number;
  /** Fine grid step of spin rate (rpm), over the window. Default 100. */
  spinStepRpm?: number;
  /** The window holds launches within this many percent of the best. Default 1. */
  withinPct?: number;
}

/** One launch-angle line of the window: the spin rates within the window at that launch. */
export interface WindowRow {
  launchAngleDeg: number;
  spinMinRpm: number;
  spinMaxRpm: number;
}

export interface LaunchWindow {
  /** The objective's value at the window's edge (m): (1 − withinPct/100) × the best. */
  thresholdM: number;
  launchRangeDeg: [number, number];
  spinRangeRpm: [number, number];
  /** Per fine-grid launch angle, the spin interval inside the window (edges interpolated). */
  rows: WindowRow[];
  /**
   * The window's outline on a launch-vs-spin plot: from the interpolated bottom tip up the
   * low-spin edge to the top tip and back down the high-spin edge (closed implicitly).
   */
  polygon: { launchAngleDeg: number; spinRateRpm: number }[];
  /** True when the window reaches the edge of the searched ranges (widen them). */
  clipped: boolean;
}

export interface LaunchPick {
  launchAngleDeg: number;
  spinRateRpm: number;
  carryM: number;
  totalM: number;
  descentAngleDeg: number;
  /** The objective's value (carryM or totalM). */
  valueM: number;
}

export interface LaunchOptimum {
  ballSpeedMps: number;
  objective: WindowObjective;
  minDescentDeg: number | null;
  /** False when no searched launch lands as steep as `minDescentDeg` (then the window is empty). */
  feasible: boolean;
  best: LaunchPick;
  /** True when the best launch lies on the searched ranges' edge (widen them). */
  bestOnEdge: boolean;
  window: LaunchWindow;
  /** The fine grid over the window: valueM[i][j] and descentDeg[i][j] for launchAnglesDeg[i], spinRatesRpm[j]. */
  grid: { launchAnglesDeg: number[]; spinRatesRpm: number[]; valueM: number[][]; descentDeg: number[][] };
  airDensityKgM3: number;
}

const COARSE_LAUNCH_STEP_DEG = 2;
const COARSE_SPIN_STEP_RPM = 500;

function axis(lo: number, hi: number, step: number, name: string): number[] {
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || lo > hi) throw new RangeError(`${name} range [${lo}, ${hi}] is not valid`);
  if (lo === hi) return [lo];
  if (!(step > 0)) throw new RangeError(`${name} step ${step} is not positive`);
  const n = Math.max(1, Math.round((hi - lo) / step));
  if (n > 2000) throw new RangeError(`${name} grid of ${n + 1} points is too fine`);
  return Array.from({ length: n + 1 }, (_, i) => (i === n ? hi : lo + ((hi - lo) * i) / n));
}

/** Where along [a, b] a linear function with values fa, fb crosses zero. */
function crossing(a: number, fa: number, b: number, fb: number): number {
  return fa === fb ? a : a + (fa / (fa - fb)) * (b - a);
}

/**
 * The launch angle and spin rate that maximise carry (or total, on the conditions' ground) at
 * this ball speed, optionally among launches landing at least `minDescentDeg` steep, and the
 * window of launches within `withinPct` % of that best, as rows and an outline for a
 * launch-vs-spin plot. Method: a coarse grid (2° × 500 rpm over 2–44° × 0–12 000 rpm, 550
 * flights), a fine grid (default 0.5° × 100 rpm) over the window found there and one coarse step
 * around it, then two rounds of a 5 × 5 grid at a quarter of the fine step around the best.
 * The window's edges are interpolated where the objective or the descent crosses its limit, and
 * its tips between the last launch row inside and the first outside, so it is never cut flat by
 * the grid. O(grid size) trajectories, about 1 000–2 000; `npm run bench` measures the time.
 * @throws RangeError when the ball speed is not positive or a range, step or limit is not valid
 * @example optimiseLaunch(53.6, {}, { minDescentDeg: 45 }).best // => { launchAngleDeg: ≈ 19, spinRateRpm: ≈ 5400, … }
 */
export function optimiseLaunch(ballSpeedMps: number, conditions: Conditions = {}, options: OptimiseOptions = {}): LaunchOptimum {
  if (!(ballSpeedMps > 0) || !Number.isFinite(ballSpeedMps)) throw new RangeError(`ball speed ${ballSpeedMps} m/s is not positive`);
  const [launchLo, launchHi] = options.launchRangeDeg ?? [2, 44];
  const [spinLo, spinHi] = options.spinRangeRpm ?? [0, 12000];
  const launchStep = options.launchStepDeg ?? 0.5;
  const spinStep = options.spinStepRpm ?? 100;
  const withinPct = options.withinPct ?? 1;
  const objective = options.objective ?? 'carry';
  const floor = options.minDescentDeg ?? null;
  if (!(withinPct > 0 && withinPct < 100)) throw new RangeError(`window of ${withinPct} % is not valid`);
  if (spinLo < 0) throw new RangeError(`spin rate ${spinLo} rpm is negative`);
  if (launchLo <= 0 || launchHi >= 90) throw new RangeError(`launch range [${launchLo}, ${launchHi}]° is not valid`);
  if (floor !== null && !(floor > 0 && floor < 90)) throw new RangeError(`descent floor ${floor}° is not valid`);
  if (objective !== 'carry' && objective !== 'total') throw new RangeError(`objective "${String(objective)}" is not carry or total`);
  const flightOptions: FlightOptions = { model: options.model, stepS: options.stepS };
  const pick = (launchAngleDeg: number, spinRateRpm: number): LaunchPick => {
    const f = simulateFlight({ ballSpeedMps, launchAngleDeg, spinRateRpm }, conditions, flightOptions);
    return {
      launchAngleDeg,
      spinRateRpm,
      carryM: f.carryM,
      totalM: f.totalM,
      descentAngleDeg: f.descentAngleDeg,
      valueM: objective === 'total' ? f.totalM : f.carryM,
    };
  };
  const feasibleOf = (p: LaunchPick) => floor === null || p.descentAngleDeg >= floor;
  const better = (a: LaunchPick, b: LaunchPick | null) =>
    b === null || (feasibleOf(a) && !feasibleOf(b)) || (feasibleOf(a) === feasibleOf(b) && (feasibleOf(a) ? a.valueM > b.valueM : a.descentAngleDeg > b.descentAngleDeg));

  // 1. Coarse grid over the whole range.
  const coarseLaunches = axis(launchLo, launchHi, Math.max(COARSE_LAUNCH_STEP_DEG, launchStep), 'launch angle');
  const coarseSpins = axis(spinLo, spinHi, Math.max(COARSE_SPIN_STEP_RPM, spinStep), 'spin rate');
  const coarse = coarseLaunches.map((l) => coarseSpins.map((s) => pick(l, s)));
  let coarseBest: LaunchPick | null = null;
  for (const row of coarse) for (const p of row) if (better(p, coarseBest)) coarseBest = p;
  const feasible = feasibleOf(coarseBest!);
  const margin = (p: LaunchPick, threshold: number) =>
    Math.min(p.valueM / threshold - 1, floor === null ? Infinity : (p.descentAngleDeg - floor) / floor);

  // 2. Fine grid over the coarse window and one coarse step around it.
  const coarseThreshold = coarseBest!.valueM * (1 - withinPct / 100);
  let li0 = coarseLaunches.length;
  let li1 = -1;
  let sj0 = coarseSpins.length;
  let sj1 = -1;
  coarse.forEach((row, i) => row.forEach((p, j) => {
    if (feasible && margin(p, coarseThreshold) >= 0) {
      li0 = Math.min(li0, i); li1 = Math.max(li1, i); sj0 = Math.min(sj0, j); sj1 = Math.max(sj1, j);
    }
  }));
  if (li1 < 0) {
    const bi = coarseLaunches.indexOf(coarseBest!.launchAngleDeg);
    const bj = coarseSpins.indexOf(coarseBest!.spinRateRpm);
    li0 = li1 = bi;
    sj0 = sj1 = bj;
  }
  const fineLaunches = axis(coarseLaunches[Math.max(0, li0 - 1)], coarseLaunches[Math.min(coarseLaunches.length - 1, li1 + 1)], launchStep, 'launch angle');
  const fineSpins = axis(coarseSpins[Math.max(0, sj0 - 1)], coarseSpins[Math.min(coarseSpins.length - 1, sj1 + 1)], spinStep, 'spin rate');
  const fine = fineLaunches.map((l) => fineSpins.map((s) => pick(l, s)));
  let best = coarseBest!;
  for (const row of fine) for (const p of row) if (better(p, best)) best = p;

  // 3. Refine around the best point, staying inside the searched ranges.
  let dLaunch = fineLaunches.length > 1 ? launchStep / 4 : 0;
  let dSpin = fineSpins.length > 1 ? spinStep / 4 : 0;
  for (let round = 0; round < 2; round++) {
    const centre = best;
    for (let a = -2; a <= 2; a++) {
      for (let b = -2; b <= 2; b++) {
        if (a === 0 && b === 0) continue;
        const p = pick(
          Math.min(launchHi, Math.max(launchLo, centre.launchAngleDeg + a * dLaunch)),
          Math.min(spinHi, Math.max(spinLo, centre.spinRateRpm + b * dSpin)),
        );
        if (better(p, best)) best = p;
      }
    }
    dLaunch /= 4;
    dSpin /= 4;
  }
  const onEdge = (v: number, lo: number, hi: number, step: number) => lo !== hi && (v <= lo + step / 2 || v >= hi - step / 2);
  const bestOnEdge = onEdge(best.launchAngleDeg, launchLo, launchHi, launchStep) || onEdge(best.spinRateRpm, spinLo, spinHi, spinStep);

  // 4. The window on the fine grid, edges and tips interpolated.
  const threshold = best.valueM * (1 - withinPct / 100);
  const g = fine.map((row) => row.map((p) => (feasible ? margin(p, threshold) : -1)));
  const rows: WindowRow[] = [];
  const rowIndex: number[] = [];
  g.forEach((row, i) => {
    let first = -1;
    let last = -1;
    row.forEach((v, j) => {
      if (v >= 0) {
        if (first < 0) first = j;
        last = j;
      }
    });
    if (first < 0) return;
    rows.push({
      launchAngleDeg: fineLaunches[i],
      spinMinRpm: first > 0 ? crossing(fineSpins[first - 1], row[first - 1], fineSpins[first], row[first]) : fineSpins[first],
      spinMaxRpm: last < row.length - 1 ? crossing(fineSpins[last], row[last], fineSpins[last + 1], row[last + 1]) : fineSpins[last],
    });
    rowIndex.push(i);
  });
  const rowMax = (i: number) => g[i].reduce((m, v) => (v > m ? v : m), -Infinity);
  const tip = (inside: number, outside: number, row: WindowRow) => ({
    launchAngleDeg: crossing(fineLaunches[inside], rowMax(inside), fineLaunches[outside], rowMax(outside)),
    spinRateRpm: (row.spinMinRpm + row.spinMaxRpm) / 2,
  });
  const polygon: LaunchWindow['polygon'] = [];
  if (rows.length > 0) {
    const i0 = rowIndex[0];
    const i1 = rowIndex[rowIndex.length - 1];
    if (i0 > 0) polygon.push(tip(i0, i0 - 1, rows[0]));
    for (const r of rows) polygon.push({ launchAngleDeg: r.launchAngleDeg, spinRateRpm: r.spinMinRpm });
    if (i1 < fineLaunches.length - 1) polygon.push(tip(i1, i1 + 1, rows[rows.length - 1]));
    for (let k = rows.length - 1; k >= 0; k--) polygon.push({ launchAngleDeg: rows[k].launchAngleDeg, spinRateRpm: rows[k].spinMaxRpm });
  }
  let spinMin = Infinity;
  let spinMax = -Infinity;
  for (const r of rows) {
    if (r.spinMinRpm < spinMin) spinMin = r.spinMinRpm;
    if (r.spinMaxRpm > spinMax) spinMax = r.spinMaxRpm;
  }
  const clipped =
    rows.length > 0 &&
    ((rows[0].launchAngleDeg <= launchLo && launchLo < launchHi) ||
      (rows[rows.length - 1].launchAngleDeg >= launchHi && launchLo < launchHi) ||
      (spinMin <= spinLo && spinLo < spinHi) ||
      (spinMax >= spinHi && spinLo < spinHi));
  let launchMin = best.launchAngleDeg;
  let launchMax = best.launchAngleDeg;
  if (polygon.length > 0) {
    launchMin = Infinity;
    launchMax = -Infinity;
    for (const p of polygon) {
      if (p.launchAngleDeg < launchMin) launchMin = p.launchAngleDeg;
      if (p.launchAngleDeg > launchMax) launchMax = p.launchAngleDeg;
    }
  }
  const window: LaunchWindow = {
    thresholdM: threshold,
    launchRangeDeg: [launchMin, launchMax],
    spinRangeRpm: rows.length ? [spinMin, spinMax] : [best.spinRateRpm, best.spinRateRpm],
    rows,
    polygon,
    clipped,
  };
  return {
    ballSpeedMps,
    objective,
    minDescentDeg: floor,
    feasible,
    best,
    bestOnEdge,
    window,
    grid: {
      launchAnglesDeg: fineLaunches,
      spinRatesRpm: fineSpins,
      valueM: fine.map((row) => row.map((p) => p.valueM)),
      descentDeg: fine.map((row) => row.map((p) => p.descentAngleDeg)),
    },
    airDensityKgM3: resolveAir(conditions).densityKgM3,
  };
}
