import { optimiseLaunch, STANDARD_GRAVITY_MPS2 } from '@/analysis/flight';
import { noAir, projectileRangeM } from '@/tests/support/no-air';

// A ball without drag or lift flies the textbook projectile (e.g. Halliday, Resnick & Walker,
// "Fundamentals of Physics", 10th ed., 2014, §4-6): over level ground its range is v²·sin 2θ/g,
// greatest at θ = 45°, and it lands at the angle it was launched at. The optimiser searches with
// the real flight code, so with this model its best launch, window edges and descent floor have
// closed forms.
const G = STANDARD_GRAVITY_MPS2;
const DEG = Math.PI / 180;
const V = 40;
const range = (deg: number) => projectileRangeM(V, deg);
/** The lower launch angle whose range is `share` of the greatest (deg). */
const lowEdge = (share: number) => Math.asin(share) / 2 / DEG;

describe('optimiseLaunch without air (closed-form projectile)', () => {
  const fixedSpin = { model: noAir, launchRangeDeg: [30, 60] as const, spinRangeRpm: [2500, 2500] as const };

  it('optimiseLaunch without air finds 45° with the range v²/g, and a window between the two angles carrying 99 % of it', () => {
    const r = optimiseLaunch(V, {}, fixedSpin);
    expect(r.best.launchAngleDeg).toBeCloseTo(45, 9);
    expect(r.best.carryM).toBeCloseTo((V * V) / G, 8);
    expect(r.best.valueM).toBe(r.best.carryM);
    expect(r.best.descentAngleDeg).toBeCloseTo(45, 8);
    expect(r.bestOnEdge).toBe(false);
    expect(r.feasible).toBe(true);
    expect(r.window.thresholdM).toBeCloseTo((0.99 * V * V) / G, 8);
    // The edges are interpolated between 0.5° grid rows: within 0.01° of sin 2θ = 0.99.
    expect(r.window.launchRangeDeg[0]).toBeCloseTo(lowEdge(0.99), 2);
    expect(r.window.launchRangeDeg[1]).toBeCloseTo(90 - lowEdge(0.99), 2);
    expect(r.window.spinRangeRpm).toEqual([2500, 2500]);
    expect(r.window.clipped).toBe(false);
    // Every fine-grid launch angle inside the two edges is a row, none outside.
    const inside = r.grid.launchAnglesDeg.filter((deg) => range(deg) >= 0.99 * range(45));
    expect(r.window.rows.map((row) => row.launchAngleDeg)).toEqual(inside);
    r.grid.launchAnglesDeg.forEach((deg, i) => {
      expect(r.grid.valueM[i][0]).toBeCloseTo(range(deg), 8);
      expect(r.grid.descentDeg[i][0]).toBeCloseTo(deg, 8);
    });
    // The outline: the two tips, then one point per row on each edge.
    expect(r.window.polygon).toHaveLength(2 * r.window.rows.length + 2);
    expect(r.window.polygon[0].launchAngleDeg).toBeCloseTo(lowEdge(0.99), 2);
    expect(r.window.polygon[r.window.rows.length + 1].launchAngleDeg).toBeCloseTo(90 - lowEdge(0.99), 2);
  });

  it('optimiseLaunch without air widens the window to the angles carrying 95 % when asked for 5 %', () => {
    const r = optimiseLaunch(V, {}, { ...fixedSpin, withinPct: 5 });
    expect(r.window.thresholdM).toBeCloseTo((0.95 * V * V) / G, 8);
    expect(r.window.launchRangeDeg[0]).toBeCloseTo(lowEdge(0.95), 2);
    expect(r.window.launchRangeDeg[1]).toBeCloseTo(90 - lowEdge(0.95), 2);
  });

  it('optimiseLaunch without air over the whole spin range spans it and says the window is clipped', () => {
    const r = optimiseLaunch(V, {}, { model: noAir, launchRangeDeg: [30, 60], launchStepDeg: 1, spinStepRpm: 1000 });
    expect(r.best.launchAngleDeg).toBeCloseTo(45, 9);
    expect(r.window.spinRangeRpm).toEqual([0, 12000]);
    for (const row of r.window.rows) expect([row.spinMinRpm, row.spinMaxRpm]).toEqual([0, 12000]);
    expect(r.window.clipped).toBe(true);
  });

  it('optimiseLaunch without air with a descent floor of 50.2° puts the best just above it and the window edge on it', () => {
    const r = optimiseLaunch(V, {}, { ...fixedSpin, minDescentDeg: 50.2 });
    expect(r.feasible).toBe(true);
    expect(r.minDescentDeg).toBe(50.2);
    // Landing angle = launch angle, and range falls past 45°: the best is the shallowest launch
    // at or above the floor, found to the last refinement (a sixteenth of the 0.5° step).
    expect(r.best.launchAngleDeg).toBeGreaterThanOrEqual(50.2);
    expect(r.best.launchAngleDeg).toBeLessThanOrEqual(50.2 + 0.5 / 16);
    expect(r.best.carryM).toBeCloseTo(range(r.best.launchAngleDeg), 8);
    // Both margins are linear in the angle near the floor, so the interpolated edge sits on it.
    expect(r.window.launchRangeDeg[0]).toBeCloseTo(50.2, 6);
    const top = (180 - Math.asin(0.99 * Math.sin(2 * r.best.launchAngleDeg * DEG)) / DEG) / 2;
    expect(r.window.launchRangeDeg[1]).toBeCloseTo(top, 2);
    for (const row of r.window.rows) expect(row.launchAngleDeg).toBeGreaterThan(50.2);
  });

  it('optimiseLaunch without air with a floor no searched launch reaches gives the steepest launch and no window', () => {
    const r = optimiseLaunch(V, {}, { ...fixedSpin, launchRangeDeg: [30, 48], minDescentDeg: 50.2 });
    expect(r.feasible).toBe(false);
    expect(r.best.launchAngleDeg).toBe(48);
    expect(r.bestOnEdge).toBe(true);
    expect(r.window.rows).toEqual([]);
    expect(r.window.polygon).toEqual([]);
    expect(r.window.clipped).toBe(false);
    expect(r.window.launchRangeDeg).toEqual([48, 48]);
    expect(r.window.spinRangeRpm).toEqual([2500, 2500]);
  });

  it('optimiseLaunch without air from 42° starts the window at the range and says it is clipped', () => {
    const r = optimiseLaunch(V, {}, { ...fixedSpin, launchRangeDeg: [42, 60] });
    expect(r.window.rows[0].launchAngleDeg).toBe(42);
    expect(r.window.polygon[0]).toEqual({ launchAngleDeg: 42, spinRateRpm: 2500 });
    expect(r.window.launchRangeDeg[0]).toBe(42);
    expect(r.window.launchRangeDeg[1]).toBeCloseTo(90 - lowEdge(0.99), 2);
    expect(r.window.clipped).toBe(true);
  });

  it('optimiseLaunch without air up to 44° puts the best on the range edge', () => {
    const r = optimiseLaunch(V, {}, { ...fixedSpin, launchRangeDeg: [30, 44] });
    expect(r.best.launchAngleDeg).toBe(44);
    expect(r.bestOnEdge).toBe(true);
    expect(r.window.clipped).toBe(true);
    expect(r.window.launchRangeDeg[1]).toBe(44);
  });

  it('optimiseLaunch without air for total counts the run: its value is the total, beyond the carry', () => {
    const r = optimiseLaunch(V, {}, { ...fixedSpin, objective: 'total' });
    expect(r.objective).toBe('total');
    expect(r.best.valueM).toBe(r.best.totalM);
    expect(r.best.totalM).toBeGreaterThan(r.best.carryM);
    expect(r.window.thresholdM).toBeCloseTo(0.99 * r.best.totalM, 9);
  });

  it('optimiseLaunch without air ends its grids exactly on the range’s end, and takes a fixed spin without a step', () => {
    // 2 + (26.1 − 2) is 26.100000000000005 in doubles: the last grid point must be the end itself.
    const r = optimiseLaunch(V, {}, { model: noAir, launchRangeDeg: [2, 26.1], spinRangeRpm: [2500, 2500], spinStepRpm: 0 });
    expect(r.best.launchAngleDeg).toBe(26.1);
    expect(r.grid.launchAnglesDeg[r.grid.launchAnglesDeg.length - 1]).toBe(26.1);
    expect(r.window.rows[r.window.rows.length - 1].launchAngleDeg).toBe(26.1);
    expect(r.grid.spinRatesRpm).toEqual([2500]);
    expect(r.window.clipped).toBe(true);
  });

  it('optimiseLaunch without air with a fixed launch and spin has a window of that one launch, never clipped', () => {
    const r = optimiseLaunch(V, {}, { model: noAir, launchRangeDeg: [40, 40], spinRangeRpm: [2500, 2500] });
    expect(r.best.launchAngleDeg).toBe(40);
    expect(r.best.carryM).toBeCloseTo(range(40), 8);
    expect(r.window.rows).toEqual([{ launchAngleDeg: 40, spinMinRpm: 2500, spinMaxRpm: 2500 }]);
    expect(r.window.clipped).toBe(false);
    expect(r.bestOnEdge).toBe(false);
  });

  it('optimiseLaunch without air gives the outline’s tips the spin of the row beside them', () => {
    const r = optimiseLaunch(V, {}, fixedSpin);
    const tips = [r.window.polygon[0], r.window.polygon[r.window.rows.length + 1]];
    for (const tip of tips) expect(tip.spinRateRpm).toBe(2500);
  });

  // The best is "on the edge" when it lies within half a fine step (0.25°) of a range end: 45° is
  // on the edge of [44.75, 60] and of [30, 45.25], not of [44, 60] or [30, 46].
  it.each([
    [[44.75, 60], true],
    [[30, 45.25], true],
    [[44, 60], false],
    [[30, 46], false],
  ] as const)('optimiseLaunch without air over %j says the best at 45° is on the edge: %s', (launchRangeDeg, onEdge) => {
    const r = optimiseLaunch(V, {}, { ...fixedSpin, launchRangeDeg });
    expect(r.best.launchAngleDeg).toBeCloseTo(45, 9);
    expect(r.bestOnEdge).toBe(onEdge);
  });
});
