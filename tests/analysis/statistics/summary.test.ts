import { summarize, summarizeInPlace } from '@/analysis/statistics';
import { MICHELSO, NUM_ACC_3 } from './nist-datasets';

describe('summarize', () => {
  // NIST StRD NumAcc3: certified mean 1000000.2, sd 0.1.
  it('summarize on NIST NumAcc3 gives the certified mean and sd', () => {
    const s = summarize(NUM_ACC_3.data);
    expect(s.n).toBe(1001);
    expect(s.mean).toBeCloseTo(NUM_ACC_3.mean, 8);
    expect(s.sd!).toBeCloseTo(NUM_ACC_3.sd, 9);
    expect(s.median).toBe(1000000.2);
    expect(s.min).toBe(1000000.1);
    expect(s.max).toBe(1000000.3);
  });

  // NIST StRD Michelso: certified mean 299.8524, sd 0.0790105478190518.
  it('summarize on NIST Michelso gives the certified mean and sd', () => {
    const s = summarize(MICHELSO.data);
    expect(s.mean).toBeCloseTo(MICHELSO.mean, 12);
    expect(s.sd!).toBeCloseTo(MICHELSO.sd, 13);
    expect(s.min).toBe(299.62);
    expect(s.max).toBe(300.07);
  });

  it('summarize with missing values skips NaN and infinities', () => {
    const s = summarize([1, Number.NaN, 3, Number.POSITIVE_INFINITY, 2]);
    expect(s).toEqual({ n: 3, mean: 2, sd: 1, median: 2, min: 1, max: 3, q1: 1.5, q3: 2.5 });
  });

  it('summarize on one value gives a null sd', () => {
    expect(summarize([4]).sd).toBeNull();
  });

  it('summarize on nothing finite throws', () => {
    expect(() => summarize([Number.NaN])).toThrow(RangeError);
  });

  it('summarize leaves its input as it was', () => {
    const input = [3, 1, 2];
    summarize(input);
    expect(input).toEqual([3, 1, 2]);
  });

  it('summarizeInPlace with n uses only the leading values', () => {
    expect(summarizeInPlace(Float64Array.of(1, 2, 3, 99), 3).mean).toBe(2);
  });
});

describe('summarize at its edges', () => {
  // Closed form: 1 and 3 have sample sd √((1 + 1)/1) = √2.
  it('summarize on two values gives the sample sd √2', () => {
    expect(summarize([1, 3]).sd).toBeCloseTo(Math.SQRT2, 15);
  });
  it('summarize on only missing values says it needs a finite one', () => {
    expect(() => summarize([Number.NaN, Number.POSITIVE_INFINITY])).toThrow('summarize needs at least one finite value');
  });
});
