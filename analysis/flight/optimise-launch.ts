import { resolveAir, type AirConditions } from './air-conditions';
import { simulateFlight, type FlightOptions } from './simulate-flight';

export interface OptimiseOptions extends FlightOptions {
  /** Launch angles searched (deg), inclusive. Default [4, 30]. */
  launchRangeDeg?: readonly [number, number];
  /** Grid step of launch angle (deg). Default 0.5. */
  launchStepDeg?: number;
  /** Spin rates searched (rpm), inclusive; equal ends fix the spin. Default [500, 10000]. */
  spinRangeRpm?: readonly [number, number];
  /** Grid step of spin rate (rpm). Default 100. */
  spinStepRpm?: number;
  /** The window holds launches within this many percent of the best carry. Default 1. */
  withinPct?: number;
}

/** One launch-angle line of the window: the spin rates within the window at that launch. */
export interface WindowRow {
  launchAngleDeg: number;
  spinMinRpm: number;
  spinMaxRpm: number;
}

export interface LaunchWindow {
  /** Carry at the window's edge (m): (1 − withinPct/100) × best carry. */
  thresholdCarryM: number;
  launchRangeDeg: [number, number];
  spinRangeRpm: [number, number];
  /** Per grid launch angle, the spin interval inside the window (edges interpolated). */
  rows: WindowRow[];
  /**
   * The window's outline on a launch-vs-spin plot: up the low-spin edge, back down the
   * high-spin edge (closed implicitly).
   */
  polygon: { launchAngleDeg: number; spinRateRpm: number }[];
}

export interface LaunchOptimum {
  ballSpeedMps: number;
  best: { launchAngleDeg: number; spinRateRpm: number; carryM: number };
  /** True when the best launch lies on the searched range's edge (widen the range). */
  bestOnEdge: boolean;
  window: LaunchWindow;
  /** The searched grid: carryM[i][j] for launchAnglesDeg[i] and spinRatesRpm[j]. */
  grid: { launchAnglesDeg: number[]; spinRatesRpm: number[]; carryM: number[][] };
  airDensityKgM3: number;
}

function axis(lo: number, hi: number, step: number, name: string): number[] {
  if (!Number.isFinite(lo) || !Number.isFinite(hi) || lo > hi) throw new RangeError(`${name} range [${lo}, ${hi}] is not valid`);
  if (lo === hi) return [lo];
  if (!(step > 0)) throw new RangeError(`${name} step ${step} is not positive`);
  const n = Math.round((hi - lo) / step);
  if (n > 2000) throw new RangeError(`${name} grid of ${n + 1} points is too fine`);
  return Array.from({ length: n + 1 }, (_, i) => (i === n ? hi : lo + i * step));
}

/** Where along [a, b] the carry crosses the threshold, by linear interpolation. */
function crossing(a: number, carryA: number, b: number, carryB: number, threshold: number): number {
  return carryA === carryB ? a : a + ((threshold - carryA) / (carryB - carryA)) * (b - a);
}

/**
 * The launch angle and spin rate that carry a ball at this speed farthest (no wind taken into
 * account unless `air.wind` is set), and the window of launches within `withinPct` % of that
 * carry, as rows and an outline for a launch-vs-spin plot. Method: a full grid (default 0.5° ×
 * 100 rpm over 4–30° × 500–10 000 rpm, 4 902 flights), then two rounds of a 5 × 5 grid at a
 * quarter of the step around the best point. O(grid size) trajectories, about 50–150 ms by
 * default on one core.
 * @throws RangeError when the ball speed is not positive or a range or step is not valid
 * @example optimiseLaunch(74.65).best // => { launchAngleDeg: ≈ 18.0, spinRateRpm: ≈ 2906, carryM: ≈ 246.4 }
 */
