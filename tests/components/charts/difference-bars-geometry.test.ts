import { verdictOf, type FieldComparison, type SpreadComparison } from '@/analysis/head-to-head';
import { differenceBarsGeometry, niceCeil } from '@/components/charts/difference-bars-geometry';

const YARD_M = 0.9144; // NIST Special Publication 811 (2008), Appendix B: 1 yd = 0.9144 m exactly
const MPH_MPS = 0.44704; // NIST SP 811 (2008), Appendix B: 1 mph = 0.44704 m/s exactly

function comparison(diff: number, ci95: [number, number], margin = 0.5): FieldComparison {
  const verdict = verdictOf(ci95, margin);
  return { meanA: diff, meanB: 0, diff, ci95, t: 0, df: 10, p: 0.5, margin, verdict, shotsNeeded: verdict === 'unclear' ? 12 : null };
}

// Welch interval of the NAG Library g07ca example (n 4 / 8, means 25.0 / 21.0, sd 0.8185 /
// 4.2083): difference 4.0, 95% CI [0.4410, 7.5590] (NAG Library documentation, g07ca, published).
const NAG = comparison(4, [0.441, 7.559]);

describe('differenceBarsGeometry', () => {
  it('differenceBarsGeometry of the NAG g07ca interval reads +4.0 (0.4 to 7.6) and is clear of zero', () => {
    const g = differenceBarsGeometry({ headToHead: { fields: { launchAngle: NAG } }, fields: ['launchAngle'], units: 'metric', widthPx: 390 });
    const [row] = g.rows;
    expect(row.valueText).toBe('+4.0° (95%: +0.4 to +7.6)');
    expect(row.verdict).toBe('clear');
    expect(row.verdictText).toBe('clear');
    expect(row.lowX).toBeGreaterThan(g.zeroX);
    expect(row.diffX).toBeGreaterThan(row.lowX);
    expect(row.highX).toBeGreaterThan(row.diffX);
  });

  it('differenceBarsGeometry with an interval across zero says not yet clear and spans the zero line', () => {
    const g = differenceBarsGeometry({ headToHead: { fields: { spinRate: comparison(-150, [-420, 120], 150) } }, fields: ['spinRate'], units: 'imperial', widthPx: 390 });
    const [row] = g.rows;
    expect(row.verdict).toBe('unclear');
    expect(row.verdictText).toBe('not yet clear');
    expect(row.lowX).toBeLessThan(g.zeroX);
    expect(row.highX).toBeGreaterThan(g.zeroX);
    expect(row.diffX).toBeLessThan(g.zeroX); // A − B negative: left of zero, "more for B"
    expect(row.valueText).toBe('\u2212150 rpm (95%: \u2212420 to +120)');
  });

  it('differenceBarsGeometry converts carry to yards and speed to mph for imperial', () => {
    const carry = comparison(10 * YARD_M, [5 * YARD_M, 15 * YARD_M]);
    const speed = comparison(2 * MPH_MPS, [1 * MPH_MPS, 3 * MPH_MPS]);
    const g = differenceBarsGeometry({ headToHead: { fields: { carry, ballSpeed: speed } }, fields: ['carry', 'ballSpeed'], units: 'imperial', widthPx: 390 });
    expect(g.rows.map((r) => r.valueText)).toEqual(['+10.0 yd (95%: +5.0 to +15.0)', '+2.0 mph (95%: +1.0 to +3.0)']);
    expect(g.rows.map((r) => r.label)).toEqual(['Carry', 'Ball speed']);
    const metric = differenceBarsGeometry({ headToHead: { fields: { carry } }, fields: ['carry'], units: 'metric', widthPx: 390 });
    expect(metric.rows[0].valueText).toBe('+9.1 m (95%: +4.6 to +13.7)');
  });

  it('differenceBarsGeometry keeps zero in the middle of every row, each row on its own symmetric scale', () => {
    const g = differenceBarsGeometry({
      headToHead: { fields: { carry: comparison(8, [2, 14]), spinRate: comparison(-300, [-700, 100]) } },
      fields: ['carry', 'spinRate', 'offline'],
      units: 'metric',
      widthPx: 600,
    });
    expect(g.rows.map((r) => r.field)).toEqual(['carry', 'spinRate']); // offline is not in the comparison
    expect(g.zeroX).toBeCloseTo((g.plot.left + g.plot.right) / 2, 9);
    for (const r of g.rows) {
      const pxPerUnit = (g.plot.right - g.plot.left) / (2 * r.halfRange);
      expect(r.diffX).toBeCloseTo(g.zeroX + r.diff * pxPerUnit, 9);
      expect(r.lowX).toBeGreaterThanOrEqual(g.plot.left);
      expect(r.highX).toBeLessThanOrEqual(g.plot.right);
    }
    expect(g.rows[0].rangeLabels).toEqual(['\u221220 m', '+20 m']);
    expect(g.rows[1].top).toBeGreaterThan(g.rows[0].top);
  });

  it('differenceBarsGeometry shows the analysis’s verdict and the margin as a band around zero', () => {
    const carry = comparison(0.5 * YARD_M, [-1 * YARD_M, 2 * YARD_M], 3 * YARD_M);
    const g = differenceBarsGeometry({ headToHead: { fields: { carry } }, fields: ['carry'], units: 'imperial', widthPx: 390 });
    const [row] = g.rows;
    expect(row.verdictText).toBe('equivalent');
    expect(row.margin).toBeCloseTo(3, 9);
    expect(row.marginLowX).toBeLessThan(row.lowX);
    expect(row.marginHighX).toBeGreaterThan(row.highX);
    expect(row.marginHighX - g.zeroX).toBeCloseTo(g.zeroX - row.marginLowX, 9);
  });

  it('differenceBarsGeometry adds spread rows with both sds and their ratio after the means', () => {
    const spread: SpreadComparison = {
      sdA: 12 * YARD_M, sdB: 8 * YARD_M, ratio: 1.5, p: 0.01, verdict: 'clear', method: 'Brown–Forsythe (Levene on deviations from the median)',
      w: 7, df1: 1, df2: 18, deviationA: 10 * YARD_M, deviationB: 6 * YARD_M, diff: 4 * YARD_M, ci95: [1.2 * YARD_M, 6.8 * YARD_M], margin: 3 * YARD_M, shotsNeeded: null,
    };
    const g = differenceBarsGeometry({
      headToHead: { fields: { offline: comparison(1, [-2, 4], 2.7432) }, spread: { method: spread.method, fields: { offline: spread } } },
      fields: ['offline'],
      spreadFields: ['offline', 'carry'],
      units: 'imperial',
      widthPx: 390,
    });
    expect(g.rows.map((r) => [r.kind, r.label])).toEqual([['mean', 'Offline'], ['spread', 'Left–right spread']]);
    expect(g.rows[1].valueText).toBe('sd 12.0 vs 8.0 yd · ratio 1.50');
    expect(g.rows[1].diff).toBeCloseTo(4, 9);
  });

  it('differenceBarsGeometry puts a row’s name, numbers and bar on separate lines', () => {
    const g = differenceBarsGeometry({ headToHead: { fields: { smashFactor: comparison(0.002, [-0.009, 0.014], 0.01) } }, fields: ['smashFactor'], units: 'imperial', widthPx: 390 });
    const [row] = g.rows;
    expect(row.valueY - row.labelY).toBeGreaterThanOrEqual(14);
    expect(row.barY - 10 - row.valueY).toBeGreaterThanOrEqual(4);
  });

  it('differenceBarsGeometry gives a clear smash factor interval enough decimals not to read as zero', () => {
    const g = differenceBarsGeometry({ headToHead: { fields: { smashFactor: comparison(-0.0005, [-0.0008, -0.0002], 0.0001) } }, fields: ['smashFactor'], units: 'metric', widthPx: 390 });
    expect(g.rows[0].valueText).toBe('\u22120.0005 (95%: \u22120.0008 to \u22120.0002)');
  });
});

describe('niceCeil', () => {
  it('niceCeil rounds up to 1, 2, 2.5 or 5 times a power of ten', () => {
    expect([7.3, 10, 11, 0.0012, 230, 2.2].map(niceCeil)).toEqual([10, 10, 20, 0.002, 250, 2.5]);
  });
});
