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

  it('compareBuilds result survives a JSON round trip unchanged', () => {
    const h = compareBuilds(a, b);
    expect(JSON.parse(JSON.stringify(h))).toEqual(h);
  });
});
