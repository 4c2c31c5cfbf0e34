import fc from 'fast-check';
import { sampleVariance, mean as ssMean } from 'simple-statistics';
import { meanVariance } from '@/analysis/statistics';
import { MICHELSO, NUM_ACC_1, NUM_ACC_2, NUM_ACC_3 } from './nist-datasets';

/** Log relative error, NIST StRD's measure of digits agreeing with a certified value. */
function lre(value: number, certified: number): number {
  return -Math.log10(Math.abs(value - certified) / Math.abs(certified));
}

describe('meanVariance', () => {
  // NIST StRD NumAcc1: certified mean 10000002, sd 1.
  it('meanVariance on NIST NumAcc1 gives the certified mean and sd', () => {
    const r = meanVariance(NUM_ACC_1.data);
    expect(r.mean).toBe(NUM_ACC_1.mean);
    expect(Math.sqrt(r.variance)).toBe(NUM_ACC_1.sd);
  });

  // NIST StRD NumAcc2 (certified mean 1.2, sd 0.1).
  it('meanVariance on NIST NumAcc2 agrees with the certified values to 13 digits', () => {
    const r = meanVariance(NUM_ACC_2.data);
    expect(lre(r.mean, NUM_ACC_2.mean)).toBeGreaterThan(13);
    expect(lre(Math.sqrt(r.variance), NUM_ACC_2.sd)).toBeGreaterThan(13);
  });

  // NIST StRD NumAcc3 (certified mean 1000000.2, sd 0.1): a large mean and a tiny spread.
  it('meanVariance on NIST NumAcc3 keeps at least 9 digits of the certified sd', () => {
    const r = meanVariance(NUM_ACC_3.data);
    expect(lre(r.mean, NUM_ACC_3.mean)).toBeGreaterThan(13);
    expect(lre(Math.sqrt(r.variance), NUM_ACC_3.sd)).toBeGreaterThan(9);
  });

  it('a naive one-pass variance on NIST NumAcc3 is far off, so the data really tests stability', () => {
    // The textbook one-pass formula Σx² − (Σx)²/n cancels catastrophically on data like NumAcc3
    // (Chan, Golub & LeVeque, "Algorithms for computing the sample variance", Am. Stat. 37, 1983);
    // here we only require it to miss the certified value by more than our tolerance.
    let s = 0;
    let q = 0;
    for (const x of NUM_ACC_3.data) {
      s += x;
      q += x * x;
    }
    const n = NUM_ACC_3.data.length;
    const naive = Math.sqrt(Math.max(0, (q - (s * s) / n) / (n - 1)));
    expect(lre(naive, NUM_ACC_3.sd)).toBeLessThan(3);
  });

  // NIST StRD Michelso: certified mean 299.852400000000, sd 0.0790105478190518.
  it('meanVariance on NIST Michelso gives the certified mean and sd to 13 digits', () => {
    expect(MICHELSO.data).toHaveLength(100);
    const r = meanVariance(MICHELSO.data);
    expect(lre(r.mean, MICHELSO.mean)).toBeGreaterThan(13);
    expect(lre(Math.sqrt(r.variance), MICHELSO.sd)).toBeGreaterThan(12);
  });

  it('meanVariance on a run inside an array uses only that run', () => {
    const r = meanVariance([100, 1, 2, 3, 100], 1, 4);
    expect(r).toEqual({ n: 3, mean: 2, variance: 1 });
  });

  it('meanVariance on one value gives NaN variance', () => {
    expect(meanVariance([5]).variance).toBeNaN();
  });

  it('meanVariance on no values throws', () => {
    expect(() => meanVariance([])).toThrow(RangeError);
  });

  // Reference library: simple-statistics' mean and sampleVariance (two-pass, compensated sum).
  it('meanVariance on random data agrees with simple-statistics', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 2, maxLength: 200 }), (xs) => {
        const r = meanVariance(xs);
        const scale = Math.max(1, ...xs.map(Math.abs));
        expect(Math.abs(r.mean - ssMean(xs))).toBeLessThanOrEqual(1e-9 * scale);
        expect(Math.abs(r.variance - sampleVariance(xs))).toBeLessThanOrEqual(1e-9 * scale * scale);
      }),
    );
  });
});

describe('meanVariance on nothing', () => {
  it('meanVariance on an empty run says it needs a value', () => {
    expect(() => meanVariance([])).toThrow('meanVariance needs at least one value');
  });
});
