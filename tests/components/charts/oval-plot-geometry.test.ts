import fc from 'fast-check';
import { groundOval, ovalOutline, type Oval } from '@/analysis/ovals';
import { BUILD_COLORS } from '@/components/charts/chart-colors';
import type { PlotShot } from '@/components/charts/chart-types';
import { ovalHalfExtents, ovalPlotGeometry, ovalPlotSummary, type OvalGroup } from '@/components/charts/oval-plot-geometry';

const YARD_M = 0.9144; // NIST Special Publication 811 (2008), Appendix B: 1 yd = 0.9144 m exactly

// Invented shots of one club, two builds (demo-style inputs; the checks below are geometric rules).
const OFF_A = [-6, 2, 9, -1, 4, -8, 3, 0, 5, -3];
const CARRY_A = [142, 150, 158, 147, 151, 139, 154, 149, 153, 145];
const OFF_B = [4, 10, 1, 7, 12, 6, 3, 9, 8, 5];
const CARRY_B = [148, 152, 146, 150, 155, 151, 149, 153, 147, 150];

function shot(i: number, build: string | null, offline: number, carry: number, extra: Partial<PlotShot> = {}): PlotShot {
  return { id: `s${i}`, bayFileId: 'f1', row: i + 1, club: '7I', build, carry, offline, decision: null, stray: false, ...extra };
}

const SHOTS: PlotShot[] = [
  ...OFF_A.map((o, i) => shot(i, 'A', o, CARRY_A[i])),
  ...OFF_B.map((o, i) => shot(10 + i, 'B', o, CARRY_B[i])),
];
const GROUPS: OvalGroup[] = [
  { build: 'A', n: 10, oval: groundOval(OFF_A, CARRY_A), predictionOval: groundOval(OFF_A, CARRY_A, { kind: 'prediction' }) },
  { build: 'B', n: 10, oval: groundOval(OFF_B, CARRY_B), predictionOval: groundOval(OFF_B, CARRY_B, { kind: 'prediction' }) },
];

/** The numbers of an "M x,y L x,y … Z" path. */
function pathPoints(path: string): [number, number][] {
  const nums = path.match(/-?\d+(\.\d+)?/g)!.map(Number);
  const out: [number, number][] = [];
  for (let i = 0; i + 1 < nums.length; i += 2) out.push([nums[i], nums[i + 1]]);
  return out;
}

function oval(partial: Partial<Oval>): Oval {
  const o = { level: 0.95, centerOffline: 0, centerCarry: 150, semiMajor: 10, semiMinor: 4, angleDeg: 0, area: 0, ...partial };
  return { ...o, area: Math.PI * o.semiMajor * o.semiMinor };
}

