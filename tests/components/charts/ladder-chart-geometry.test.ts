import { buildLadder, classifyCarryGap, type LadderRung } from '@/analysis/ladder';
import { GAP_FLAG_WORDS, gapFlagWord, ladderChartGeometry, ladderClubLabel } from '@/components/charts/ladder-chart-geometry';

const YARD_M = 0.9144; // NIST Special Publication 811 (2008), Appendix B: 1 yd = 0.9144 m exactly

function rung(club: string, medianM: number, gapToNextM: number | null, extra: Partial<LadderRung> = {}): LadderRung {
  return {
    club,
    builds: [null],
    n: 10,
    carryMedianM: medianM,
    carryQ1M: medianM - 3,
    carryQ3M: medianM + 3,
    carrySdM: 4,
    gapToNextM,
    neighbourToNext: gapToNextM !== null,
    gapFlag: gapToNextM === null ? null : classifyCarryGap(gapToNextM, 'iron', 'iron'),
    loftDeg: null,
    loftStepToNextDeg: null,
    loftStepFlag: null,
    ...extra,
  };
}

describe('ladderChartGeometry', () => {
  it('ladderChartGeometry keeps bag order top to bottom and longer carries to the right', () => {
    // Invented carries, metres; ladder built by analysis/ladder.
    const rungs = buildLadder([
      { club: 'PW', build: null, carryM: [110, 112, 111] },
      { club: '7I', build: null, carryM: [140, 142, 141] },
      { club: '8I', build: null, carryM: [131, 132, 130] },
    ]);
    const g = ladderChartGeometry({ rungs, units: 'metric', widthPx: 390 });
    expect(g.rows.map((r) => r.club)).toEqual(['7I', '8I', 'PW']);
    expect(g.rows.map((r) => r.label)).toEqual(['7 iron', '8 iron', 'Pitching wedge']);
    for (let i = 1; i < g.rows.length; i++) {
      expect(g.rows[i].y).toBeGreaterThan(g.rows[i - 1].y);
      expect(g.rows[i].medianX).toBeLessThan(g.rows[i - 1].medianX);
    }
    for (const r of g.rows) {
      expect(r.q1X).toBeLessThanOrEqual(r.medianX);
      expect(r.q3X).toBeGreaterThanOrEqual(r.medianX);
      expect(r.q1X).toBeGreaterThanOrEqual(g.plot.left);
      expect(r.q3X).toBeLessThanOrEqual(g.plot.right);
    }
  });

  it('ladderChartGeometry writes a gap of 10 yd (9.144 m) as "10 yd" and 9.1 m in metric', () => {
    // 10 yd = 9.144 m (NIST SP 811, 2008, Appendix B).
    const rungs = [rung('7I', 140, 10 * YARD_M), rung('8I', 140 - 10 * YARD_M, null)];
    expect(ladderChartGeometry({ rungs, units: 'imperial', widthPx: 390 }).gaps[0].text).toBe('10 yd');
    expect(ladderChartGeometry({ rungs, units: 'metric', widthPx: 390 }).gaps[0].text).toBe('9 m');
    expect(ladderChartGeometry({ rungs, units: 'imperial', widthPx: 390 }).rows[0].medianLabel).toBe('153'); // 140 m = 153.1 yd
  });

  it('ladderChartGeometry maps tight, wide and reversed gaps to words beside the number', () => {
    // Gap rules (analysis/ladder GAP_RULES, common practice, no source): tight under 7 yd, wide over 20 yd.
    const rungs = [
      rung('5I', 170, 4),
      rung('6I', 166, 22),
      rung('7I', 144, -2),
      rung('8I', 146, 12),
      rung('9I', 134, null),
    ];
    const g = ladderChartGeometry({ rungs, units: 'metric', widthPx: 390 });
    expect(g.gaps.map((gap) => [gap.flag, gap.text])).toEqual([
      ['tight', '4 m · tight'],
      ['wide', '22 m · wide'],
      ['reversed', '\u22122 m · reversed'],
      [null, '12 m'],
    ]);
    expect(GAP_FLAG_WORDS).toEqual({ tight: 'tight', wide: 'wide', reversed: 'reversed' });
    expect(gapFlagWord(null)).toBeNull();
  });

  it('ladderChartGeometry places each gap label between its two rows', () => {
    const rungs = [rung('7I', 140, 10), rung('8I', 130, 10), rung('9I', 120, null)];
    const g = ladderChartGeometry({ rungs, units: 'metric', widthPx: 390 });
    expect(g.gaps).toHaveLength(2);
    g.gaps.forEach((gap, i) => {
      expect(gap.y1).toBe(g.rows[i].y);
      expect(gap.y2).toBe(g.rows[i + 1].y);
      expect(gap.labelY).toBeGreaterThan(gap.y1);
      expect(gap.labelY).toBeLessThan(gap.y2);
      expect(gap.from).toBe(g.rows[i].club);
    });
    expect(g.gapColumnX).toBeGreaterThan(g.plot.right);
    expect(g.gapColumnX).toBeLessThan(390);
  });

  it('ladderChartGeometry writes wedge loft steps with their flag word', () => {
    // Wedge loft steps of 4–6° (analysis/ladder WEDGE_LOFT_STEP, common practice, no source).
    const rungs = [
      rung('GW', 100, 10, { loftStepToNextDeg: 8, loftStepFlag: 'wide' }),
      rung('SW', 90, 10, { loftStepToNextDeg: 4 }),
      rung('LW', 80, null),
    ];
    const g = ladderChartGeometry({ rungs, units: 'metric', widthPx: 390 });
    expect(g.gaps.map((gap) => gap.loftText)).toEqual(['+8° loft · wide', '+4° loft']);
  });

  it('ladderChartGeometry draws carry grid lines every 10 units on a desktop width', () => {
    const rungs = [rung('7I', 140, 10), rung('8I', 130, null)];
    const g = ladderChartGeometry({ rungs, units: 'imperial', widthPx: 900 });
    const values = g.carryLines.map((l) => l.value);
    for (let i = 1; i < values.length; i++) expect(values[i] - values[i - 1]).toBeCloseTo(10, 9);
    expect(g.carryLines.some((l) => l.label !== null)).toBe(true);
  });

  it('ladderChartGeometry with a zero width throws', () => {
    expect(() => ladderChartGeometry({ rungs: [], units: 'metric', widthPx: 0 })).toThrow(RangeError);
  });
});

describe('ladderChartGeometry label column', () => {
  it('ladderChartGeometry, a pitching wedge in the ladder, widens the label column to fit its full name', () => {
    const rungs = buildLadder([
      { club: '9I', build: null, carryM: [120, 121, 122] },
      { club: 'PW', build: null, carryM: [110, 112, 111] },
    ]);
    const irons = ladderChartGeometry({ rungs: rungs.slice(0, 1), units: 'metric', widthPx: 390 });
    const withWedge = ladderChartGeometry({ rungs, units: 'metric', widthPx: 390 });
    // 14 characters at 13 px Inter need about 95 px (common practice, no source: ~0.55 em per character)
    expect(withWedge.plot.left).toBeGreaterThanOrEqual(100);
    expect(withWedge.plot.left).toBeGreaterThan(irons.plot.left);
  });
});

describe('ladderClubLabel', () => {
  it('ladderClubLabel names every club in full words, wedges too (never a code)', () => {
    expect(['DR', '3W', '4H', '7I', 'PW', 'W56', 'XX'].map(ladderClubLabel)).toEqual(['Driver', '3 wood', '4 hybrid', '7 iron', 'Pitching wedge', '56° wedge', 'XX']);
  });
});
