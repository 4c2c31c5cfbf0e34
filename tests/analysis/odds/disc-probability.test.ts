import { jStat } from 'jstat';
import { discProbability, greenOdds } from '@/analysis/odds';
import { predictionScale2 } from '@/analysis/ovals';

/** An independent check: the density summed on a fine grid over the disc (midpoint rule). */
function gridProbability(centre: [number, number], s: { xx: number; yy: number; xy: number }, dof: number, disc: [number, number], R: number, cells = 1200): number {
  const det = s.xx * s.yy - s.xy * s.xy;
  const h = (2 * R) / cells;
  let sum = 0;
  for (let i = 0; i < cells; i++) {
    for (let j = 0; j < cells; j++) {
      const x = disc[0] - R + (i + 0.5) * h;
      const y = disc[1] - R + (j + 0.5) * h;
      if ((x - disc[0]) ** 2 + (y - disc[1]) ** 2 > R * R) continue;
      const dx = x - centre[0];
      const dy = y - centre[1];
      const q = (s.yy * dx * dx - 2 * s.xy * dx * dy + s.xx * dy * dy) / det;
      const f = Number.isFinite(dof) ? Math.pow(1 + q / dof, -(dof + 2) / 2) : Math.exp(-q / 2);
      sum += f;
    }
  }
  return (sum * h * h) / (2 * Math.PI * Math.sqrt(det));
}

describe('discProbability', () => {
  // Rayleigh: a centred isotropic bivariate normal, P(r ≤ R) = 1 − exp(−R²/(2σ²)):
  // R = σ → 0.393469, R = 2σ → 0.864665 (closed form).
  it.each([
    [1, 0.393469],
    [2, 0.864665],
  ])('discProbability of a centred isotropic normal at R = %i σ is Rayleigh’s %f', (k, expected) => {
    const sigma = 7;
    expect(discProbability({ centre: [3, 150], scale: { xx: sigma ** 2, yy: sigma ** 2, xy: 0 }, dof: Infinity, disc: [3, 150], radiusM: k * sigma })).toBeCloseTo(expected, 6);
  });

  // Centred isotropic Student t: Q/2 ~ F(2, ν), whose closed form F(2, m; q) = (m/2)((1 − q)^(−2/m) − 1)
  // inverts to P(Q ≤ R²/σ²) = 1 − (1 + R²/(νσ²))^(−ν/2).
  it('discProbability of a centred isotropic t follows the closed form of F(2, ν)', () => {
    for (const nu of [1, 3, 8]) {
      const p = discProbability({ centre: [0, 0], scale: { xx: 4, yy: 4, xy: 0 }, dof: nu, disc: [0, 0], radiusM: 3 });
      expect(p).toBeCloseTo(1 - Math.pow(1 + 9 / (nu * 4), -nu / 2), 6);
    }
  });

  // Off centre, isotropic normal: the noncentral χ² with 2 df, as a Poisson mixture of central χ²
  // (an independent series, each term by jstat's χ² distribution).
  it('discProbability of an isotropic normal off the circle’s centre agrees with the noncentral χ² series', () => {
    const sigma = 5;
    for (const [d, R] of [[4, 6], [12, 5], [30, 8]]) {
      const lambda = (d * d) / (sigma * sigma);
      let series = 0;
      let poisson = Math.exp(-lambda / 2);
      for (let j = 0; j < 200; j++) {
        series += poisson * jStat.chisquare.cdf((R * R) / (sigma * sigma), 2 + 2 * j);
        poisson *= lambda / 2 / (j + 1);
      }
      const p = discProbability({ centre: [d, 0], scale: { xx: 25, yy: 25, xy: 0 }, dof: Infinity, disc: [0, 0], radiusM: R });
      expect(p).toBeCloseTo(series, 6);
    }
  });

  it('discProbability of an elongated, tilted normal and t agrees with a fine grid sum', () => {
    const scale = { xx: 64, yy: 16, xy: 12 };
    for (const [dof, disc] of [[Infinity, [2, 150]], [6, [2, 150]], [Infinity, [-15, 140]], [4, [-15, 140]]] as const) {
      const p = discProbability({ centre: [3, 148], scale, dof, disc: disc as [number, number], radiusM: 9 });
      expect(p).toBeCloseTo(gridProbability([3, 148], scale, dof, disc as [number, number], 9), 4);
    }
  });

  it('discProbability of a circle far larger than the spread is about 1', () => {
    expect(discProbability({ centre: [0, 0], scale: { xx: 1, yy: 4, xy: 1 }, dof: Infinity, disc: [1, 1], radiusM: 200 })).toBeCloseTo(1, 6);
  });

  it('discProbability with a scale that is not positive definite throws', () => {
    expect(() => discProbability({ centre: [0, 0], scale: { xx: 1, yy: 1, xy: 1 }, dof: Infinity, disc: [0, 0], radiusM: 1 })).toThrow(RangeError);
  });
});

describe('greenOdds', () => {
  // The predictive t's regions are the Hotelling prediction ovals: for an isotropic sample
  // covariance s²·I and a green centred on the mean with R² = k²·s², k² = 2(n−1)(n+1)/(n(n−2))·
  // F(2, n−2; q) (Chew 1966; for n = 10 and q = 0.95, k² = 11.036), the odds are exactly q.
  it('greenOdds on the Hotelling 95% prediction circle of 10 shots gives 0.95', () => {
    const s2 = 36;
    const k2 = predictionScale2(10, 0.95);
    expect(k2).toBeCloseTo(11.036, 3);
    const p = greenOdds({ n: 10, mean: [1, 140], covariance: { xx: s2, yy: s2, xy: 0 }, target: [1, 140], radiusM: Math.sqrt(k2 * s2) });
    expect(p).toBeCloseTo(0.95, 6);
  });

  it('greenOdds of shots on a line gives null, and of two shots throws', () => {
    expect(greenOdds({ n: 5, mean: [0, 0], covariance: { xx: 4, yy: 4, xy: 4 }, target: [0, 0], radiusM: 5 })).toBeNull();
    expect(() => greenOdds({ n: 2, mean: [0, 0], covariance: { xx: 4, yy: 4, xy: 0 }, target: [0, 0], radiusM: 5 })).toThrow(RangeError);
  });
});