describe('ovalPlotGeometry', () => {
  it('ovalPlotGeometry at phone and desktop widths keeps one px per unit on both axes', () => {
    for (const widthPx of [320, 390, 600, 900]) {
      for (const units of ['imperial', 'metric'] as const) {
        const g = ovalPlotGeometry({ shots: SHOTS, groups: GROUPS, units, widthPx });
        const xPerUnit = (g.plot.right - g.plot.left) / (g.domain.offline[1] - g.domain.offline[0]);
        const yPerUnit = (g.plot.bottom - g.plot.top) / (g.domain.carry[1] - g.domain.carry[0]);
        expect(xPerUnit).toBeCloseTo(g.pxPerUnit, 9);
        expect(yPerUnit).toBeCloseTo(g.pxPerUnit, 9);
        expect(g.widthPx).toBe(widthPx);
      }
    }
  });

  it('ovalPlotGeometry of random shots and ovals puts every dot and oval point inside the plot, equal scale', () => {
    const shotArb = fc.record({ offline: fc.double({ min: -60, max: 60, noNaN: true }), carry: fc.double({ min: 20, max: 280, noNaN: true }) });
    const ovalArb = fc.record({
      centerOffline: fc.double({ min: -30, max: 30, noNaN: true }),
      centerCarry: fc.double({ min: 40, max: 260, noNaN: true }),
      semiMajor: fc.double({ min: 0.5, max: 60, noNaN: true }),
      ratio: fc.double({ min: 0.05, max: 1, noNaN: true }),
      angleDeg: fc.double({ min: -89.9, max: 90, noNaN: true }),
    });
    fc.assert(
      fc.property(fc.array(shotArb, { minLength: 1, maxLength: 40 }), fc.array(ovalArb, { maxLength: 3 }), fc.integer({ min: 300, max: 1000 }), fc.boolean(), (raw, ovals, widthPx, imperial) => {
        const shots = raw.map((s, i) => shot(i, i % 2 ? 'A' : 'B', s.offline, s.carry));
        const groups = ovals.map((o, i) => ({
          build: `G${i}`,
          n: 10,
          oval: oval({ ...o, semiMinor: o.semiMajor * o.ratio }),
          predictionOval: oval({ ...o, semiMajor: o.semiMajor * 1.3, semiMinor: o.semiMajor * o.ratio * 1.3 }),
        }));
        const g = ovalPlotGeometry({ shots, groups, units: imperial ? 'imperial' : 'metric', widthPx });
        const eps = 1e-6;
        const inside = ([x, y]: readonly [number, number]) =>
          x >= g.plot.left - eps && x <= g.plot.right + eps && y >= g.plot.top - eps && y <= g.plot.bottom + eps;
        const outside = [...g.dots.map((d) => [d.x, d.y] as [number, number]), ...g.ovals.flatMap((o) => o.points)].filter((p) => !inside(p));
        expect(outside).toEqual([]);
        expect((g.plot.bottom - g.plot.top) / (g.domain.carry[1] - g.domain.carry[0])).toBeCloseTo(g.pxPerUnit, 6);
        expect(g.dots).toHaveLength(shots.length);
      }),
      { numRuns: 150 },
    );
  });

  it('ovalPlotGeometry domain is centred on the target line, drawn in the middle of the plot', () => {
    const g = ovalPlotGeometry({ shots: SHOTS, groups: GROUPS, units: 'imperial', widthPx: 390 });
    expect(g.domain.offline[0]).toBeCloseTo(-g.domain.offline[1], 12);
    expect(g.targetLineX).toBeCloseTo((g.plot.left + g.plot.right) / 2, 9);
  });

  it('ovalPlotGeometry draws a shot left of the line (negative offline) left of the target line, longer higher up', () => {
    const shots = [shot(0, null, -5, 150), shot(1, null, 5, 150), shot(2, null, 0, 170)];
    const g = ovalPlotGeometry({ shots, groups: [], units: 'metric', widthPx: 390 });
    const [left, right, long] = g.dots;
    expect(left.x).toBeLessThan(g.targetLineX);
    expect(right.x).toBeGreaterThan(g.targetLineX);
    expect(long.x).toBeCloseTo(g.targetLineX, 9);
    expect(long.y).toBeLessThan(left.y); // screen y grows downward: farther carry is higher up
    expect(left.x - g.targetLineX).toBeCloseTo(-(right.x - g.targetLineX), 9);
  });

  it('ovalPlotGeometry draws carry and offline grid lines every 10 display units, labelled', () => {
    for (const units of ['imperial', 'metric'] as const) {
      const g = ovalPlotGeometry({ shots: SHOTS, groups: GROUPS, units, widthPx: 390 });
      const carry = g.carryLines.map((l) => l.value);
      expect(carry.length).toBeGreaterThanOrEqual(3);
      for (let i = 1; i < carry.length; i++) expect(carry[i] - carry[i - 1]).toBeCloseTo(10, 9);
      for (const v of carry) expect(v % 10).toBeCloseTo(0, 9);
      expect(g.carryLines.every((l) => l.label === String(l.value))).toBe(true);
      const offline = g.offlineLines.map((l) => l.value);
      for (let i = 1; i < offline.length; i++) expect(offline[i] - offline[i - 1]).toBeCloseTo(10, 9);
      expect(g.offlineLines.find((l) => l.value === -10)?.label).toBe('10 L');
      expect(g.offlineLines.find((l) => l.value === 10)?.label).toBe('10 R');
    }
  });

  it('ovalPlotGeometry in yards puts a 150 yd shot on the 150 grid line', () => {
    // 150 yd = 137.16 m (NIST SP 811, 2008, Appendix B: 1 yd = 0.9144 m).
    const shots = [shot(0, null, 0, 150 * YARD_M), shot(1, null, 3, 140 * YARD_M), shot(2, null, -3, 160 * YARD_M)];
    const g = ovalPlotGeometry({ shots, groups: [], units: 'imperial', widthPx: 390 });
    expect(g.unit).toBe('yd');
    const line150 = g.carryLines.find((l) => l.value === 150)!;
    expect(g.dots[0].y).toBeCloseTo(line150.px, 9);
    const metric = ovalPlotGeometry({ shots, groups: [], units: 'metric', widthPx: 390 });
    expect(metric.unit).toBe('m');
    // 140 yd = 128.016 m (NIST SP 811, 2008, Appendix B: 1 yd = 0.9144 m): the metric dot of
    // that shot sits 128.016 m up the same scale as the grid lines.
    const line140 = metric.carryLines.find((l) => l.value === 140)!;
    const line130 = metric.carryLines.find((l) => l.value === 130)!;
    const pxPerM = (line130.px - line140.px) / 10;
    expect(metric.dots[1].y).toBeCloseTo(line130.px + (130 - 128.016) * pxPerM, 6);
  });

  it('ovalPlotGeometry oval path starts with M, closes with Z and follows ovalOutline', () => {
    const g = ovalPlotGeometry({ shots: SHOTS, groups: GROUPS, units: 'metric', widthPx: 390 });
    expect(g.ovals).toHaveLength(4);
    for (const o of g.ovals) {
      expect(o.path.startsWith('M')).toBe(true);
      expect(o.path.endsWith('Z')).toBe(true);
      expect(pathPoints(o.path)).toHaveLength(72);
    }
    const first = ovalOutline(GROUPS[0].oval!, 72)[0];
    const [[x0, y0]] = pathPoints(g.ovals[0].path);
    const xCentre = g.targetLineX;
    expect(x0).toBeCloseTo(xCentre + first.offline * g.pxPerUnit, 1);
    const yOf = (carry: number) => g.plot.bottom - (carry - g.domain.carry[0]) * g.pxPerUnit;
    expect(y0).toBeCloseTo(yOf(first.carry), 1);
  });

  it('ovalPlotGeometry with angleDeg 0 draws the long axis along carry (up the screen)', () => {
    const groups = [{ build: null, n: 10, oval: oval({ angleDeg: 0, semiMajor: 12, semiMinor: 4 }), predictionOval: null }];
    const g = ovalPlotGeometry({ shots: [], groups, units: 'metric', widthPx: 390 });
    const pts = g.ovals[0].points;
    const xs = pts.map((p) => p[0]);
    const ys = pts.map((p) => p[1]);
    const width = Math.max(...xs) - Math.min(...xs);
    const height = Math.max(...ys) - Math.min(...ys);
    expect(height / width).toBeCloseTo(12 / 4, 2);
    expect(pts[0][0]).toBeCloseTo(g.targetLineX, 9); // the long axis' far end straight up the target line
    expect(pts[0][1]).toBeLessThan(Math.min(...ys) + 1e-9);
  });

  it('ovalPlotGeometry with a positive angleDeg tilts the long axis toward the right', () => {
    const groups = [{ build: null, n: 10, oval: oval({ angleDeg: 30, semiMajor: 12, semiMinor: 4 }), predictionOval: null }];
    const g = ovalPlotGeometry({ shots: [], groups, units: 'metric', widthPx: 390 });
    const [x, y] = g.ovals[0].points[0];
    const cx = g.targetLineX;
    const cy = g.plot.bottom - (150 - g.domain.carry[0]) * g.pxPerUnit;
    // the far end lies 12 m along 30° from carry toward +offline: right and up on the screen
    expect(x - cx).toBeCloseTo(12 * Math.sin(Math.PI / 6) * g.pxPerUnit, 6);
    expect(cy - y).toBeCloseTo(12 * Math.cos(Math.PI / 6) * g.pxPerUnit, 6);
  });

  it('ovalPlotGeometry without prediction ovals draws and fits only the descriptive ones', () => {
    const withPrediction = ovalPlotGeometry({ shots: [], groups: GROUPS, units: 'metric', widthPx: 390 });
    const without = ovalPlotGeometry({ shots: [], groups: GROUPS, units: 'metric', widthPx: 390, showPrediction: false });
    expect(without.ovals.map((o) => o.kind)).toEqual(['descriptive', 'descriptive']);
    expect(without.domain.carry[1] - without.domain.carry[0]).toBeLessThan(withPrediction.domain.carry[1] - withPrediction.domain.carry[0]);
  });

  it('ovalPlotGeometry keeps the plot height within its limits and the scale equal', () => {
    const flat = [shot(0, null, -40, 150), shot(1, null, 40, 151)];
    const tall = [shot(0, null, 0, 20), shot(1, null, 1, 260)];
    const gFlat = ovalPlotGeometry({ shots: flat, groups: [], units: 'metric', widthPx: 390, minPlotHeightPx: 220 });
    expect(gFlat.plot.bottom - gFlat.plot.top).toBeCloseTo(220, 9);
    const gTall = ovalPlotGeometry({ shots: tall, groups: [], units: 'metric', widthPx: 390, maxPlotHeightPx: 500 });
    expect(gTall.plot.bottom - gTall.plot.top).toBeCloseTo(500, 9);
    for (const g of [gFlat, gTall]) {
      expect((g.plot.right - g.plot.left) / (g.domain.offline[1] - g.domain.offline[0])).toBeCloseTo(g.pxPerUnit, 9);
      expect((g.plot.bottom - g.plot.top) / (g.domain.carry[1] - g.domain.carry[0])).toBeCloseTo(g.pxPerUnit, 9);
    }
  });

  it('ovalPlotGeometry colours builds in group order and marks strays and dropped shots', () => {
    const shots = [shot(0, 'B', 1, 150, { stray: true }), shot(1, 'A', 2, 151, { decision: 'drop' }), shot(2, 'C', 0, 149)];
    const g = ovalPlotGeometry({ shots, groups: GROUPS, units: 'metric', widthPx: 390, buildLabels: { A: 'Steel 105' } });
    expect(g.builds.map((b) => [b.key, b.label, b.color])).toEqual([
      ['A', 'Steel 105', BUILD_COLORS[0]],
      ['B', 'B', BUILD_COLORS[1]],
      ['C', 'C', BUILD_COLORS[2]],
    ]);
    expect(g.builds.map((b) => b.shape)).toEqual(['circle', 'square', 'diamond']);
    expect(g.builds[2].n).toBe(1);
    expect(g.dots.map((d) => [d.stray, d.dropped])).toEqual([[true, false], [false, true], [false, false]]);
  });

  it('ovalPlotGeometry with no shots and no ovals still gives a drawable empty plot', () => {
    const g = ovalPlotGeometry({ shots: [], groups: [], units: 'imperial', widthPx: 390 });
    expect(g.dots).toHaveLength(0);
    expect(g.heightPx).toBeGreaterThan(0);
    expect(g.carryLines.length).toBeGreaterThan(0);
  });

  it('ovalPlotGeometry with a zero width throws', () => {
    expect(() => ovalPlotGeometry({ shots: SHOTS, groups: GROUPS, units: 'metric', widthPx: 0 })).toThrow(RangeError);
  });
});

