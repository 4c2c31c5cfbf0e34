import fc from 'fast-check';
import { descriptiveScale2, groundOval, ovalFromCovariance, ovalFromMoments, predictionScale2 } from '@/analysis/ovals';
import type { Oval } from '@/analysis/ovals';

// NIST/SEMATECH e-Handbook §6.5.4.1: first two variables as (offline, carry).
const X1 = [4.0, 4.2, 3.9, 4.3, 4.1];
const X2 = [2.0, 2.1, 2.0, 2.1, 2.2];

/** Angle difference folded to (−90, 90]: an oval's axis has no direction. */
function axisDiff(a: number, b: number): number {
  let d = (((a - b) % 180) + 180) % 180;
  if (d > 90) d -= 180;
  return d;
}

const point = fc.tuple(fc.integer({ min: -4000, max: 4000 }), fc.integer({ min: 0, max: 4000 })).map(([x, y]) => [x / 100, 100 + y / 100]);
const cloud = fc.array(point, { minLength: 4, maxLength: 40 });

describe('groundOval', () => {
  // Computed by hand from the NIST/SEMATECH e-Handbook §6.5.4.1 covariance (2x2 eigen closed form): eigenvalues 0.0277154 and 0.0042846,
  // major axis 19.903° from the first axis, 95% χ² semi-axes 0.40750 and 0.16022.
  it('groundOval on the NIST e-Handbook example gives its 95% semi-axes and angle', () => {
    const oval = groundOval(X1, X2);
    expect(oval.centerOffline).toBeCloseTo(4.1, 12);
    expect(oval.centerCarry).toBeCloseTo(2.08, 12);
    expect(oval.semiMajor).toBeCloseTo(0.4075, 4);
    expect(oval.semiMinor).toBeCloseTo(0.16022, 5);
    // 19.903° from the offline axis toward carry is 70.097° from the carry axis toward the right.
    expect(oval.angleDeg).toBeCloseTo(90 - 19.903, 3);
    expect(oval.area).toBeCloseTo(Math.PI * 0.4075 * 0.16022, 4);
    expect(oval.level).toBe(0.95);
  });

  it('groundOval of the prediction kind is wider by sqrt(k²_pred / k²_desc)', () => {
    const d = groundOval(X1, X2);
    const p = groundOval(X1, X2, { kind: 'prediction' });
    const ratio = Math.sqrt(predictionScale2(5, 0.95) / descriptiveScale2(0.95));
    expect(p.semiMajor / d.semiMajor).toBeCloseTo(ratio, 12);
    expect(p.angleDeg).toBeCloseTo(d.angleDeg, 12);
  });

  it('groundOval along the target line gives angle 0, across it 90', () => {
    expect(groundOval([0, 0.1, 0, -0.1], [140, 150, 160, 150]).angleDeg).toBeCloseTo(0, 9);
    expect(groundOval([-10, 0, 10, 0], [150, 150.1, 150, 149.9]).angleDeg).toBe(90);
  });

  it('groundOval drifting long-right gives a positive angle, long-left a negative one', () => {
    expect(groundOval([-5, 0, 5, 1], [145, 150, 155, 149]).angleDeg).toBeGreaterThan(0);
    expect(groundOval([5, 0, -5, 1], [145, 150, 155, 149]).angleDeg).toBeLessThan(0);
  });

  it('groundOval with fewer than 3 shots throws', () => {
    expect(() => groundOval([1, 2], [150, 151])).toThrow(RangeError);
  });

  // Property: rotating every shot about the origin rotates the oval and keeps its axes.
  it('groundOval of rotated shots is the rotated oval', () => {
    fc.assert(
      fc.property(cloud, fc.integer({ min: -170, max: 170 }), (pts, deg) => {
        const t = (deg * Math.PI) / 180;
        const o = groundOval(pts.map((p) => p[0]), pts.map((p) => p[1]));
        // Rotation by +t from the carry axis toward the right: (x, y) → (x cos t + y sin t, −x sin t + y cos t).
        const rx = pts.map((p) => p[0] * Math.cos(t) + p[1] * Math.sin(t));
        const ry = pts.map((p) => -p[0] * Math.sin(t) + p[1] * Math.cos(t));
        const r = groundOval(rx, ry);
        const tol = 1e-6 * (1 + o.semiMajor);
        expect(Math.abs(r.semiMajor - o.semiMajor)).toBeLessThan(tol);
        expect(Math.abs(r.semiMinor - o.semiMinor)).toBeLessThan(tol);
        expect(Math.abs(r.centerOffline - (o.centerOffline * Math.cos(t) + o.centerCarry * Math.sin(t)))).toBeLessThan(1e-7);
        if (o.semiMajor - o.semiMinor > 1e-3 * o.semiMajor) {
          expect(Math.abs(axisDiff(r.angleDeg, o.angleDeg + deg))).toBeLessThan(1e-3);
        }
      }),
    );
  });

  // Property: scaling every shot by s scales the axes by |s| and the area by s².
  it('groundOval of scaled shots is the scaled oval', () => {
    fc.assert(
      fc.property(cloud, fc.integer({ min: 1, max: 50 }).map((i) => i / 10), (pts, s) => {
        const o = groundOval(pts.map((p) => p[0]), pts.map((p) => p[1]));
        const r = groundOval(pts.map((p) => s * p[0]), pts.map((p) => s * p[1]));
        expect(r.semiMajor).toBeCloseTo(s * o.semiMajor, 8);
        expect(r.semiMinor).toBeCloseTo(s * o.semiMinor, 8);
        expect(r.area).toBeCloseTo(s * s * o.area, 6);
      }),
    );
  });

  // Property: the order of the shots changes nothing.
  it('groundOval of shuffled shots is the same oval', () => {
    fc.assert(
      fc.property(cloud.chain((pts) => fc.tuple(fc.constant(pts), fc.shuffledSubarray(pts, { minLength: pts.length }))), ([pts, shuffled]) => {
        const a = groundOval(pts.map((p) => p[0]), pts.map((p) => p[1]));
        const b = groundOval(shuffled.map((p) => p[0]), shuffled.map((p) => p[1]));
        (Object.keys(a) as (keyof Oval)[]).forEach((key) => {
          if (key === 'angleDeg') expect(Math.abs(axisDiff(a.angleDeg, b.angleDeg))).toBeLessThan(a.semiMajor - a.semiMinor > 1e-6 ? 1e-6 : 180);
          else expect(b[key]).toBeCloseTo(a[key], 8);
        });
      }),
    );
  });
});

