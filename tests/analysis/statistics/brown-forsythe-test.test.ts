import fc from 'fast-check';
import { jStat } from 'jstat';
import { median, tTestTwoSample } from 'simple-statistics';
import { brownForsytheTest, spreadDifference } from '@/analysis/statistics';

// NIST/SEMATECH e-Handbook of Statistical Methods, §1.3.5.10 (Levene test), GEAR data: gear
// diameters, 10 batches of 10 (copied from the HypothesisTests.jl test data of the same example,
// secondary). Published there: W = 1.705910 with the median (Brown–Forsythe), df 9 and 90; the
// critical value F(0.95; 9, 90) = 1.985595 (from memory).
const GEAR: number[][] = [
  [1.006, 0.996, 0.998, 1.0, 0.992, 0.993, 1.002, 0.999, 0.994, 1.0],
  [0.998, 1.006, 1.0, 1.002, 0.997, 0.998, 0.996, 1.0, 1.006, 0.988],
  [0.991, 0.987, 0.997, 0.999, 0.995, 0.994, 1.0, 0.999, 0.996, 0.996],
  [1.005, 1.002, 0.994, 1.0, 0.995, 0.994, 0.998, 0.996, 1.002, 0.996],
  [0.998, 0.998, 0.982, 0.99, 1.002, 0.984, 0.996, 0.993, 0.98, 0.996],
  [1.009, 1.013, 1.009, 0.997, 0.988, 1.002, 0.995, 0.998, 0.981, 0.996],
  [0.99, 1.004, 0.996, 1.001, 0.998, 1.0, 1.018, 1.01, 0.996, 1.002],
  [0.998, 1.0, 1.006, 1.0, 1.002, 0.996, 0.998, 0.996, 1.002, 1.006],
  [1.002, 0.998, 0.996, 0.995, 0.996, 1.004, 1.004, 0.998, 0.999, 0.991],
  [0.991, 0.995, 0.984, 0.994, 0.997, 0.997, 0.991, 0.998, 1.004, 0.997],
];

describe('brownForsytheTest', () => {
  it('brownForsytheTest on NIST’s GEAR data gives W = 1.705910 with 9 and 90 degrees of freedom', () => {
    const r = brownForsytheTest(GEAR);
    // Within 1e-5 of the printed 1.705910 (the same tolerance HypothesisTests.jl allows; in double
    // precision the statistic is 1.7059177).
    expect(Math.abs(r.w - 1.70591)).toBeLessThan(1e-5);
    expect([r.df1, r.df2]).toEqual([9, 90]);
  });

  // p: an independent computation with jstat's F distribution, and 0.0991 as HypothesisTests.jl's
  // test of the same example states it (secondary); W is below NIST's critical value 1.985595.
  it('brownForsytheTest on the GEAR data gives p = 1 − F(9, 90)(W) ≈ 0.0991, not significant at 5%', () => {
    const r = brownForsytheTest(GEAR);
    expect(r.p).toBeCloseTo(1 - jStat.centralF.cdf(r.w, 9, 90), 12);
    expect(r.p).toBeCloseTo(1 - jStat.centralF.cdf(1.70591, 9, 90), 5);
    expect(r.p).toBeCloseTo(0.0991, 4);
    expect(r.w).toBeLessThan(1.985595);
    expect(jStat.centralF.inv(0.95, 9, 90)).toBeCloseTo(1.985595, 4);
  });

  // For two groups W is the square of the pooled two-sample t on the absolute deviations from the
  // medians: checked against simple-statistics' tTestTwoSample (pooled, an independent npm reference).
  it('brownForsytheTest of two groups equals the squared pooled t on the absolute deviations', () => {
    const a = [12, -8, 25, 3, -15, 30, -22, 6, 9, -4];
    const b = [4, -2, 6, 1, -5, 3, 0, -3, 7, 2, -1];
    const z = (xs: number[]) => xs.map((x) => Math.abs(x - median(xs)));
    const t = tTestTwoSample(z(a), z(b), 0)!;
    expect(brownForsytheTest([a, b]).w).toBeCloseTo(t * t, 9);
  });

  it('brownForsytheTest with one group or a group of one throws', () => {
    expect(() => brownForsytheTest([[1, 2, 3]])).toThrow(RangeError);
    expect(() => brownForsytheTest([[1, 2, 3], [4]])).toThrow(RangeError);
  });
});

describe('spreadDifference', () => {
  it('spreadDifference gives the difference of mean absolute deviations from the medians', () => {
    const r = spreadDifference([0, 10, -10, 20, -20], [0, 1, -1, 2, -2]);
    expect(r.diff).toBeCloseTo(12 - 1.2, 12);
    expect(r.ci[0]).toBeLessThan(r.diff);
  });

  // Property: the interval excludes 0 exactly when the Brown–Forsythe p is below 5% (W = t² for two groups).
  it('spreadDifference’s 95% interval excludes 0 exactly when the test’s p < 0.05', () => {
    const sample = fc.array(fc.integer({ min: -500, max: 500 }), { minLength: 3, maxLength: 30 });
    fc.assert(
      fc.property(sample, sample, fc.integer({ min: 1, max: 5 }), (a, b, k) => {
        const wide = a.map((x) => x * k);
        let r;
        try {
          r = spreadDifference(wide, b);
        } catch {
          return; // no spread at all in the deviations: no test
        }
        fc.pre(Math.abs(r.p - 0.05) > 1e-9);
        expect(r.ci[0] > 0 || r.ci[1] < 0).toBe(r.p < 0.05);
      }),
    );
  });
});

describe('brownForsytheTest at its edges', () => {
  it('brownForsytheTest skips missing values: GEAR with NaN added still gives W = 1.705910', () => {
    const r = brownForsytheTest(GEAR.map((g, i) => (i === 0 ? [Number.NaN, ...g, Number.POSITIVE_INFINITY] : g)));
    expect(Math.abs(r.w - 1.70591)).toBeLessThan(1e-5);
    expect([r.df1, r.df2]).toEqual([9, 90]);
  });

  // Closed form: [1, 3] has deviations 1, 1 from its median 2 (mean 1); [0, 4, 6] has 4, 0, 2 from
  // 4 (mean 2). Grand mean 8/5; between 2·0.6² + 3·0.4² = 1.2; within 0 + 8 = 8;
  // W = (5 − 2)/(2 − 1)·1.2/8 = 0.45 with 1 and 3 df.
  it('brownForsytheTest with a group of two values works: W = 0.45 with 1 and 3 df', () => {
    const r = brownForsytheTest([[1, 3], [0, 4, 6]]);
    expect(r.w).toBeCloseTo(0.45, 12);
    expect([r.df1, r.df2]).toEqual([1, 3]);
  });

  it('brownForsytheTest says what is missing: groups, values, spread', () => {
    expect(() => brownForsytheTest([[1, 2, 3]])).toThrow('brownForsytheTest needs at least two groups');
    expect(() => brownForsytheTest([[1, 2, 3], [4]])).toThrow('brownForsytheTest needs at least two values in every group');
    // Every value 1 from its group's median: the deviations have no spread (W would be 0/0).
    expect(() => brownForsytheTest([[1, 3], [5, 7]])).toThrow('brownForsytheTest needs some spread in the deviations');
  });

  it('spreadDifference with a level of 0, 1 or above 1 says the level must lie in (0, 1)', () => {
    for (const level of [0, 1, 1.5]) expect(() => spreadDifference([1, 5, 9], [2, 3, 7], level)).toThrow('spreadDifference: level must lie in (0, 1)');
  });
});