describe('ovalHalfExtents', () => {
  // Closed form of an ellipse's bounding box (analytic geometry, e.g. the "Ellipse" article,
  // Wikipedia), checked against a dense sampling of the outline from analysis/ovals.
  it('ovalHalfExtents of a tilted oval matches the extremes of its sampled outline', () => {
    for (const angleDeg of [-75, -30, 0, 20, 45, 90]) {
      const o = oval({ angleDeg, semiMajor: 9, semiMinor: 3, centerOffline: 2, centerCarry: 100 });
      const pts = ovalOutline(o, 7200);
      const e = ovalHalfExtents(o);
      expect(e.offline).toBeCloseTo(Math.max(...pts.map((p) => Math.abs(p.offline - 2))), 3);
      expect(e.carry).toBeCloseTo(Math.max(...pts.map((p) => Math.abs(p.carry - 100))), 3);
    }
  });
});

describe('ovalPlotSummary', () => {
  it('ovalPlotSummary of 20 shots and two builds reads "7 iron: 20 shots, two builds"', () => {
    expect(ovalPlotSummary('7I', SHOTS, 2)).toBe('7 iron: 20 shots, two builds');
  });

  it('ovalPlotSummary with strays and a dropped shot counts them', () => {
    const shots = [shot(0, null, 0, 150, { stray: true }), shot(1, null, 0, 150, { decision: 'drop' })];
    expect(ovalPlotSummary('DR', shots, 1)).toBe('Driver: 2 shots, one build, 1 stray, 1 dropped');
  });
});
