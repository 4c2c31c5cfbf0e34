import { describeOvalSpread, groundOval, ovalOutline, ovalSpread } from '@/analysis/ovals';
import { sampleCovariance2 } from '@/analysis/statistics';

const OFFLINE = [-6, 2, 9, -1, 4, -8, 3, 0];
const CARRY = [142, 150, 158, 147, 151, 139, 154, 149];

describe('ovalSpread', () => {
  // The box around {d : dᵀ S⁻¹ d ≤ k²} has half-widths k·sqrt(Sxx) and k·sqrt(Syy) (support function of an ellipse).
  it('ovalSpread gives k·sd of offline and of carry', () => {
    const spread = ovalSpread(groundOval(OFFLINE, CARRY));
    const c = sampleCovariance2(OFFLINE, CARRY);
    const k = Math.sqrt(-2 * Math.log(0.05));
    expect(spread.offlineHalfWidthM).toBeCloseTo(k * Math.sqrt(c.xx), 9);
    expect(spread.carryHalfWidthM).toBeCloseTo(k * Math.sqrt(c.yy), 9);
    expect(spread.level).toBe(0.95);
  });

  it('ovalSpread is the extent of the outline', () => {
    const oval = groundOval(OFFLINE, CARRY);
    const spread = ovalSpread(oval);
    const outline = ovalOutline(oval, 20000);
    const maxAcross = Math.max(...outline.map((p) => Math.abs(p.offline - oval.centerOffline)));
    const maxAlong = Math.max(...outline.map((p) => Math.abs(p.carry - oval.centerCarry)));
    expect(maxAcross).toBeCloseTo(spread.offlineHalfWidthM, 5);
    expect(maxAlong).toBeCloseTo(spread.carryHalfWidthM, 5);
  });
});

describe('describeOvalSpread', () => {
  it('describeOvalSpread with a metre formatter gives the plain sentence', () => {
    const text = describeOvalSpread({ level: 0.95, offlineHalfWidthM: 11.2, carryHalfWidthM: 7.9 }, (m) => `${Math.round(m)} m`);
    expect(text).toBe('95% of shots within ±11 m left–right and ±8 m in carry');
  });

  // 1 yd = 0.9144 m (NIST SP 811, 2008, Appendix B).
  it('describeOvalSpread with a yard formatter converts through it', () => {
    const text = describeOvalSpread({ level: 0.68, offlineHalfWidthM: 9.144, carryHalfWidthM: 4.572 }, (m) => `${Math.round(m / 0.9144)} yd`);
    expect(text).toBe('68% of shots within ±10 yd left–right and ±5 yd in carry');
  });
});
