import { hermite, hermiteRoot, hermiteSlope } from '@/analysis/flight/hermite';

// Cubic Hermite interpolation (Burden & Faires, "Numerical Analysis", 9th ed., 2011, §3.4): the
// cubic through two end values with two end slopes is unique, so a cubic polynomial is reproduced
// exactly, value and slope, anywhere on the step.
describe('hermite', () => {
  const P = (t: number) => 2 - 3 * t + 5 * t * t - 7 * t * t * t;
  const dP = (t: number) => -3 + 10 * t - 21 * t * t;
  const h = 0.3;
  it.each([0, 0.1, 0.25, 0.5, 0.8, 1])('hermite and hermiteSlope at s = %d reproduce a cubic and its derivative', (s) => {
    expect(hermite(P(0), dP(0), P(h), dP(h), h, s)).toBeCloseTo(P(s * h), 12);
    expect(hermiteSlope(P(0), dP(0), P(h), dP(h), h, s)).toBeCloseTo(dP(s * h), 11);
  });
  it('hermite meets its end values and end slopes', () => {
    expect(hermite(1.5, -2, 0.25, 3, 0.2, 0)).toBe(1.5);
    expect(hermite(1.5, -2, 0.25, 3, 0.2, 1)).toBeCloseTo(0.25, 15);
    expect(hermiteSlope(1.5, -2, 0.25, 3, 0.2, 0)).toBeCloseTo(-2, 12);
    expect(hermiteSlope(1.5, -2, 0.25, 3, 0.2, 1)).toBeCloseTo(3, 12);
  });
});

/** The root in [0, 1] of f, from f(0) > 0 to f(1) ≤ 0, by 200 bisections: the reference here. */
function bisect(f: (s: number) => number): number {
  let lo = 0;
  let hi = 1;
  for (let i = 0; i < 200; i++) {
    const mid = (lo + hi) / 2;
    if (f(mid) > 0) lo = mid;
    else hi = mid;
  }
  return lo;
}

describe('hermiteRoot', () => {
  // With p0 = 1, p1 = −1 and flat ends the segment is 4s³ − 6s² + 1 = (2s − 1)(2s² − 2s − 1): roots
  // 1/2 and (1 ± √3)/2; only 1/2 lies in the step.
  it('hermiteRoot finds the root in the step, not the cubic’s others at (1 ± √3)/2', () => {
    expect(hermiteRoot(1, 0, -1, 0, 1)).toBeCloseTo(0.5, 15);
    expect(hermiteRoot(1, 0, -1, 0, 0.25)).toBeCloseTo(0.5, 15);
  });
  // p0 = 0.2, m0 = 5, p1 = −1, m1 = −0.2 on a unit step is 7.2s³ − 13.4s² + 5s + 0.2, one root in
  // [0, 1] near 0.579. Plain Newton from the secant guess 1/6 leaves the step (to about −0.036);
  // the bracket must hold it. The reference root is bisected here on the polynomial itself.
  it('hermiteRoot stays in the step where plain Newton would leave it, and places the root to 1e-12', () => {
    const f = (s: number) => ((7.2 * s - 13.4) * s + 5) * s + 0.2;
    expect(Math.abs(hermiteRoot(0.2, 5, -1, -0.2, 1) - bisect(f))).toBeLessThan(1e-12);
  });
  // p0 = 1, m0 = −3.5, p1 = −0.25, m1 = 1.25 is 0.25s³ + 2s² − 3.5s + 1: one root in the step near
  // 0.366, another just past its end near 1.150, where an unguarded Newton step heads.
  it('hermiteRoot keeps to the step where Newton would run past its end to the next root', () => {
    const f = (s: number) => ((0.25 * s + 2) * s - 3.5) * s + 1;
    expect(Math.abs(hermiteRoot(1, -3.5, -0.25, 1.25, 1) - bisect(f))).toBeLessThan(1e-12);
  });
  it('hermiteRoot of a straight segment is the secant’s crossing', () => {
    // p0 = 3, p1 = −1 with the slope of the chord (−4) at both ends is the line 3 − 4s: root 3/4.
    expect(hermiteRoot(3, -4, -1, -4, 1)).toBe(0.75);
  });
});
