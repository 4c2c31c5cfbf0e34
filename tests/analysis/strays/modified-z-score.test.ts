import fc from 'fast-check';
import { median, medianAbsoluteDeviation } from 'simple-statistics';
import { MODIFIED_Z_LIMIT, modifiedZScores } from '@/analysis/strays';

describe('modifiedZScores', () => {
  // Iglewicz & Hoaglin (1993), "How to Detect and Handle Outliers"; NIST/SEMATECH e-Handbook §1.3.5.17:
  // M = 0.6745·(x − median)/MAD, flag |M| > 3.5. Here median 148 and MAD 1, so M(112) = 0.6745·(−36) = −24.282.
  it('modifiedZScores on a short carry list gives 0.6745·(x − median)/MAD', () => {
    const z = modifiedZScores([148, 150, 147, 149, 112]);
    expect(z.median).toBe(148);
    expect(z.mad).toBe(1);
    expect(z.scale).toBe('mad');
    expect(z.scores[4]).toBeCloseTo(-24.282, 9);
    expect(z.scores[1]).toBeCloseTo(1.349, 9);
  });

  it('MODIFIED_Z_LIMIT is Iglewicz and Hoaglin’s 3.5', () => {
    expect(MODIFIED_Z_LIMIT).toBe(3.5);
  });

  // Reference library: simple-statistics' median and medianAbsoluteDeviation in the published formula.
  it('modifiedZScores on random data agrees with the formula over simple-statistics', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: 10000 }), { minLength: 3, maxLength: 200 }), (ints) => {
        const xs = ints.map((i) => 100 + i / 50);
        const mad = medianAbsoluteDeviation(xs);
        fc.pre(mad > 0);
        const z = modifiedZScores(xs);
        const med = median(xs);
        xs.forEach((x, i) => expect(z.scores[i]).toBeCloseTo((0.6745 * (x - med)) / mad, 9));
      }),
    );
  });

  // MAD 0: IBM's documentation of the modified z score (Cognos Analytics 11.1, "Modified z score")
  // divides by 1.253314·MeanAD instead, 1.253314 = √(π/2) being σ over the mean absolute
  // deviation of a normal distribution (Geary, Biometrika 27, 1935: mean deviation/σ = √(2/π)).
  // Here the mean absolute deviation about the median 5 is 0.8, so M(9) = 4/(√(π/2)·0.8) = 3.9894.
  it('modifiedZScores with MAD 0 scales by √(π/2) × the mean absolute deviation instead', () => {
    const z = modifiedZScores([5, 5, 5, 5, 9]);
    expect(z.mad).toBe(0);
    expect(z.scale).toBe('meanAbsoluteDeviation');
    expect(z.scores[4]).toBeCloseTo(4 / (Math.sqrt(Math.PI / 2) * 0.8), 6);
    expect(z.scores[4]).toBeCloseTo(3.9894, 4);
    expect(z.scores[0]).toBe(0);
    // The MAD-equivalent scale: 0.6745 · √(π/2) · 0.8.
    expect(z.madUsed).toBeCloseTo(0.6745 * Math.sqrt(Math.PI / 2) * 0.8, 6);
  });

  // With the floor, the MAD used is max(MAD, floor): here MAD 0, floor 0.01, so
  // M(1.40) = 0.6745·0.03/0.01 = 2.0235 (the formula of Iglewicz & Hoaglin with the floor's scale).
  it('modifiedZScores with a floor above the MAD scales by the floor', () => {
    const z = modifiedZScores([1.37, 1.37, 1.37, 1.37, 1.4], 0.01);
    expect(z.scale).toBe('floor');
    expect(z.madUsed).toBeCloseTo(0.01, 12);
    expect(z.scores[4]).toBeCloseTo(2.0235, 9);
  });

  it('modifiedZScores with a floor below the MAD leaves the scores as without it', () => {
    const xs = [148, 150, 147, 149, 112];
    expect([...modifiedZScores(xs, 0.5).scores]).toEqual([...modifiedZScores(xs).scores]);
  });

  it('modifiedZScores with a floor given as a function of the median uses that floor', () => {
    const z = modifiedZScores([200, 200, 200, 200, 190], (median) => 0.015 * median);
    expect(z.madUsed).toBeCloseTo(3, 12);
    expect(z.scores[4]).toBeCloseTo((0.6745 * -10) / 3, 9);
  });

  it('modifiedZScores with a negative floor throws', () => {
    expect(() => modifiedZScores([1, 2, 3], -1)).toThrow(RangeError);
  });

  it('modifiedZScores on equal values gives all zeros, never a division by zero', () => {
    const z = modifiedZScores([1.45, 1.45, 1.45]);
    expect(z.scale).toBe('none');
    expect([...z.scores]).toEqual([0, 0, 0]);
    expect(z.madUsed).toBe(0);
  });

  it('modifiedZScores with no finite value gives NaN everywhere and no scale', () => {
    const z = modifiedZScores([Number.NaN, Number.POSITIVE_INFINITY]);
    expect(z.scale).toBe('none');
    expect(z.median).toBeNaN();
    expect([...z.scores].every(Number.isNaN)).toBe(true);
  });

  it('modifiedZScores scores an infinite value NaN, like a missing one, and leaves it out of the median', () => {
    const z = modifiedZScores([148, Number.POSITIVE_INFINITY, 150, 147, Number.NEGATIVE_INFINITY]);
    expect(z.median).toBe(148);
    expect(z.scores[1]).toBeNaN();
    expect(z.scores[4]).toBeNaN();
  });

  // The floor is used only when the MAD is *below* it; at the floor the MAD itself scales.
  it('modifiedZScores with the MAD exactly at the floor scales by the MAD', () => {
    const z = modifiedZScores([1, 2, 3], 1);
    expect(z.mad).toBe(1);
    expect(z.scale).toBe('mad');
    expect(z.scores[2]).toBeCloseTo(0.6745, 12);
  });

  it('modifiedZScores with a floor that is not finite throws, naming the floor', () => {
    expect(() => modifiedZScores([1, 2, 3], Number.POSITIVE_INFINITY)).toThrow('modifiedZScores: the MAD floor must be a finite number ≥ 0');
    expect(() => modifiedZScores([1, 2, 3], () => Number.NaN)).toThrow('modifiedZScores: the MAD floor must be a finite number ≥ 0');
  });

  it('modifiedZScores with missing values scores them NaN and skips them', () => {
    const z = modifiedZScores([148, Number.NaN, 150, 147]);
    expect(z.median).toBe(148);
    expect(z.scores[1]).toBeNaN();
  });

  it('modifiedZScores of shuffled values gives each value the same score', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: 300 }), { minLength: 3, maxLength: 60 }).chain((xs) => fc.tuple(fc.constant(xs), fc.shuffledSubarray(xs, { minLength: xs.length }))), ([xs, ys]) => {
        const a = modifiedZScores(xs);
        const b = modifiedZScores(ys);
        const byValue = new Map(xs.map((x, i) => [x, a.scores[i]]));
        ys.forEach((y, i) => expect(b.scores[i]).toBe(byValue.get(y)));
      }),
    );
  });
});
