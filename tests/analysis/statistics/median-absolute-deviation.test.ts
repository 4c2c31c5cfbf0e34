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
