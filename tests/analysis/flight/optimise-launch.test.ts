import { optimiseLaunch, simulateFlight } from '@/analysis/flight';

describe('optimiseLaunch', () => {
  const result = optimiseLaunch(70);
  it('optimiseLaunch at 70 m/s finds a best launch no grid point beats, inside the range', () => {
    const gridBest = Math.max(...result.grid.carryM.flat());
    expect(result.best.carryM).toBeGreaterThanOrEqual(gridBest);
    expect(result.bestOnEdge).toBe(false);
    expect(
      simulateFlight({ ballSpeedMps: 70, launchAngleDeg: result.best.launchAngleDeg, spinRateRpm: result.best.spinRateRpm }).carryM,
    ).toBeCloseTo(result.best.carryM, 10);
  });
  it('optimiseLaunch window holds the best launch and only launches within 1 % of its carry', () => {
    const { window, grid, best } = result;
    expect(window.thresholdCarryM).toBeCloseTo(best.carryM * 0.99, 10);
    expect(best.launchAngleDeg).toBeGreaterThanOrEqual(window.launchRangeDeg[0]);
    expect(best.launchAngleDeg).toBeLessThanOrEqual(window.launchRangeDeg[1]);
    expect(best.spinRateRpm).toBeGreaterThanOrEqual(window.spinRangeRpm[0]);
    expect(best.spinRateRpm).toBeLessThanOrEqual(window.spinRangeRpm[1]);
    grid.launchAnglesDeg.forEach((launch, i) => {
      const row = window.rows.find((r) => r.launchAngleDeg === launch);
      grid.spinRatesRpm.forEach((spin, j) => {
        const inside = row !== undefined && spin >= row.spinMinRpm && spin <= row.spinMaxRpm;
        expect(grid.carryM[i][j] >= window.thresholdCarryM).toBe(inside);
      });
    });
  });
  it('optimiseLaunch window outline goes up the low-spin edge and back down the high-spin edge', () => {
    const { rows, polygon } = result.window;
    expect(polygon).toHaveLength(rows.length * 2);
    expect(polygon[0]).toEqual({ launchAngleDeg: rows[0].launchAngleDeg, spinRateRpm: rows[0].spinMinRpm });
    expect(polygon[polygon.length - 1]).toEqual({ launchAngleDeg: rows[0].launchAngleDeg, spinRateRpm: rows[0].spinMaxRpm });
  });
  // Property of any lifting ball (e.g. Penner, "The physics of golf: the optimum loft of a driver",
  // Am. J. Phys. 69:563, 2001): the carry-best launch angle falls as spin rises.
  it('optimiseLaunch with a fixed spin gives a best launch angle that falls as spin rises', () => {
    const angles = [2000, 3000, 4500, 6000, 8000].map(
      (spin) => optimiseLaunch(70, {}, { spinRangeRpm: [spin, spin], launchRangeDeg: [2, 40] }).best.launchAngleDeg,
    );
    for (let i = 1; i < angles.length; i++) expect(angles[i]).toBeLessThan(angles[i - 1]);
  });
  it('optimiseLaunch with a narrow range reports a best launch on its edge', () => {
    expect(optimiseLaunch(70, {}, { launchRangeDeg: [4, 8], spinRangeRpm: [2000, 4000] }).bestOnEdge).toBe(true);
  });
  it('optimiseLaunch in thinner air carries the best launch farther', () => {
    expect(optimiseLaunch(70, { altitudeM: 1600 }, { launchStepDeg: 2, spinStepRpm: 500 }).best.carryM).toBeGreaterThan(result.best.carryM);
  });
  it('optimiseLaunch with a ball speed that is not positive or a reversed range throws', () => {
    expect(() => optimiseLaunch(0)).toThrow(RangeError);
    expect(() => optimiseLaunch(70, {}, { launchRangeDeg: [20, 10] })).toThrow(RangeError);
    expect(() => optimiseLaunch(70, {}, { spinStepRpm: 0 })).toThrow(RangeError);
  });
});
