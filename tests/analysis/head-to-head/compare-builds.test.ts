import { median } from 'simple-statistics';
import { compareBuilds, DEFAULT_MARGINS, SPREAD_METHOD } from '@/analysis/head-to-head';
import { withMoments } from './samples';

const YD = 0.9144; // NIST SP 811 (2008), Appendix B: 1 yd = 0.9144 m exactly

describe('compareBuilds', () => {
  // NAG Library documentation, g07ca example: n 4 / 8, means 25.0 / 21.0, sd 0.8185 / 4.2083 →
  // Welch t 2.5922, df 7.9925, p 0.0320, 95% CI [0.4410, 7.5590]. The samples below are built to
  // have exactly those summaries.
  const a = { club: '7I', build: 'A', columns: { carry: withMoments(4, 25, 0.8185) } };
  const b = { club: '7I', build: 'B', columns: { carry: withMoments(8, 21, 4.2083) } };

  it('compareBuilds on samples with the NAG g07ca summaries gives its Welch results', () => {
    const h = compareBuilds(a, b);
    const carry = h.fields.carry!;
    expect(carry.meanA).toBeCloseTo(25, 12);
    expect(carry.meanB).toBeCloseTo(21, 12);
    expect(carry.diff).toBeCloseTo(4, 12);
    expect(carry.t).toBeCloseTo(2.5922, 4);
    expect(carry.df).toBeCloseTo(7.9925, 4);
    expect(carry.p).toBeCloseTo(0.032, 4);
    expect(carry.ci95[0]).toBeCloseTo(0.441, 3);
    expect(carry.ci95[1]).toBeCloseTo(7.559, 3);
    expect(h.a).toEqual({ club: '7I', build: 'A' });
  });

  // Spread: the Brown–Forsythe test (checked against NIST's GEAR example in
  // tests/analysis/statistics), the sd ratio, and the deviations from each build's median.
  it('compareBuilds spread gives the sd ratio, the Brown–Forsythe test and the mean deviations from the medians', () => {
    const spread = compareBuilds(a, b).spread;
    expect(spread.method).toBe(SPREAD_METHOD);
    const carry = spread.fields.carry!;
    expect(carry.ratio).toBeCloseTo(0.8185 / 4.2083, 9);
    expect(carry.method).toBe(SPREAD_METHOD);
    const dev = (xs: number[]) => xs.reduce((s, x) => s + Math.abs(x - median(xs)), 0) / xs.length;
    expect(carry.deviationA).toBeCloseTo(dev(a.columns.carry), 12);
    expect(carry.deviationB).toBeCloseTo(dev(b.columns.carry), 12);
    expect([carry.df1, carry.df2]).toEqual([1, 10]);
  });

  it('compareBuilds with a clear difference gives verdict clear and needs no more shots', () => {
    const carry = compareBuilds(a, b).fields.carry!;
    expect(carry.verdict).toBe('clear');
    expect(carry.margin).toBeCloseTo(3 * YD, 12);
    expect(carry.shotsNeeded).toBeNull();
  });

  // Seen: offline called "too small to matter" with a 95% interval of −10.2 to +12.5 yd. With a
  // margin of 3 yd such an interval is not yet clear, and says how many shots would settle it.
  it('compareBuilds with a wide interval around zero says not yet clear, never equivalent', () => {
    const h = compareBuilds(
      { club: 'DR', build: 'A', columns: { offline: withMoments(8, 1.1 * YD, 14 * YD) } },
      { club: 'DR', build: 'B', columns: { offline: withMoments(8, 0, 14 * YD) } },
    );
    const offline = h.fields.offline!;
    expect(offline.ci95[0]).toBeLessThan(-3 * YD);
    expect(offline.ci95[1]).toBeGreaterThan(3 * YD);
    expect(offline.verdict).toBe('unclear');
    expect(offline.shotsNeeded).toBeGreaterThan(8);
  });

  it('compareBuilds with a tight interval inside the margin says equivalent', () => {
    const h = compareBuilds(
      { club: '7I', build: 'A', columns: { carry: withMoments(30, 150.2, 1.5) } },
      { club: '7I', build: 'B', columns: { carry: withMoments(30, 150, 1.5) } },
    );
    expect(h.fields.carry!.verdict).toBe('equivalent');
    expect(h.overall.verdict).toBe('equivalent');
  });

  it('compareBuilds with a shop margin reads the same interval by that margin', () => {
    const samples = [
      { club: '7I', build: 'A', columns: { carry: withMoments(30, 153, 1.5) } },
      { club: '7I', build: 'B', columns: { carry: withMoments(30, 150, 1.5) } },
    ] as const;
    expect(compareBuilds(samples[0], samples[1]).fields.carry!.verdict).toBe('clear');
    expect(compareBuilds(samples[0], samples[1], { margins: { carry: 5 * YD } }).fields.carry!.verdict).toBe('equivalent');
  });

  it('compareBuilds uses the default margins for fields the shop did not set', () => {
    const h = compareBuilds(a, b, { margins: { offline: 9 } });
    expect(h.fields.carry!.margin).toBe(DEFAULT_MARGINS.carry);
  });

  it('compareBuilds with a wider left–right spread in A says so in the summary, in yards', () => {
    const wide = [-30, 22, -15, 28, -25, 18, 5, -8, 30, -20].map((x) => x * YD);
    const tight = [-8, 6, -4, 7, -6, 5, 1, -2, 8, -5].map((x) => x * YD);
    const h = compareBuilds(
      { club: 'DR', build: 'Birch', columns: { offline: wide, carry: withMoments(10, 238 * YD, 4 * YD) } },
      { club: 'DR', build: 'Ash', columns: { offline: tight, carry: withMoments(10, 230 * YD, 4 * YD) } },
    );
    expect(h.spread.fields.offline!.verdict).toBe('clear');
    expect(h.summary).toMatch(/^Birch carries 8\.0 yd farther \(clear\); left–right spread ±\d+\.\d vs ±\d+\.\d yd, wider \(clear\); the rest is equivalent or not yet clear\. Overall: a trade-off: Birch is longer; Ash is tighter left to right\.$/);
    expect(h.overall.verdict).toBe('tradeOff');
  });

  // Holm (1979) across the deciding fields: one clear difference among several could be chance.
  it('compareBuilds with only a marginal carry difference keeps the overall verdict not yet clear', () => {
    const h = compareBuilds(
      { club: 'DR', build: 'Birch', columns: { carry: withMoments(10, 236 * YD, 6 * YD), ballSpeed: withMoments(10, 60, 1), offline: withMoments(10, 0, 8) } },
      { club: 'DR', build: 'Ash', columns: { carry: withMoments(10, 230 * YD, 6 * YD), ballSpeed: withMoments(10, 60, 1), offline: withMoments(10, 0, 8) } },
    );
    expect(h.fields.carry!.verdict).toBe('clear');
    expect(h.fields.carry!.p).toBeGreaterThan(0.05 / 4);
    expect(h.overall.verdict).toBe('unclear');
    expect(h.overall.text).toMatch(/^Overall: not yet clear: Birch looks longer, but with \w+ things weighed that could still be chance/);
  });

  it('compareBuilds of an oval twice as wide in B gives an area ratio of 1/4', () => {
    const offline = [-4, 1, 3, 0, -2, 5];
    const carry = [148, 151, 150, 153, 146, 149];
    const mid = (xs: number[]) => xs.reduce((s, x) => s + x, 0) / xs.length;
    const h = compareBuilds(
      { club: '7I', build: 'A', columns: { offline, carry } },
      {
        club: '7I',
        build: 'B',
        columns: { offline: offline.map((x) => 2 * (x - mid(offline))), carry: carry.map((y) => 150 + 2 * (y - mid(carry))) },
      },
    );
    expect(h.ovalAreaRatio).toBeCloseTo(0.25, 12);
  });

  it('compareBuilds skips fields missing from one build or with too few values', () => {
    const h = compareBuilds(
      { club: '7I', build: 'A', columns: { carry: [150, 151, 149], ballSpeed: [50, 51] , apexHeight: [30] } },
      { club: '7I', build: 'B', columns: { carry: [147, 148, 146], apexHeight: [28, 29] } },
    );
    expect(Object.keys(h.fields)).toEqual(['carry']);
    expect(h.ovalAreaRatio).toBeNull();
  });

  it('compareBuilds skips missing values (NaN) and gives the NAG g07ca results all the same', () => {
    const carry = compareBuilds({ ...a, columns: { carry: [Number.NaN, ...a.columns.carry, Number.NaN] } }, b).fields.carry!;
    expect(carry.t).toBeCloseTo(2.5922, 4);
    expect(carry.df).toBeCloseTo(7.9925, 4);
  });

  // Closed form, Welch (1947) with equal n and sd: t = d/sqrt(2s²/n), df = 2(n − 1).
  it('compareBuilds with two values in each build compares them: t = 10/√2, df 2', () => {
    const h = compareBuilds({ club: '7I', build: 'A', columns: { carry: [150, 152] } }, { club: '7I', build: 'B', columns: { carry: [140, 142] } });
    expect(h.fields.carry!.t).toBeCloseTo(10 / Math.SQRT2, 12);
    expect(h.fields.carry!.df).toBeCloseTo(2, 12);
    // The spread rule needs three values in each build.
    expect(h.spread.fields.carry).toBeUndefined();
    const five = [140, 141, 143, 146, 150];
    expect(compareBuilds({ club: '7I', build: 'A', columns: { carry: [150, 152] } }, { club: '7I', build: 'B', columns: { carry: five } }).spread.fields.carry).toBeUndefined();
    expect(compareBuilds({ club: '7I', build: 'A', columns: { carry: five } }, { club: '7I', build: 'B', columns: { carry: [150, 152] } }).spread.fields.carry).toBeUndefined();
  });

  // Welch, Biometrika 34 (1947): with one variance 0 the Welch–Satterthwaite df is n − 1 of the other.
  it('compareBuilds with no spread in one build compares the means with the other build’s n − 1 degrees of freedom', () => {
    const flat = { club: '7I', build: 'A', columns: { carry: [150, 150, 150] } };
    const varied = { club: '7I', build: 'B', columns: { carry: [140, 142, 144, 146] } };
    expect(compareBuilds(flat, varied).fields.carry!.df).toBeCloseTo(3, 12);
    expect(compareBuilds(varied, flat).fields.carry!.df).toBeCloseTo(3, 12);
    // With no spread in B the sd ratio A/B is infinite: no spread comparison.
    expect(compareBuilds(varied, flat).spread.fields.carry).toBeUndefined();
  });

  it('compareBuilds with no spread in either build leaves the field out', () => {
    const h = compareBuilds({ club: '7I', build: 'A', columns: { carry: [150, 150, 150] } }, { club: '7I', build: 'B', columns: { carry: [140, 140, 140] } });
    expect(h.fields.carry).toBeUndefined();
  });

  // Three values each: A's deviations from its median 2 are 1, 0, 2 (mean 1), B's from 20 are 10, 0, 20 (mean 10).
  it('compareBuilds with three values in each build compares their spread', () => {
    const h = compareBuilds({ club: '7I', build: 'A', columns: { carry: [1, 2, 4] } }, { club: '7I', build: 'B', columns: { carry: [10, 20, 40] } });
    expect(h.spread.fields.carry!.deviationA).toBeCloseTo(1, 12);
    expect(h.spread.fields.carry!.deviationB).toBeCloseTo(10, 12);
  });

  // Every shot exactly 1 from its build's median: the deviations have no spread, the
  // Brown–Forsythe statistic is 0/0, and the spread is left out while the means are compared.
  it('compareBuilds with deviations from the median all equal leaves the spread out', () => {
    const h = compareBuilds({ club: '7I', build: 'A', columns: { carry: [149, 151, 149, 151] } }, { club: '7I', build: 'B', columns: { carry: [139, 141, 139, 141] } });
    expect(h.fields.carry!.diff).toBeCloseTo(10, 12);
    expect(h.spread.fields.carry).toBeUndefined();
  });

  // A shear (x, y) → (x, y + x) has determinant 1, so it keeps the oval's area (closed form:
  // the covariance becomes [[xx, xx + xy], [xx + xy, yy + 2xy + xx]] with the same determinant).
  it('compareBuilds of an oval sheared along carry gives an area ratio of 1', () => {
    const offline = [-1, 1, -1, 1];
    const h = compareBuilds(
      { club: '7I', build: 'A', columns: { offline, carry: [-1, -1, 1, 1] } },
      { club: '7I', build: 'B', columns: { offline, carry: [-2, 0, 0, 2] } },
    );
    expect(h.ovalAreaRatio).toBeCloseTo(1, 12);
  });

  it('compareBuilds leaves a shot out of the oval when its offline or carry is missing', () => {
    const offline = [-4, 1, 3, 0, -2, 5];
    const carry = [148, 151, 150, 153, 146, 149];
    const h = compareBuilds(
      { club: '7I', build: 'A', columns: { offline: [...offline, Number.NaN, 40], carry: [...carry, 120, Number.NaN] } },
      { club: '7I', build: 'B', columns: { offline: offline.map((x) => 2 * x), carry: carry.map((y) => 2 * y) } },
    );
    expect(h.ovalAreaRatio).toBeCloseTo(0.25, 12);
  });

  it('compareBuilds needs three shots with offline and carry for an oval, and B’s oval must have an area', () => {
    const three = { offline: [0, 2, 1], carry: [150, 150, 154] };
    const h3 = compareBuilds({ club: '7I', build: 'A', columns: three }, { club: '7I', build: 'B', columns: { offline: [0, 4, 2], carry: [150, 150, 158] } });
    // B is A scaled by 2 about (0, 150): area ratio 1/4.
    expect(h3.ovalAreaRatio).toBeCloseTo(0.25, 12);
    const two = compareBuilds({ club: '7I', build: 'A', columns: { offline: [0, 2], carry: [150, 152] } }, { club: '7I', build: 'B', columns: three });
    expect(two.ovalAreaRatio).toBeNull();
    // B's shots on one line: a degenerate oval (determinant 0), no ratio.
    const line = compareBuilds({ club: '7I', build: 'A', columns: three }, { club: '7I', build: 'B', columns: { offline: [0, 1, 2], carry: [150, 151, 152] } });
    expect(line.ovalAreaRatio).toBeNull();
  });

  it('compareBuilds result survives a JSON round trip unchanged', () => {
    const h = compareBuilds(a, b);
    expect(JSON.parse(JSON.stringify(h))).toEqual(h);
  });
});
