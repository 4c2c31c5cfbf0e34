import fc from 'fast-check';
import { medianAbsoluteDeviation } from 'simple-statistics';
import { robustSpreadInPlace } from '@/analysis/statistics';

describe('robustSpreadInPlace', () => {
  // Worked example in Wikipedia, "Median absolute deviation" (from memory): 1,1,2,2,4,6,9 → median 2, MAD 1.
  it('robustSpreadInPlace on the textbook example gives median 2 and MAD 1', () => {
    const r = robustSpreadInPlace(Float64Array.of(1, 1, 2, 2, 4, 6, 9));
    expect(r.median).toBe(2);
    expect(r.mad).toBe(1);
    expect(r.meanAbsoluteDeviation).toBeNull();
  });

  it('robustSpreadInPlace with most values equal gives MAD 0 and a mean absolute deviation', () => {
    const r = robustSpreadInPlace(Float64Array.of(5, 5, 5, 5, 9));
    expect(r.mad).toBe(0);
    expect(r.meanAbsoluteDeviation).toBeCloseTo(0.8, 15);
  });

  it('robustSpreadInPlace with a short scratch throws', () => {
    expect(() => robustSpreadInPlace(Float64Array.of(1, 2, 3), 3, new Float64Array(2))).toThrow(RangeError);
  });

  // Reference library: simple-statistics' medianAbsoluteDeviation (unscaled MAD).
  it('robustSpreadInPlace on random data agrees with simple-statistics', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -500, max: 500, noNaN: true }), { minLength: 1, maxLength: 300 }), (xs) => {
        expect(robustSpreadInPlace(Float64Array.from(xs)).mad).toBeCloseTo(medianAbsoluteDeviation(xs), 9);
      }),
    );
  });
});

describe('robustSpreadInPlace at its edges', () => {
  // Closed form: five zeros, 1, 1, 1 and 1e16 have median 0 and MAD 0; the mean absolute
  // deviation is (1e16 + 3)/9 = 1111111111111111.44…, whose nearest double is
  // 1111111111111111.5 (doubles there are 0.125 apart). Summed in sorted order the small values
  // count whatever order the shots came in; summed with 1e16 first, each 1 is lost to rounding.
  it('robustSpreadInPlace gives the correctly rounded mean absolute deviation in any order of the input', () => {
    const values = [0, 0, 0, 0, 0, 1e16, 1, 1, 1];
    for (const order of [values, [...values].reverse(), [1, 1, 1, 1e16, 0, 0, 0, 0, 0]]) {
      expect(robustSpreadInPlace(Float64Array.from(order)).meanAbsoluteDeviation).toBe(1111111111111111.5);
    }
  });
  it('robustSpreadInPlace says what is wrong: no values, a short scratch', () => {
    expect(() => robustSpreadInPlace(new Float64Array(0))).toThrow('robustSpreadInPlace needs at least one value');
    expect(() => robustSpreadInPlace(Float64Array.of(1, 2, 3), 3, new Float64Array(2))).toThrow('scratch is shorter than the values');
  });
});
