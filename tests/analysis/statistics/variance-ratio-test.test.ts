import { varianceRatioTest } from '@/analysis/statistics';

describe('varianceRatioTest', () => {
  // NIST/SEMATECH e-Handbook §1.3.5.9, F test on JAHANMI2 (read through a mirror of the page):
  // n 240 / 240, sd 65.54909 / 61.85425 → F 1.123037, df 239 / 239, CDF 0.814808;
  // two-sided p = 2·(1 − 0.814808) = 0.370384.
  it('varianceRatioTest on the NIST JAHANMI2 example gives F 1.123037 and p 0.3704', () => {
    const r = varianceRatioTest({ n: 240, mean: 688.9987, sd: 65.54909 }, { n: 240, mean: 611.1559, sd: 61.85425 });
    expect(r.f).toBeCloseTo(1.123037, 5);
    expect(r.df1).toBe(239);
    expect(r.df2).toBe(239);
    expect(r.p).toBeCloseTo(0.370384, 4);
  });

  it('varianceRatioTest with A and B swapped gives 1/F and the same p', () => {
    const a = { n: 12, mean: 0, sd: 3 };
    const b = { n: 20, mean: 0, sd: 5 };
    expect(varianceRatioTest(b, a).f).toBeCloseTo(1 / varianceRatioTest(a, b).f, 12);
    expect(varianceRatioTest(b, a).p).toBeCloseTo(varianceRatioTest(a, b).p, 9);
  });

  it('varianceRatioTest with no spread in B throws', () => {
    expect(() => varianceRatioTest({ n: 3, mean: 0, sd: 1 }, { n: 3, mean: 0, sd: 0 })).toThrow(RangeError);
  });
});

describe('varianceRatioTest at its edges', () => {
  // Closed form: F = sA²/sB² = 4 with (1, 1) df; two values each are enough.
  it('varianceRatioTest with two values in each sample gives F = 4 with 1 and 1 df', () => {
    expect(varianceRatioTest({ n: 2, mean: 0, sd: 2 }, { n: 2, mean: 0, sd: 1 })).toMatchObject({ f: 4, df1: 1, df2: 1 });
  });
  it('varianceRatioTest with one value in either sample says it needs two', () => {
    expect(() => varianceRatioTest({ n: 1, mean: 0, sd: 1 }, { n: 5, mean: 0, sd: 1 })).toThrow('varianceRatioTest needs at least two values in each sample');
    expect(() => varianceRatioTest({ n: 5, mean: 0, sd: 1 }, { n: 1, mean: 0, sd: 1 })).toThrow('varianceRatioTest needs at least two values in each sample');
  });
  it('varianceRatioTest with no spread in B says so', () => {
    expect(() => varianceRatioTest({ n: 5, mean: 0, sd: 1 }, { n: 5, mean: 0, sd: 0 })).toThrow('varianceRatioTest needs a spread in sample B');
  });
});
