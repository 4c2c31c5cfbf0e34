import fc from 'fast-check';
import { median, medianAbsoluteDeviation } from 'simple-statistics';
import { GROUND_DISTANCE_LIMIT, robustGroundDistances } from '@/analysis/strays';

/** Seeded normal pairs (mulberry32 + Box–Muller) with sd sx, sy and correlation rho. */
function normalPairs(n: number, sx: number, sy: number, rho: number, seed: number): { x: number[]; y: number[] } {
  let a = seed >>> 0;
  const next = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const x: number[] = [];
  const y: number[] = [];
  for (let i = 0; i < n; i++) {
    const r = Math.sqrt(-2 * Math.log(1 - next()));
    const t = 2 * Math.PI * next();
    const u = r * Math.cos(t);
    const v = r * Math.sin(t);
    x.push(sx * u);
    y.push(150 + sy * (rho * u + Math.sqrt(1 - rho * rho) * v));
  }
  return { x, y };
}

describe('robustGroundDistances', () => {
  // sqrt(χ²₂(0.999)) = sqrt(−2·ln 0.001) = 3.7169 (closed form of the χ² quantile, 2 df).
  it('GROUND_DISTANCE_LIMIT is sqrt(−2·ln 0.001)', () => {
    expect(GROUND_DISTANCE_LIMIT).toBeCloseTo(3.716922, 6);
  });

  // Consistency: 1.4826·MAD estimates σ of normal data, and Gnanadesikan & Kettenring's identity
  // estimates ρ (Gnanadesikan & Kettenring, Biometrics 28, 1972). Large seeded sample, loose tolerance.
  it('robustGroundDistances on a large normal sample recovers its scales and correlation', () => {
    const { x, y } = normalPairs(20000, 6, 4, 0.5, 11);
    const r = robustGroundDistances(x, y);
    expect(r.scaleOffline / 6).toBeCloseTo(1, 1);
    expect(r.scaleCarry / 4).toBeCloseTo(1, 1);
    expect(Math.abs(r.correlation - 0.5)).toBeLessThan(0.04);
    expect(Math.abs(r.centerCarry - 150)).toBeLessThan(0.2);
    // Squared distances of normal data follow χ²₂: about 0.1% beyond the limit.
    const beyond = [...r.distances].filter((d) => d > GROUND_DISTANCE_LIMIT).length / x.length;
    expect(beyond).toBeLessThan(0.004);
  });

  it('robustGroundDistances with one shot far right gives it a distance beyond the limit', () => {
    const { x, y } = normalPairs(30, 5, 5, 0, 3);
    x.push(60);
    y.push(150);
    const r = robustGroundDistances(x, y);
    expect(r.distances[30]).toBeGreaterThan(GROUND_DISTANCE_LIMIT);
  });

  it('robustGroundDistances with shortOnly gives a shot long on line no distance along, and a short one its full distance', () => {
    const { x, y } = normalPairs(30, 5, 5, 0, 5);
    x.push(0, 0);
    y.push(250, 50);
    const both = robustGroundDistances(x, y);
    const short = robustGroundDistances(x, y, { shortOnly: true });
    expect(both.distances[30]).toBeGreaterThan(GROUND_DISTANCE_LIMIT);
    expect(short.distances[30]).toBeLessThan(1);
    expect(short.distances[31]).toBeCloseTo(both.distances[31], 1);
  });

  it('robustGroundDistances with a MAD floor never scales an axis below 1.4826 × the floor', () => {
    const r = robustGroundDistances([0, 0, 0, 0, 0, 0.1], [150, 150, 150, 150, 150, 150], { madFloorOfflineM: 2, madFloorCarryM: 3 });
    expect(r.scaleOffline).toBeCloseTo(1.4826 * 2, 9);
    expect(r.scaleCarry).toBeCloseTo(1.4826 * 3, 9);
  });

  // MAD 0 across (four of five shots on the line): the scale falls back to √(π/2) × the mean
  // absolute deviation, √(π/2) = 1.2533141 being σ over the mean deviation of a normal
  // distribution (Geary, "The ratio of the mean deviation to the standard deviation as a test of
  // normality", Biometrika 27, 1935: mean deviation / σ = √(2/π)); the same fallback as IBM's
  // documentation of the modified z score (Cognos Analytics 11.1, "Modified z score").
  // Mean deviation about the median 0: (0+0+0+0+5)/5 = 1 m.
  it('robustGroundDistances with MAD 0 across scales by √(π/2) × the mean absolute deviation', () => {
    const r = robustGroundDistances([0, 0, 0, 0, 5], [150, 152, 148, 151, 149]);
    expect(r.scaleOffline).toBeCloseTo(Math.sqrt(Math.PI / 2) * 1, 6);
    // Carry: median 150, deviations 0, 2, 2, 1, 1 → MAD 1, scale 1.4826 (1/Φ⁻¹(0.75)).
    expect(r.scaleCarry).toBeCloseTo(1.4826, 9);
    // Shot 5: 5 m right and 1 m short of the centre in standardised units.
    const u = 5 / Math.sqrt(Math.PI / 2);
    const v = -1 / 1.4826;
    const rho = r.correlation;
    expect(r.distances[4]).toBeCloseTo(Math.sqrt((u * u - 2 * rho * u * v + v * v) / (1 - rho * rho)), 5);
  });

  it('robustGroundDistances with a missing value gives NaN there', () => {
    const r = robustGroundDistances([0, 1, Number.NaN, -1, 2], [150, 151, 150, 149, 150]);
    expect(r.distances[2]).toBeNaN();
    expect(r.distances[0]).toBeGreaterThanOrEqual(0);
  });

  // Carry: median 150, deviations 10, 0, 1, 1, 0 → MAD 1, scale 1.4826 (1/Φ⁻¹(0.75)); with no
  // spread across, the distance is the carry part alone: |140 − 150|/1.4826 = 6.7449.
  it('robustGroundDistances with no spread across uses carry alone', () => {
    const r = robustGroundDistances([0, 0, 0, 0, 0], [140, 150, 151, 149, 150]);
    expect(r.scaleOffline).toBe(0);
    expect(r.correlation).toBe(0);
    expect(r.distances[0]).toBeCloseTo(10 / 1.4826, 9);
    expect(r.distances[2]).toBeCloseTo(1 / 1.4826, 9);
  });

  // Shots on a line have correlation ±1 by Gnanadesikan & Kettenring's identity (the scale of the
  // difference of the standardised axes is 0); it is held at ±0.99 so distances stay finite.
  it('robustGroundDistances of shots on a rising or falling line holds the correlation at ±0.99', () => {
    const x = [-2, -1, 0, 1, 2, 3];
    const up = robustGroundDistances(x, x.map((v) => 150 + 2 * v));
    expect(up.correlation).toBe(0.99);
    const down = robustGroundDistances(x, x.map((v) => 150 - 2 * v));
    expect(down.correlation).toBe(-0.99);
    for (const d of [...up.distances, ...down.distances]) expect(Number.isFinite(d)).toBe(true);
  });

  it('robustGroundDistances of no complete pair gives NaN centres and distances', () => {
    const r = robustGroundDistances([Number.NaN, 1], [150, Number.NaN]);
    expect(r.centerOffline).toBeNaN();
    expect(r.centerCarry).toBeNaN();
    expect(r.correlation).toBe(0);
    expect([...r.distances].every(Number.isNaN)).toBe(true);
  });

  // Property: the distance does not change when the shots are moved, stretched per axis or shuffled.
  it('robustGroundDistances is unchanged by shifting, axis scaling and shuffling', () => {
    const pts = fc.array(fc.tuple(fc.integer({ min: -2000, max: 2000 }), fc.integer({ min: -2000, max: 2000 })), { minLength: 5, maxLength: 40 });
    fc.assert(
      fc.property(pts, fc.integer({ min: 1, max: 30 }), fc.integer({ min: -50, max: 50 }), (ps, k, shift) => {
        const x = ps.map((p) => p[0] / 100);
        const y = ps.map((p) => 150 + p[1] / 100);
        const base = robustGroundDistances(x, y).distances;
        const moved = robustGroundDistances(x.map((v) => (v + shift) * k), y.map((v) => v - shift)).distances;
        const reversed = robustGroundDistances([...x].reverse(), [...y].reverse()).distances;
        base.forEach((d, i) => {
          expect(moved[i]).toBeCloseTo(d, 6);
          expect(reversed[x.length - 1 - i]).toBeCloseTo(d, 9);
        });
      }),
    );
  });
});

