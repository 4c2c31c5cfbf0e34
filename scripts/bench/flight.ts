/**
 * Ball-flight benchmark: trajectories per second on one core at the default step (the default
 * modern-ball coefficients, roll included), the carry error of that step against a 1 ms
 * reference step over a grid of driver-to-wedge launches, and the time of one launch window per
 * kind of club (median of 5 runs each). Targets: ≥ 50 000 trajectories/s, ≤ 0.5 % carry error,
 * a window under 100 ms.
 * Run alone: `node --import tsx scripts/bench/flight.ts`.
 */
import { launchWindowForClub, simulateFlight, type Launch } from '@/analysis/flight';

const REFERENCE_STEP_S = 0.001;
const TIMED_MS = 2000;

/** Driver-to-wedge launch grid (invented, covering ball speed 35–80 m/s, 8–32°, 1800–10 000 rpm, axis ±20°). */
function launchGrid(): Launch[] {
  const launches: Launch[] = [];
  const clubs: [number, number, number][] = [
    [80, 9, 2200], [74, 11, 2700], [70, 14, 1800], [66, 10, 3600], [62, 13, 4500],
    [56, 16, 6000], [53, 17, 7000], [48, 22, 8500], [44, 26, 9500], [38, 30, 10000], [35, 32, 8000],
  ];
  for (const [ballSpeedMps, launchAngleDeg, spinRateRpm] of clubs) {
    for (const spinAxisDeg of [-20, 0, 20]) {
      for (const launchDirectionDeg of [-4, 0, 4]) launches.push({ ballSpeedMps, launchAngleDeg, spinRateRpm, spinAxisDeg, launchDirectionDeg });
    }
  }
  return launches;
}

/** Median time (ms) of a launch window per kind of club at a typical ball speed. */
function benchWindows(): Record<string, number> {
  const kinds: ['driver' | 'wood' | 'hybrid' | 'iron', number][] = [['driver', 70], ['wood', 66], ['hybrid', 62], ['iron', 54]];
  const out: Record<string, number> = {};
  for (const [kind, speed] of kinds) {
    launchWindowForClub(kind, speed); // warm up
    const times: number[] = [];
    for (let i = 0; i < 5; i++) {
      const start = performance.now();
      launchWindowForClub(kind, speed + i * 0.1);
      times.push(performance.now() - start);
    }
    times.sort((a, b) => a - b);
    out[kind] = times[2];
  }
  return out;
}

export function benchFlight(): { perSecond: number; maxCarryErrorPct: number; windowMs: Record<string, number> } {
  const launches = launchGrid();
  let maxCarryErrorPct = 0;
  for (const launch of launches) {
    const reference = simulateFlight(launch, {}, { stepS: REFERENCE_STEP_S }).carryM;
    const chosen = simulateFlight(launch).carryM;
    maxCarryErrorPct = Math.max(maxCarryErrorPct, (Math.abs(chosen - reference) / reference) * 100);
  }
  // Warm up, then time whole passes over the grid.
  for (let i = 0; i < 20; i++) for (const launch of launches) simulateFlight(launch);
  let count = 0;
  let sink = 0;
  const start = performance.now();
  let elapsedMs = 0;
  while (elapsedMs < TIMED_MS) {
    for (const launch of launches) sink += simulateFlight(launch).carryM;
    count += launches.length;
    elapsedMs = performance.now() - start;
  }
  if (!Number.isFinite(sink)) throw new Error('benchmark produced a non-finite carry');
  return { perSecond: (count / elapsedMs) * 1000, maxCarryErrorPct, windowMs: benchWindows() };
}

if (process.argv[1]?.replace(/\\/g, '/').endsWith('scripts/bench/flight.ts')) {
  console.log(benchFlight());
}
