import { welchTTest } from '@/analysis/statistics';

describe('welchTTest', () => {
  // NAG Library documentation, routine g07ca (Welch's unequal-variance case) example:
  // n 4 / 8, means 25.0 / 21.0, sd 0.8185 / 4.2083 → t 2.5922, df 7.9925, p 0.0320,
  // 95% CI of the difference [0.4410, 7.5590] (published).
  it('welchTTest on the NAG g07ca example gives its t, df, p and interval', () => {
    const r = welchTTest({ n: 4, mean: 25, sd: 0.8185 }, { n: 8, mean: 21, sd: 4.2083 });
    expect(r.diff).toBe(4);
    expect(r.t).toBeCloseTo(2.5922, 4);
    expect(r.df).toBeCloseTo(7.9925, 4);
    expect(r.p).toBeCloseTo(0.032, 4);
    expect(r.ci[0]).toBeCloseTo(0.441, 3);
    expect(r.ci[1]).toBeCloseTo(7.559, 3);
  });

  // NIST/SEMATECH e-Handbook §1.3.5.3 (AUTO83B car mileage): n 249 / 79, means 20.14458 / 30.48101,
  // sd 6.41470 / 6.10771 → Welch t −12.9463, df 136.875 (computed from the published summaries).
  it('welchTTest on the NIST AUTO83B summaries gives t −12.946 with 136.9 df', () => {
    const r = welchTTest({ n: 249, mean: 20.14458, sd: 6.4147 }, { n: 79, mean: 30.48101, sd: 6.10771 });
    expect(r.t).toBeCloseTo(-12.9463, 3);
    expect(r.df).toBeCloseTo(136.875, 2);
    expect(r.p).toBeLessThan(1e-20);
    expect(r.ci[1]).toBeLessThan(0);
  });

  it('welchTTest with A and B swapped negates t and the interval', () => {
    const a = { n: 6, mean: 150, sd: 4 };
    const b = { n: 9, mean: 146, sd: 6 };
    const ab = welchTTest(a, b);
    const ba = welchTTest(b, a);
    expect(ba.t).toBeCloseTo(-ab.t, 12);
    expect(ba.p).toBeCloseTo(ab.p, 12);
    expect(ba.ci[0]).toBeCloseTo(-ab.ci[1], 12);
  });

  it('welchTTest with one value in a sample throws', () => {
    expect(() => welchTTest({ n: 1, mean: 1, sd: 0 }, { n: 5, mean: 1, sd: 1 })).toThrow(RangeError);
  });

  it('welchTTest with no spread in either sample throws', () => {
    expect(() => welchTTest({ n: 3, mean: 1, sd: 0 }, { n: 3, mean: 2, sd: 0 })).toThrow(RangeError);
  });
});

describe('welchTTest at its edges', () => {
  // Closed form with n 2 and 2, sd √2 each: se = √(1 + 1), t = 10/√2, df = 2(n − 1) = 2 (Welch 1947).
  it('welchTTest with two values in each sample gives t = 10/√2 with 2 df', () => {
    const r = welchTTest({ n: 2, mean: 151, sd: Math.SQRT2 }, { n: 2, mean: 141, sd: Math.SQRT2 });
    expect(r.t).toBeCloseTo(10 / Math.SQRT2, 12);
    expect(r.df).toBeCloseTo(2, 12);
  });
  it('welchTTest with one value in either sample says it needs two', () => {
    expect(() => welchTTest({ n: 1, mean: 1, sd: 1 }, { n: 5, mean: 1, sd: 1 })).toThrow('welchTTest needs at least two values in each sample');
    expect(() => welchTTest({ n: 5, mean: 1, sd: 1 }, { n: 1, mean: 1, sd: 1 })).toThrow('welchTTest needs at least two values in each sample');
  });
  it('welchTTest with a level of 0, 1 or above 1 says the level must lie in (0, 1)', () => {
    for (const level of [0, 1, 1.5]) {
      expect(() => welchTTest({ n: 4, mean: 25, sd: 0.8185 }, { n: 8, mean: 21, sd: 4.2083 }, level)).toThrow('welchTTest: level must lie in (0, 1)');
    }
  });
  // Normal table (NIST/SEMATECH e-Handbook §1.3.6.7.1): z(0.95) = 1.644854, the limit of Student's t
  // as df grows, so a 90% interval of a difference with a huge df is diff ± 1.644854·se.
  it('welchTTest at level 0.9 gives the 90% interval', () => {
    const r = welchTTest({ n: 1e7, mean: 10, sd: 3 }, { n: 1e7, mean: 4, sd: 4 }, 0.9);
    const se = Math.sqrt(9 / 1e7 + 16 / 1e7);
    expect(r.ci[1] - r.diff).toBeCloseTo(1.644854 * se, 7);
  });
  it('welchTTest with no spread in either sample says so', () => {
    expect(() => welchTTest({ n: 3, mean: 1, sd: 0 }, { n: 3, mean: 2, sd: 0 })).toThrow('welchTTest needs a spread in at least one sample');
  });
});