describe('ovalFromCovariance', () => {
  it('ovalFromCovariance with a negative scale throws', () => {
    expect(() => ovalFromCovariance({ n: 3, meanX: 0, meanY: 0, xx: 1, xy: 0, yy: 1 }, -1, 0.95)).toThrow(RangeError);
  });
  it('ovalFromMoments with fewer than 3 shots throws', () => {
    expect(() => ovalFromMoments({ n: 2, meanX: 0, meanY: 0, xx: 1, xy: 0, yy: 1 }, 0.95, 'descriptive')).toThrow(RangeError);
  });
});

describe('ovals at their boundaries', () => {
  // χ²₂(0.95) = −2·ln 0.05 (Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, §26.4).
  const CHI2_95 = -2 * Math.log(0.05);

  // Three shots, the fewest allowed: offline −1, 0, 1 and carry 150, 152, 150 have sample
  // variances 1 (offline) and 4/3 (carry) and covariance 0 (by hand), so the 95% oval's semi-axes
  // are √(χ²·4/3) along carry and √χ² across, its long axis on the carry line (angle 0).
  it('groundOval of three shots gives the hand-computed semi-axes along the carry line', () => {
    const oval = groundOval([-1, 0, 1], [150, 152, 150]);
    expect(oval.centerCarry).toBeCloseTo(452 / 3, 12);
    expect(oval.semiMajor).toBeCloseTo(Math.sqrt((CHI2_95 * 4) / 3), 9);
    expect(oval.semiMinor).toBeCloseTo(Math.sqrt(CHI2_95), 9);
    expect(oval.angleDeg).toBeCloseTo(0, 12);
  });

  it('groundOval of two shots throws that it needs at least three', () => {
    expect(() => groundOval([-1, 1], [150, 152])).toThrow('groundOval needs at least 3 shots with offline and carry');
    expect(() => groundOval([-1, 0, 1], [150, 152, 150], { n: 2 })).toThrow(RangeError);
  });

  it('groundOval of columns of unequal length uses the shorter one’s pairs', () => {
    const oval = groundOval([-1, 0, 1, 40], [150, 152, 150]);
    expect(oval.centerOffline).toBe(0);
    expect(oval.semiMinor).toBeCloseTo(Math.sqrt(CHI2_95), 9);
  });

  it('ovalFromMoments of three shots works; of two throws that it needs three', () => {
    const three = ovalFromMoments({ n: 3, meanX: 0, meanY: 150, xx: 1, xy: 0, yy: 4 }, 0.95, 'descriptive');
    expect(three.semiMajor).toBeCloseTo(2 * Math.sqrt(CHI2_95), 9);
    expect(() => ovalFromMoments({ n: 2, meanX: 0, meanY: 150, xx: 1, xy: 0, yy: 4 }, 0.95, 'descriptive')).toThrow('an oval needs at least 3 shots');
  });

  it('ovalFromCovariance with scale 0 gives a point; a negative scale throws', () => {
    const point = ovalFromCovariance({ n: 5, meanX: 1, meanY: 150, xx: 9, xy: 0, yy: 4 }, 0, 0.95);
    expect([point.semiMajor, point.semiMinor, point.area]).toEqual([0, 0, 0]);
    expect(() => ovalFromCovariance({ n: 5, meanX: 1, meanY: 150, xx: 9, xy: 0, yy: 4 }, -1, 0.95)).toThrow('ovalFromCovariance: scale must be finite and ≥ 0');
  });

  // A circle has no long axis: its angle is 0 by convention (the eigenvector of equal
  // eigenvalues is arbitrary), never 90.
  it('ovalFromCovariance of equal variances and no covariance gives a circle at angle 0', () => {
    const circle = ovalFromCovariance({ n: 5, meanX: 0, meanY: 150, xx: 4, xy: 0, yy: 4 }, CHI2_95, 0.95);
    expect(circle.semiMajor).toBe(circle.semiMinor);
    expect(circle.angleDeg).toBe(0);
  });
});
