import fc from 'fast-check';
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { eigenSymmetric2x2 } from '@/analysis/statistics';

describe('eigenSymmetric2x2', () => {
  // NIST/SEMATECH e-Handbook §6.5.4.1 covariance, first two variables [[0.025, 0.0075], [0.0075, 0.007]];
  // eigenvalues 0.0277154 and 0.0042846, major axis 19.903° from the first axis (computed by hand from the
  // 2x2 closed form λ = (a + c)/2 ± √(((a − c)/2)² + b²), θ = ½·atan2(2b, a − c)).
  it('eigenSymmetric2x2 on the NIST e-Handbook covariance block gives its eigenvalues and angle', () => {
    const e = eigenSymmetric2x2(0.025, 0.0075, 0.007);
    expect(e.major).toBeCloseTo(0.0277154, 7);
    expect(e.minor).toBeCloseTo(0.0042846, 7);
    expect(e.majorAngleDeg).toBeCloseTo(19.903, 3);
  });

  it('eigenSymmetric2x2 on a multiple of the identity gives angle 0', () => {
    expect(eigenSymmetric2x2(3, 0, 3)).toEqual({ major: 3, minor: 3, majorAngleDeg: 0 });
  });

  it('eigenSymmetric2x2 with the second entry larger gives a major axis at 90°', () => {
    expect(eigenSymmetric2x2(1, 0, 4).majorAngleDeg).toBe(90);
    expect(eigenSymmetric2x2(1, -0, 4).majorAngleDeg).toBe(90);
  });

  it('eigenSymmetric2x2 with a non-finite entry throws', () => {
    expect(() => eigenSymmetric2x2(1, Number.NaN, 1)).toThrow('eigenSymmetric2x2 needs finite entries');
  });

  // Reference library: ml-matrix's EigenvalueDecomposition (Jacobi/QL, from JAMA).
  it('eigenSymmetric2x2 on random symmetric matrices agrees with ml-matrix', () => {
    // Whole multiples of 1e-4: ml-matrix's tql2 fails on subnormal entries such as 5e-324.
    const entry = fc.integer({ min: -1_000_000, max: 1_000_000 }).map((i) => i / 1e4);
    fc.assert(
      fc.property(entry, entry, entry, (a, b, c) => {
        const e = eigenSymmetric2x2(a, b, c);
        const ref = new EigenvalueDecomposition(new Matrix([[a, b], [b, c]]), { assumeSymmetric: true });
        const values = [...ref.realEigenvalues].sort((p, q) => q - p);
        const tol = 1e-9 * Math.max(1, Math.abs(a), Math.abs(b), Math.abs(c));
        expect(Math.abs(e.major - values[0])).toBeLessThanOrEqual(tol);
        expect(Math.abs(e.minor - values[1])).toBeLessThanOrEqual(tol);
        expect(e.majorAngleDeg).toBeGreaterThan(-90);
        expect(e.majorAngleDeg).toBeLessThanOrEqual(90);
        if (e.major === e.minor) return;
        // The major direction is an eigenvector: A·v = λ·v.
        const t = (e.majorAngleDeg * Math.PI) / 180;
        const v = [Math.cos(t), Math.sin(t)];
        expect(Math.abs(a * v[0] + b * v[1] - e.major * v[0])).toBeLessThanOrEqual(10 * tol);
        expect(Math.abs(b * v[0] + c * v[1] - e.major * v[1])).toBeLessThanOrEqual(10 * tol);
      }),
    );
  });
});
