import fc from 'fast-check';
import { quantileSorted } from 'simple-statistics';
import { medianInPlace, orderStatisticsInPlace } from '@/analysis/statistics';

describe('orderStatisticsInPlace', () => {
  // Hyndman & Fan (1996) type 7 (R's default): quantile(1:4, 0.25) = 1 + 0.75·(2 − 1) = 1.75.
  it('orderStatisticsInPlace on 1..4 gives the type-7 quartiles 1.75 and 3.25', () => {
    expect(orderStatisticsInPlace(Float64Array.of(4, 2, 3, 1))).toEqual({ min: 1, q1: 1.75, median: 2.5, q3: 3.25, max: 4 });
  });

  it('orderStatisticsInPlace on one value gives it everywhere', () => {
    expect(orderStatisticsInPlace(Float64Array.of(7))).toEqual({ min: 7, q1: 7, median: 7, q3: 7, max: 7 });
  });

  it('orderStatisticsInPlace with n below the length ignores the tail', () => {
    expect(orderStatisticsInPlace(Float64Array.of(3, 1, 2, 1000, -1000), 3).max).toBe(3);
    expect(orderStatisticsInPlace(Float64Array.of(3, 1, 2, 1000, -1000), 3).min).toBe(1);
  });

  it('orderStatisticsInPlace on no values throws', () => {
    expect(() => orderStatisticsInPlace(new Float64Array(0))).toThrow(RangeError);
  });

  // Reference library: simple-statistics' quantileSorted (type 7) on a sorted copy.
  it('orderStatisticsInPlace on random data with ties agrees with simple-statistics', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -20, max: 20 }), { minLength: 1, maxLength: 700 }), (ints) => {
        const xs = ints.map((i) => i / 4);
        const sorted = [...xs].sort((a, b) => a - b);
        const r = orderStatisticsInPlace(Float64Array.from(xs));
        expect(r.min).toBe(sorted[0]);
        expect(r.max).toBe(sorted[sorted.length - 1]);
        expect(r.q1).toBeCloseTo(quantileSorted(sorted, 0.25), 12);
        expect(r.median).toBeCloseTo(quantileSorted(sorted, 0.5), 12);
        expect(r.q3).toBeCloseTo(quantileSorted(sorted, 0.75), 12);
      }),
    );
  });
});

describe('medianInPlace', () => {
  it('medianInPlace on an even count gives the mean of the middle two', () => {
    expect(medianInPlace(Float64Array.of(10, 1, 3, 2))).toBe(2.5);
  });
  it('medianInPlace on large random data agrees with simple-statistics', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 601, maxLength: 2000 }), (xs) => {
        const sorted = [...xs].sort((a, b) => a - b);
        expect(medianInPlace(Float64Array.from(xs))).toBeCloseTo(quantileSorted(sorted, 0.5), 9);
      }),
      { numRuns: 30 },
    );
  });
});

describe('order statistics on nothing', () => {
  it('orderStatisticsInPlace and medianInPlace on no values say they need one', () => {
    expect(() => orderStatisticsInPlace(new Float64Array(0))).toThrow('orderStatisticsInPlace needs at least one value');
    expect(() => medianInPlace(new Float64Array(0))).toThrow('medianInPlace needs at least one value');
  });
});
