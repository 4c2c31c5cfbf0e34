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
