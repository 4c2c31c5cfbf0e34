import { jStat } from 'jstat';
import { compareBuilds, SPREAD_METHOD } from '@/analysis/head-to-head';
import { withMoments } from './samples';

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

  // Spread: F = sA²/sB², two-sided p from jstat's F distribution (reference library).
  it('compareBuilds spread gives the variance ratio and its two-sided p', () => {
    const spread = compareBuilds(a, b).spread;
    expect(spread.method).toBe(SPREAD_METHOD);
    const f = (0.8185 * 0.8185) / (4.2083 * 4.2083);
    expect(spread.fields.carry!.f).toBeCloseTo(f, 9);
    expect(spread.fields.carry!.p).toBeCloseTo(2 * jStat.centralF.cdf(f, 3, 7), 9);
  });

  it('compareBuilds with a clear difference needs no more shots', () => {
    expect(compareBuilds(a, b).shotsNeeded.carry).toBeNull();
  });

  // Normal approximation n = 2·(z0.975 + z0.8)²·s²/d²: s 5, d 2 → 98.11, so 99 per build, 89 more.
  it('compareBuilds with an unclear difference says how many more shots per build', () => {
    const h = compareBuilds(
      { club: 'DR', build: 'A', columns: { carry: withMoments(10, 232, 5) } },
      { club: 'DR', build: 'B', columns: { carry: withMoments(10, 230, 5) } },
    );
    expect(h.fields.carry!.p).toBeGreaterThan(0.05);
    expect(h.shotsNeeded.carry).toBe(89);
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