export function optimiseLaunch(ballSpeedMps: number, air: AirConditions = {}, options: OptimiseOptions = {}): LaunchOptimum {
  if (!(ballSpeedMps > 0) || !Number.isFinite(ballSpeedMps)) throw new RangeError(`ball speed ${ballSpeedMps} m/s is not positive`);
  const [launchLo, launchHi] = options.launchRangeDeg ?? [4, 30];
  const [spinLo, spinHi] = options.spinRangeRpm ?? [500, 10000];
  const launchStep = options.launchStepDeg ?? 0.5;
  const spinStep = options.spinStepRpm ?? 100;
  const withinPct = options.withinPct ?? 1;
  if (!(withinPct > 0 && withinPct < 100)) throw new RangeError(`window of ${withinPct} % is not valid`);
  if (spinLo < 0) throw new RangeError(`spin rate ${spinLo} rpm is negative`);
  if (launchLo <= -90 || launchHi >= 90) throw new RangeError(`launch range [${launchLo}, ${launchHi}]° is not valid`);
  const launches = axis(launchLo, launchHi, launchStep, 'launch angle');
  const spins = axis(spinLo, spinHi, spinStep, 'spin rate');
  const flightOptions: FlightOptions = { model: options.model, stepS: options.stepS };
  const carryAt = (launchAngleDeg: number, spinRateRpm: number): number =>
    simulateFlight({ ballSpeedMps, launchAngleDeg, spinRateRpm }, air, flightOptions).carryM;

  const carryM = launches.map((launch) => spins.map((spin) => carryAt(launch, spin)));
  let bi = 0;
  let bj = 0;
  for (let i = 0; i < launches.length; i++) {
    for (let j = 0; j < spins.length; j++) if (carryM[i][j] > carryM[bi][bj]) { bi = i; bj = j; }
  }
  const bestOnEdge =
    (launches.length > 1 && (bi === 0 || bi === launches.length - 1)) || (spins.length > 1 && (bj === 0 || bj === spins.length - 1));

  // Refine around the best grid point, staying inside the searched ranges.
  let best = { launchAngleDeg: launches[bi], spinRateRpm: spins[bj], carryM: carryM[bi][bj] };
  let dLaunch = launches.length > 1 ? launchStep / 4 : 0;
  let dSpin = spins.length > 1 ? spinStep / 4 : 0;
  for (let round = 0; round < 2; round++) {
    const centre = best;
    for (let a = -2; a <= 2; a++) {
      for (let b = -2; b <= 2; b++) {
        const launch = Math.min(launchHi, Math.max(launchLo, centre.launchAngleDeg + a * dLaunch));
        const spin = Math.min(spinHi, Math.max(spinLo, centre.spinRateRpm + b * dSpin));
        const carry = carryAt(launch, spin);
        if (carry > best.carryM) best = { launchAngleDeg: launch, spinRateRpm: spin, carryM: carry };
      }
    }
    dLaunch /= 4;
    dSpin /= 4;
  }

  const threshold = best.carryM * (1 - withinPct / 100);
  const rows: WindowRow[] = [];
  for (let i = 0; i < launches.length; i++) {
    const row = carryM[i];
    let first = -1;
    let last = -1;
    for (let j = 0; j < spins.length; j++) {
      if (row[j] >= threshold) {
        if (first < 0) first = j;
        last = j;
      }
    }
    if (first < 0) continue;
    rows.push({
      launchAngleDeg: launches[i],
      spinMinRpm: first > 0 ? crossing(spins[first - 1], row[first - 1], spins[first], row[first], threshold) : spins[first],
      spinMaxRpm: last < spins.length - 1 ? crossing(spins[last], row[last], spins[last + 1], row[last + 1], threshold) : spins[last],
    });
  }
  const polygon = [
    ...rows.map((r) => ({ launchAngleDeg: r.launchAngleDeg, spinRateRpm: r.spinMinRpm })),
    ...[...rows].reverse().map((r) => ({ launchAngleDeg: r.launchAngleDeg, spinRateRpm: r.spinMaxRpm })),
  ];
  const window: LaunchWindow = {
    thresholdCarryM: threshold,
    launchRangeDeg: rows.length ? [rows[0].launchAngleDeg, rows[rows.length - 1].launchAngleDeg] : [best.launchAngleDeg, best.launchAngleDeg],
    spinRangeRpm: rows.length
      ? [Math.min(...rows.map((r) => r.spinMinRpm)), Math.max(...rows.map((r) => r.spinMaxRpm))]
      : [best.spinRateRpm, best.spinRateRpm],
    rows,
    polygon,
  };
  return {
    ballSpeedMps,
    best,
    bestOnEdge,
    window,
    grid: { launchAnglesDeg: launches, spinRatesRpm: spins, carryM },
    airDensityKgM3: resolveAir(air).densityKgM3,
  };
}
