import fc from 'fast-check';
import { sampleCovariance as ssCovariance, sampleVariance } from 'simple-statistics';
import { sampleCovariance2 } from '@/analysis/statistics';
import { NUM_ACC_3 } from './nist-datasets';

// NIST/SEMATECH e-Handbook of Statistical Methods, §6.5.4.1, example: five observations of three
// variables → mean (4.10, 2.08, 0.604), covariance [[0.025, 0.0075, 0.00175],
// [0.0075, 0.007, 0.00135], [0.00175, 0.00135, 0.00043]].
const X1 = [4.0, 4.2, 3.9, 4.3, 4.1];
const X2 = [2.0, 2.1, 2.0, 2.1, 2.2];
const X3 = [0.6, 0.59, 0.58, 0.62, 0.63];

describe('sampleCovariance2', () => {
  it('sampleCovariance2 on the NIST e-Handbook 6.5.4.1 example gives its covariance matrix', () => {
    const c12 = sampleCovariance2(X1, X2);
    expect(c12.meanX).toBeCloseTo(4.1, 12);
    expect(c12.meanY).toBeCloseTo(2.08, 12);
    expect(c12.xx).toBeCloseTo(0.025, 12);
    expect(c12.xy).toBeCloseTo(0.0075, 12);
    expect(c12.yy).toBeCloseTo(0.007, 12);
    const c13 = sampleCovariance2(X1, X3);
    expect(c13.meanY).toBeCloseTo(0.604, 12);
    expect(c13.xy).toBeCloseTo(0.00175, 12);
    expect(c13.yy).toBeCloseTo(0.00043, 12);
    expect(sampleCovariance2(X2, X3).xy).toBeCloseTo(0.00135, 12);
  });

  it('sampleCovariance2 with n uses only the leading pairs', () => {
    expect(sampleCovariance2([1, 2, 3, 50], [2, 4, 6, -9], 3)).toEqual({ n: 3, meanX: 2, meanY: 4, xx: 1, xy: 2, yy: 4 });
  });

  it('sampleCovariance2 on one pair throws', () => {
    expect(() => sampleCovariance2([1], [2])).toThrow(RangeError);
  });

  // Reference library: simple-statistics' sampleCovariance and sampleVariance.
  it('sampleCovariance2 on random pairs agrees with simple-statistics', () => {
    const pairs = fc.array(fc.tuple(fc.double({ min: -300, max: 300, noNaN: true }), fc.double({ min: 0, max: 300, noNaN: true })), {
      minLength: 2,
      maxLength: 100,
    });
    fc.assert(
      fc.property(pairs, (ps) => {
        const x = ps.map((p) => p[0]);
        const y = ps.map((p) => p[1]);
        const c = sampleCovariance2(x, y);
        expect(c.xy).toBeCloseTo(ssCovariance(x, y), 7);
        expect(c.xx).toBeCloseTo(sampleVariance(x), 7);
        expect(c.yy).toBeCloseTo(sampleVariance(y), 7);
      }),
    );
  });
});

describe('sampleCovariance2 on hard data and at its edges', () => {
  // NIST StRD NumAcc3 (certified sd 0.1 about a mean of 1000000.2): paired with itself, the
  // variances and the covariance are all the certified variance 0.01 (9 digits, as the mean test).
  it('sampleCovariance2 of NIST NumAcc3 with itself gives the certified variance 0.01 everywhere', () => {
    const c = sampleCovariance2(NUM_ACC_3.data, NUM_ACC_3.data);
    for (const v of [c.xx, c.xy, c.yy]) expect(Math.abs(v - 0.01) / 0.01).toBeLessThan(1e-9);
  });

  // Closed form: x = 1, 2, 3 (the shorter column) and y = 2, 4, 6 → var x 1, cov 2, var y 4.
  it('sampleCovariance2 of columns of different lengths uses the shorter', () => {
    expect(sampleCovariance2([1, 2, 3], [2, 4, 6, 100])).toMatchObject({ n: 3, xx: 1, xy: 2, yy: 4 });
    expect(sampleCovariance2([1, 2, 3, 100], [2, 4, 6])).toMatchObject({ n: 3, xx: 1, xy: 2, yy: 4 });
  });

  it('sampleCovariance2 on one pair says it needs two', () => {
    expect(() => sampleCovariance2([1], [2])).toThrow('sampleCovariance2 needs at least two pairs');
  });
});
