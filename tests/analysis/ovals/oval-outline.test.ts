import { groundOval, ovalOutline } from '@/analysis/ovals';
import { sampleCovariance2 } from '@/analysis/statistics';

const OFFLINE = [-6, 2, 9, -1, 4, -8, 3, 0];
const CARRY = [142, 150, 158, 147, 151, 139, 154, 149];

describe('ovalOutline', () => {
  // Every outline point lies on {d : dᵀ S⁻¹ d = k²}, S the sample covariance and k² = χ²₂(0.95).
  it('ovalOutline points all lie at the oval’s Mahalanobis distance', () => {
    const oval = groundOval(OFFLINE, CARRY);
    const c = sampleCovariance2(OFFLINE, CARRY);
    const det = c.xx * c.yy - c.xy * c.xy;
    for (const p of ovalOutline(oval, 37)) {
      const dx = p.offline - c.meanX;
      const dy = p.carry - c.meanY;
      const m2 = (c.yy * dx * dx - 2 * c.xy * dx * dy + c.xx * dy * dy) / det;
      expect(m2).toBeCloseTo(-2 * Math.log(0.05), 9);
    }
  });

  it('ovalOutline starts at the far end of the long axis', () => {
    const oval = groundOval(OFFLINE, CARRY);
    const [first] = ovalOutline(oval, 8);
    const t = (oval.angleDeg * Math.PI) / 180;
    expect(first.offline).toBeCloseTo(oval.centerOffline + oval.semiMajor * Math.sin(t), 12);
    expect(first.carry).toBeCloseTo(oval.centerCarry + oval.semiMajor * Math.cos(t), 12);
  });

  it('ovalOutline gives as many points as segments', () => {
    expect(ovalOutline(groundOval(OFFLINE, CARRY))).toHaveLength(64);
  });

  it('ovalOutline with fewer than 3 segments throws', () => {
    expect(() => ovalOutline(groundOval(OFFLINE, CARRY), 2)).toThrow(RangeError);
  });
});

describe('ovalOutline at its boundary', () => {
  const circle = { level: 0.95, centerOffline: 0, centerCarry: 100, semiMajor: 2, semiMinor: 2, angleDeg: 0, area: 4 * Math.PI };
  // Three points at 0°, 120° and 240° of the parameter: the far end of the long axis first
  // (carry 102), then cos 120° = −½ along the axis and sin 120° = √3/2 across.
  it('ovalOutline with 3 segments gives the three points of the parametric form', () => {
    const pts = ovalOutline(circle, 3);
    expect(pts).toHaveLength(3);
    expect(pts[0].carry).toBeCloseTo(102, 12);
    expect(pts[1].carry).toBeCloseTo(99, 12);
    expect(pts[1].offline).toBeCloseTo(Math.sqrt(3), 12);
  });
  it('ovalOutline with 2 or 3.5 segments throws that it needs 3 whole segments', () => {
    expect(() => ovalOutline(circle, 2)).toThrow('ovalOutline needs at least 3 whole segments');
    expect(() => ovalOutline(circle, 3.5)).toThrow('ovalOutline needs at least 3 whole segments');
  });
});
