import fc from 'fast-check';
import { compareBuilds, verdictOf } from '@/analysis/head-to-head';

describe('verdictOf', () => {
  // Schuirmann, J. Pharmacokinet. Biopharm. 15 (1987): equivalence when the interval lies inside ±margin.
  it('verdictOf with the interval inside ±margin says equivalent, even when it excludes 0', () => {
    expect(verdictOf([-1.2, 2], 2.7432)).toBe('equivalent');
    expect(verdictOf([0.4, 2], 2.7432)).toBe('equivalent');
  });
  it('verdictOf with an interval clear of 0 reaching past the margin says clear', () => {
    expect(verdictOf([0.8, 5.1], 2.7432)).toBe('clear');
    expect(verdictOf([-9, -2], 2.7432)).toBe('clear');
  });
  it('verdictOf with an interval holding 0 and reaching past the margin says unclear', () => {
    expect(verdictOf([-10.2 * 0.9144, 12.5 * 0.9144], 2.7432)).toBe('unclear');
  });
  it('verdictOf with a margin of 0 throws', () => {
    expect(() => verdictOf([1, 2], 0)).toThrow(RangeError);
  });

  // Schuirmann's two one-sided tests reject δ ≤ −margin and δ ≥ margin: the interval must lie
  // strictly inside (−margin, margin). An interval excludes 0 only when 0 is outside it (a
  // closed interval that ends at 0 holds it).
  it('verdictOf with an interval ending exactly at ±margin is not equivalent', () => {
    expect(verdictOf([-2, 1], 2)).toBe('unclear');
    expect(verdictOf([-1, 2], 2)).toBe('unclear');
    expect(verdictOf([0.5, 2], 2)).toBe('clear');
    expect(verdictOf([-2, -0.5], 2)).toBe('clear');
    expect(verdictOf([-1.999, 1.999], 2)).toBe('equivalent');
  });
  it('verdictOf with an interval ending exactly at 0 and past the margin is unclear', () => {
    expect(verdictOf([0, 5], 2)).toBe('unclear');
    expect(verdictOf([-5, 0], 2)).toBe('unclear');
    expect(verdictOf([1e-9, 5], 2)).toBe('clear');
  });
  it('verdictOf reads an interval given high end first as the same interval', () => {
    expect(verdictOf([5.1, 0.8], 2.7432)).toBe('clear');
    expect(verdictOf([2, -1.2], 2.7432)).toBe('equivalent');
    expect(verdictOf([12, -10], 2.7432)).toBe('unclear');
  });
  it('verdictOf with a margin or interval that is not a finite number throws, naming which', () => {
    expect(() => verdictOf([1, 2], -1)).toThrow('verdictOf: the margin must be a positive number');
    expect(() => verdictOf([1, 2], Number.POSITIVE_INFINITY)).toThrow('verdictOf: the margin must be a positive number');
    expect(() => verdictOf([1, 2], Number.NaN)).toThrow('verdictOf: the margin must be a positive number');
    expect(() => verdictOf([Number.NaN, 2], 1)).toThrow('verdictOf: the interval must be finite');
    expect(() => verdictOf([1, Number.POSITIVE_INFINITY], 1)).toThrow('verdictOf: the interval must be finite');
    expect(() => verdictOf([Number.NEGATIVE_INFINITY, 1], 1)).toThrow('verdictOf: the interval must be finite');
  });

  // Property: the verdict always agrees with the interval and the margin.
  it('verdictOf always agrees with its interval and margin', () => {
    fc.assert(
      fc.property(fc.double({ min: -100, max: 100, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: 0.001, max: 50, noNaN: true }), (lo, width, margin) => {
        const ci: [number, number] = [lo, lo + width];
        const v = verdictOf(ci, margin);
        const inside = ci[0] > -margin && ci[1] < margin;
        const excludesZero = ci[0] > 0 || ci[1] < 0;
        expect(v === 'equivalent').toBe(inside);
        expect(v === 'clear').toBe(!inside && excludesZero);
        expect(v === 'unclear').toBe(!inside && !excludesZero);
      }),
    );
  });

  // Property: every field of a real comparison carries the verdict of its own interval and margin,
  // and shots still needed exactly when unclear.
  it('compareBuilds gives every field and spread the verdict of its interval and margin', () => {
    const sample = fc.array(fc.integer({ min: 1300, max: 1700 }).map((i) => i / 10), { minLength: 3, maxLength: 25 });
    fc.assert(
      fc.property(sample, sample, fc.double({ min: 0.2, max: 10, noNaN: true }), (x, y, margin) => {
        const h = compareBuilds({ club: '7I', build: 'A', columns: { carry: x, offline: y } }, { club: '7I', build: 'B', columns: { carry: y, offline: x } }, { margins: { carry: margin, offline: margin } });
        for (const c of [...Object.values(h.fields), ...Object.values(h.spread.fields)]) {
          expect(c.verdict).toBe(verdictOf(c.ci95, c.margin));
          expect(c.shotsNeeded !== null).toBe(c.verdict === 'unclear');
        }
      }),
    );
  });
});
