import { launchWindowForClub, optimiseLaunch } from '@/analysis/flight';
import { insidePolygon, launchWindowGeometry } from '@/components/charts/launch-window-plot-geometry';

// One coarse optimiser run (analysis/flight) for a mid-iron ball speed; the checks are geometric.
const OPTIMUM = optimiseLaunch(52, {}, { launchRangeDeg: [6, 30], launchStepDeg: 1, spinRangeRpm: [1000, 9000], spinStepRpm: 250 });
// Invented shots of one club.
const POINTS = [
  { id: 'a', launchAngleDeg: 16.5, spinRateRpm: 6400 },
  { id: 'b', launchAngleDeg: 18.2, spinRateRpm: 7100 },
  { id: 'c', launchAngleDeg: 15.1, spinRateRpm: 5900 },
];

describe('launchWindowGeometry', () => {
  it('launchWindowGeometry window path starts with M and closes with Z', () => {
    const g = launchWindowGeometry({ optimum: OPTIMUM, points: POINTS, units: 'imperial', widthPx: 390 });
    expect(g.windowPath).not.toBeNull();
    expect(g.windowPath!.startsWith('M')).toBe(true);
    expect(g.windowPath!.endsWith('Z')).toBe(true);
    expect(g.windowPoints).toHaveLength(OPTIMUM.window.polygon.length);
  });

  it('launchWindowGeometry puts the best launch inside the drawn window', () => {
    const g = launchWindowGeometry({ optimum: OPTIMUM, points: POINTS, units: 'imperial', widthPx: 390 });
    expect(insidePolygon(g.best!.x, g.best!.y, g.windowPoints)).toBe(true);
  });

  it('launchWindowGeometry keeps window, best and shots inside the plot; spin right, launch up', () => {
    for (const widthPx of [390, 900]) {
      const g = launchWindowGeometry({ optimum: OPTIMUM, points: POINTS, units: 'metric', widthPx });
      const all: [number, number][] = [...g.windowPoints, [g.best!.x, g.best!.y], ...g.dots.map((d) => [d.x, d.y] as [number, number])];
      for (const [x, y] of all) {
        expect(x).toBeGreaterThanOrEqual(g.plot.left);
        expect(x).toBeLessThanOrEqual(g.plot.right);
        expect(y).toBeGreaterThanOrEqual(g.plot.top);
        expect(y).toBeLessThanOrEqual(g.plot.bottom);
      }
      const [a, b] = g.dots; // b has more spin and more launch than a
      expect(b.x).toBeGreaterThan(a.x);
      expect(b.y).toBeLessThan(a.y);
      expect(g.heightPx).toBeGreaterThanOrEqual(240);
      expect(g.heightPx).toBeLessThanOrEqual(420);
    }
  });

  it('launchWindowGeometry labels the best launch with its carry in the user’s unit', () => {
    const g = launchWindowGeometry({ optimum: OPTIMUM, points: [], units: 'imperial', widthPx: 390 });
    const yd = Math.round(OPTIMUM.best.carryM / 0.9144); // NIST SP 811 (2008), Appendix B: 1 yd = 0.9144 m
    expect(g.best!.label).toContain(`${yd} yd carry`);
    expect(g.best!.label).toContain(`${OPTIMUM.best.launchAngleDeg.toFixed(1)}°`);
  });

  it('launchWindowGeometry leaves out shots without launch or spin and tolerates an empty window', () => {
    const empty = { best: OPTIMUM.best, objective: OPTIMUM.objective, window: { ...OPTIMUM.window, polygon: [] } };
    const g = launchWindowGeometry({ optimum: empty, points: [...POINTS, { launchAngleDeg: NaN, spinRateRpm: 5000 }], units: 'metric', widthPx: 390 });
    expect(g.windowPath).toBeNull();
    expect(g.dots).toHaveLength(3);
  });

  it('launchWindowGeometry ticks are rising and labelled', () => {
    const g = launchWindowGeometry({ optimum: OPTIMUM, points: POINTS, units: 'metric', widthPx: 900 });
    for (let i = 1; i < g.spinTicks.length; i++) expect(g.spinTicks[i].px).toBeGreaterThan(g.spinTicks[i - 1].px);
    for (let i = 1; i < g.launchTicks.length; i++) expect(g.launchTicks[i].px).toBeLessThan(g.launchTicks[i - 1].px);
    expect(g.spinTicks.find((t) => t.value === 2000)?.label).toBe('2,000');
  });
});

describe('launchWindowGeometry for each kind of club', () => {
  // A driver's window (most total) with interpolated tips, and a wedge with no window.
  const DRIVER = launchWindowForClub('driver', 70)!;
  it('launchWindowGeometry holds the whole driver window, tips included, inside the plot and labels total', () => {
    const g = launchWindowGeometry({ optimum: DRIVER, points: [], units: 'metric', widthPx: 390 });
    expect(DRIVER.window.polygon.length).toBeGreaterThan(4);
    for (const [x, y] of g.windowPoints) {
      expect(x).toBeGreaterThan(g.plot.left);
      expect(x).toBeLessThan(g.plot.right);
      expect(y).toBeGreaterThan(g.plot.top);
      expect(y).toBeLessThan(g.plot.bottom);
    }
    expect(g.best!.label).toMatch(/ m total$/);
  });
  it('launchWindowGeometry with no window (a wedge) plots the shots alone', () => {
    const g = launchWindowGeometry({ optimum: null, points: POINTS, units: 'metric', widthPx: 390 });
    expect(g.best).toBeNull();
    expect(g.windowPath).toBeNull();
    expect(g.dots).toHaveLength(3);
  });
});

describe('insidePolygon', () => {
  it('insidePolygon of the unit square tells inside from outside', () => {
    const square: [number, number][] = [[0, 0], [1, 0], [1, 1], [0, 1]];
    expect(insidePolygon(0.5, 0.5, square)).toBe(true);
    expect(insidePolygon(1.5, 0.5, square)).toBe(false);
  });
});
