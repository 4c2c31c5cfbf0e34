import { jStat } from 'jstat';
import { descriptiveScale2, predictionScale2 } from '@/analysis/ovals';

describe('descriptiveScale2', () => {
  // χ²₂ closed form −2·ln(1 − p): 0.95 → 5.991464547 (Abramowitz & Stegun,
  // Handbook of Mathematical Functions, 1964, §26.4: for ν = 2, Q(χ²) = e^(−χ²/2)).
  it('descriptiveScale2 at 95% gives 5.991465', () => {
    expect(descriptiveScale2(0.95)).toBeCloseTo(5.991464547, 8);
  });
});

describe('predictionScale2', () => {
  // Hotelling prediction region for the next point, k² = 2(n − 1)(n + 1)/(n(n − 2))·F(2, n − 2; level):
  // n = 10, 95% → 11.036 (Chew, "Confidence, prediction and tolerance regions for the multivariate
  // normal distribution", JASA 61, 1966, from memory; F(2, 8; 0.95) = 4·(0.05^(−1/4) − 1) = 4.4590 in
  // closed form, k² = 2·9·11/80 · 4.4590).
  it('predictionScale2 with 10 shots at 95% gives 11.036', () => {
    expect(predictionScale2(10, 0.95)).toBeCloseTo(11.036, 3);
  });

  // The same formula with jstat's F quantile as the reference library.
  it.each([3, 4, 6, 15, 40])('predictionScale2 with %p shots agrees with jstat', (n) => {
    for (const level of [0.68, 0.9, 0.95]) {
      const ref = ((2 * (n - 1) * (n + 1)) / (n * (n - 2))) * jStat.centralF.inv(level, 2, n - 2);
      expect(Math.abs(predictionScale2(n, level) - ref) / ref).toBeLessThan(1e-6);
    }
  });

  it('predictionScale2 for large groups tends to the descriptive scale from above', () => {
    expect(predictionScale2(100000, 0.95)).toBeGreaterThan(descriptiveScale2(0.95));
    expect(predictionScale2(100000, 0.95)).toBeCloseTo(descriptiveScale2(0.95), 3);
    expect(predictionScale2(5, 0.95)).toBeGreaterThan(predictionScale2(10, 0.95));
  });

  it('predictionScale2 with fewer than 3 shots throws', () => {
    expect(() => predictionScale2(2, 0.95)).toThrow(RangeError);
  });
});

describe('predictionScale2 at its boundary', () => {
  // n = 3: F(2, 1; q) = ½·((1 − q)^(−2) − 1) in closed form (F with 2 numerator degrees of freedom),
  // at 95% ½·(400 − 1) = 199.5, so k² = 2·2·4/(3·1)·199.5 = 1064 (Chew, JASA 61, 1966).
  it('predictionScale2 with 3 shots at 95% gives 1064', () => {
    expect(predictionScale2(3, 0.95)).toBeCloseTo(1064, 6);
  });
  it('predictionScale2 with fewer than 3 shots throws that it needs 3', () => {
    expect(() => predictionScale2(2, 0.95)).toThrow('predictionScale2 needs at least 3 shots');
    expect(() => predictionScale2(Number.NaN, 0.95)).toThrow('predictionScale2 needs at least 3 shots');
  });
});