describe('robustGroundDistances against the published formulas', () => {
  // Reference library: simple-statistics' median and MAD in the published formulas — scale
  // 1.4826·MAD per axis, Gnanadesikan & Kettenring's r = (s(u)² − s(v)²)/(s(u)² + s(v)²) with u, v
  // the sum and difference of the standardised axes (Biometrics 28, 1972), and the distance
  // d² = (x² − 2r·x·y + y²)/(1 − r²).
  it('robustGroundDistances on random groups agrees with the formulas over simple-statistics', () => {
    const pts = fc.array(fc.tuple(fc.integer({ min: -3000, max: 3000 }), fc.integer({ min: -3000, max: 3000 })), { minLength: 5, maxLength: 30 });
    fc.assert(
      fc.property(pts, fc.integer({ min: -9, max: 9 }), (ps, tilt) => {
        const x = ps.map((p) => p[0] / 100);
        const y = ps.map((p, i) => 150 + p[1] / 100 + (tilt / 10) * x[i]);
        const scale = (v: number[]) => 1.4826 * medianAbsoluteDeviation(v);
        const sx = scale(x);
        const sy = scale(y);
        fc.pre(sx > 0 && sy > 0);
        const zx = x.map((v) => (v - median(x)) / sx);
        const zy = y.map((v) => (v - median(y)) / sy);
        const su = scale(zx.map((v, i) => v + zy[i]));
        const sv = scale(zx.map((v, i) => v - zy[i]));
        fc.pre(su > 0 && sv > 0);
        const r = Math.max(-0.99, Math.min(0.99, (su * su - sv * sv) / (su * su + sv * sv)));
        const got = robustGroundDistances(x, y);
        expect(got.scaleOffline).toBeCloseTo(sx, 9);
        expect(got.scaleCarry).toBeCloseTo(sy, 9);
        expect(got.correlation).toBeCloseTo(r, 9);
        zx.forEach((a, i) => {
          const b = zy[i];
          expect(got.distances[i]).toBeCloseTo(Math.sqrt((a * a - 2 * r * a * b + b * b) / (1 - r * r)), 6);
        });
      }),
    );
  });

  it('robustGroundDistances with a floor below the MAD keeps the scale 1.4826·MAD', () => {
    const r = robustGroundDistances([-4, -2, 0, 2, 4], [140, 145, 150, 155, 160], { madFloorOfflineM: 1, madFloorCarryM: 1 });
    expect(r.scaleOffline).toBeCloseTo(1.4826 * 2, 9);
    expect(r.scaleCarry).toBeCloseTo(1.4826 * 5, 9);
  });

  it('robustGroundDistances with no spread along carry uses offline alone', () => {
    const r = robustGroundDistances([-1, 0, 1, 0, 10], [150, 150, 150, 150, 150]);
    expect(r.scaleCarry).toBe(0);
    // offline: median 0, deviations 1, 0, 1, 0, 10 → MAD 1, scale 1.4826.
    expect(r.distances[4]).toBeCloseTo(10 / 1.4826, 9);
  });

  it('robustGroundDistances of shots all on one spot with floors gives distance 0 and correlation 0', () => {
    const r = robustGroundDistances([1, 1, 1, 1, 1], [150, 150, 150, 150, 150], { madFloorOfflineM: 1, madFloorCarryM: 2 });
    expect(r.correlation).toBe(0);
    expect([...r.distances]).toEqual([0, 0, 0, 0, 0]);
  });

  it('robustGroundDistances of columns of unequal length scores the shorter one’s pairs', () => {
    const r = robustGroundDistances([-1, 0, 1, 0, 10, 99], [150, 151, 149, 150, 150]);
    expect(r.distances).toHaveLength(5);
    expect(r.centerOffline).toBe(0);
  });

  it('robustGroundDistances leaves a shot missing one value out of the centre and the scales', () => {
    const full = robustGroundDistances([-1, 0, 1, 2, -2], [150, 151, 149, 152, 148]);
    const holed = robustGroundDistances([-1, 0, 1, 2, -2, 500], [150, 151, 149, 152, 148, Number.NaN]);
    const holed2 = robustGroundDistances([-1, 0, 1, 2, -2, Number.NaN], [150, 151, 149, 152, 148, 900]);
    for (const h of [holed, holed2]) {
      expect([h.centerOffline, h.centerCarry, h.scaleOffline, h.scaleCarry, h.correlation]).toEqual([full.centerOffline, full.centerCarry, full.scaleOffline, full.scaleCarry, full.correlation]);
      expect(h.distances[5]).toBeNaN();
    }
  });
});
