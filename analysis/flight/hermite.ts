/*
 * Cubic Hermite interpolation on one integration step [0, h] from the values p0, p1 and slopes
 * m0, m1 at its ends, written in the local coordinate s = t/h (e.g. Burden & Faires, "Numerical
 * Analysis", 9th ed., 2011, §3.4): the trajectory integrator places the apex and the landing
 * inside their step with it.
 */

/** Cubic Hermite value on [0, h] from end values p0, p1 and slopes m0, m1, at s = t/h. O(1). */
export function hermite(p0: number, m0: number, p1: number, m1: number, h: number, s: number): number {
  const s2 = s * s;
  const s3 = s2 * s;
  return (2 * s3 - 3 * s2 + 1) * p0 + (s3 - 2 * s2 + s) * h * m0 + (-2 * s3 + 3 * s2) * p1 + (s3 - s2) * h * m1;
}

/** Derivative with respect to t of the Hermite cubic above. O(1). */
export function hermiteSlope(p0: number, m0: number, p1: number, m1: number, h: number, s: number): number {
  const s2 = s * s;
  return ((6 * s2 - 6 * s) * p0 + (6 * s2 - 6 * s) * -p1) / h + (3 * s2 - 4 * s + 1) * m0 + (3 * s2 - 2 * s) * m1;
}

/**
 * Root in [0, 1] of a cubic Hermite segment that changes sign from f(0) > 0 to f(1) ≤ 0: Newton
 * steps from the secant guess, a step that leaves the bracket replaced by bisection, stopping when
 * a Newton step moves s by less than 10⁻¹² (or f(s) = 0). O(1): at most 30 steps.
 */
export function hermiteRoot(p0: number, m0: number, p1: number, m1: number, h: number): number {
  let lo = 0;
  let hi = 1;
  let s = p0 / (p0 - p1);
  for (let i = 0; i < 30; i++) {
    const f = hermite(p0, m0, p1, m1, h, s);
    if (f === 0) return s;
    if (f > 0) lo = s;
    else hi = s;
    const slope = hermiteSlope(p0, m0, p1, m1, h, s) * h;
    const newton = slope !== 0 ? s - f / slope : Number.NaN;
    // Converged before the bracket is looked at: a last Newton step may land on the bracket's
    // end (the root is there), and bisecting then would throw the root away.
    if (Math.abs(newton - s) < 1e-12) return Math.min(hi, Math.max(lo, newton));
    s = newton > lo && newton < hi ? newton : (lo + hi) / 2;
  }
  return s;
}
