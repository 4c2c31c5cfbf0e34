import { jStat } from 'jstat';
import {
  chiSquare2Quantile,
  fCdf,
  fQuantile2,
  normalQuantile,
  studentTCdf,
  studentTQuantile,
} from '@/analysis/statistics';

describe('chiSquare2Quantile', () => {
  // Closed form −2·ln(1 − p) (Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, §26.4:
  // for ν = 2, Q(χ²) = e^(−χ²/2)): 0.5 → 1.386294361, 0.68 → 2.278868566, 0.9 → 4.605170186,
  // 0.95 → 5.991464547, 0.99 → 9.210340372.
  it.each([
    [0.5, 1.386294361],
    [0.68, 2.278868566],
    [0.9, 4.605170186],
    [0.95, 5.991464547],
    [0.99, 9.210340372],
  ])('chiSquare2Quantile at %p gives %p', (p, q) => {
    expect(chiSquare2Quantile(p)).toBeCloseTo(q, 8);
  });

  // Reference library: jstat's chisquare.inv.
  it('chiSquare2Quantile across levels agrees with jstat', () => {
    for (const p of [0.01, 0.2, 0.3935, 0.8, 0.975, 0.999]) {
      expect(chiSquare2Quantile(p)).toBeCloseTo(jStat.chisquare.inv(p, 2), 6);
    }
  });

  // The oval at Mahalanobis distance 1 holds 1 − e^(−1/2) = 39.35% of a bivariate normal (the
  // same closed form at χ² = 1).
  it('chiSquare2Quantile at 1 − e^(−1/2) gives 1', () => {
    expect(chiSquare2Quantile(1 - Math.exp(-0.5))).toBeCloseTo(1, 12);
  });

  it('chiSquare2Quantile outside (0, 1) throws', () => {
    expect(() => chiSquare2Quantile(1)).toThrow(RangeError);
    expect(() => chiSquare2Quantile(0)).toThrow(RangeError);
  });
});

describe('fQuantile2', () => {
  // Closed form (m/2)·((1 − q)^(−2/m) − 1) against jstat's centralF.inv (reference library).
  it.each([1, 2, 3, 8, 20, 100])('fQuantile2 with %p denominator df agrees with jstat', (m) => {
    for (const p of [0.5, 0.9, 0.95, 0.99]) {
      const ref = jStat.centralF.inv(p, 2, m);
      expect(Math.abs(fQuantile2(m, p) - ref) / ref).toBeLessThan(1e-6);
    }
  });

  // F tables: F(0.95; 2, 8) = 4.46 (NIST/SEMATECH e-Handbook §1.3.6.7.3, upper critical values of F, from memory).
  it('fQuantile2 at 95% with 8 df gives 4.459', () => {
    expect(fQuantile2(8, 0.95)).toBeCloseTo(4.459, 3);
  });

  it('fQuantile2 with m ≤ 0 throws', () => {
    expect(() => fQuantile2(0, 0.95)).toThrow(RangeError);
  });
});

describe('Student t and normal', () => {
  // t table: t(0.975; 10) = 2.228 (NIST/SEMATECH e-Handbook §1.3.6.7.2, critical values of t).
  it('studentTQuantile at 0.975 with 10 df gives 2.228', () => {
    expect(studentTQuantile(0.975, 10)).toBeCloseTo(2.228139, 5);
  });

  it('studentTCdf of the quantile gives the level back', () => {
    expect(studentTCdf(studentTQuantile(0.9, 7.5), 7.5)).toBeCloseTo(0.9, 9);
  });

  it('studentTCdf at infinities gives 0 and 1', () => {
    expect(studentTCdf(Number.NEGATIVE_INFINITY, 3)).toBe(0);
    expect(studentTCdf(Number.POSITIVE_INFINITY, 3)).toBe(1);
  });

  // Normal table: z(0.975) = 1.959964, z(0.8) = 0.841621 (e.g. NIST e-Handbook §1.3.6.7.1).
  it('normalQuantile at 0.975 and 0.8 gives 1.959964 and 0.841621', () => {
    expect(normalQuantile(0.975)).toBeCloseTo(1.959964, 6);
    expect(normalQuantile(0.8)).toBeCloseTo(0.841621, 6);
  });

  // NIST e-Handbook §1.3.5.9 (JAHANMI2 F test): F 1.123037 with 239/239 df has CDF 0.814808.
  it('fCdf on the NIST F-test example gives its CDF value', () => {
    expect(fCdf(1.123037, 239, 239)).toBeCloseTo(0.814808, 5);
  });

  it('studentTQuantile with df ≤ 0 throws', () => {
    expect(() => studentTQuantile(0.9, 0)).toThrow(RangeError);
  });
});

describe('distribution functions at their edges', () => {
  it('each distribution function names itself and the bad argument when it throws', () => {
    expect(() => chiSquare2Quantile(1)).toThrow('chiSquare2Quantile: probability must lie in (0, 1), got 1');
    expect(() => fQuantile2(8, 0)).toThrow('fQuantile2: probability must lie in (0, 1), got 0');
    expect(() => fQuantile2(0, 0.5)).toThrow('fQuantile2: degrees of freedom must be positive, got 0');
    expect(() => studentTCdf(1, -1)).toThrow('studentTCdf: degrees of freedom must be positive, got -1');
    expect(() => studentTQuantile(1.5, 5)).toThrow('studentTQuantile: probability must lie in (0, 1), got 1.5');
    expect(() => studentTQuantile(0.5, 0)).toThrow('studentTQuantile: degrees of freedom must be positive, got 0');
    expect(() => fCdf(1, 0, 5)).toThrow('fCdf: degrees of freedom must be positive, got 0');
    expect(() => fCdf(1, 5, Number.POSITIVE_INFINITY)).toThrow('fCdf: degrees of freedom must be positive, got Infinity');
    expect(() => normalQuantile(0)).toThrow('normalQuantile: probability must lie in (0, 1), got 0');
  });
  // A distribution function is 1 at +∞ (closed form; jstat itself gives NaN there).
  it('fCdf at +∞ gives 1', () => {
    expect(fCdf(Number.POSITIVE_INFINITY, 2, 5)).toBe(1);
  });
});
