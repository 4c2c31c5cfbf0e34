import { moreShotsNeeded, shotsToSettle } from '@/analysis/head-to-head';

describe('moreShotsNeeded', () => {
  // Normal approximation with z0.975 = 1.959964, z0.8 = 0.841621 (normal tables):
  // 2·(2.801585)²·25/4 = 98.11 → 99 per build; 10 already hit → 89.
  it('moreShotsNeeded with sd 5 and difference 2 gives 89 more after 10', () => {
    expect(moreShotsNeeded({ nA: 10, nB: 10, sdA: 5, sdB: 5, diff: 2 })).toBe(89);
  });

  // Lehr, "Sixteen s-squared over d-squared", Statistics in Medicine 11 (1992): n ≈ 16·s²/d² per group
  // at α 0.05 two-sided and power 0.8.
  it('moreShotsNeeded agrees with Lehr’s 16·s²/d² rule within 2%', () => {
    for (const [sd, diff] of [[4, 1], [10, 3], [2.5, 0.4]]) {
      const total = moreShotsNeeded({ nA: 2, nB: 2, sdA: sd, sdB: sd, diff })! + 2;
      const lehr = (16 * sd * sd) / (diff * diff);
      expect(Math.abs(total - lehr) / lehr).toBeLessThan(0.02);
    }
  });

  it('moreShotsNeeded uses the pooled variance and the smaller group', () => {
    // Pooled s² = (9·16 + 19·36)/28 = 29.571; 15.6978·29.571/4 = 116.05 → 117; minus 10 → 107.
    expect(moreShotsNeeded({ nA: 10, nB: 20, sdA: 4, sdB: 6, diff: -2 })).toBe(107);
  });

  it('moreShotsNeeded when enough shots are in gives 0', () => {
    expect(moreShotsNeeded({ nA: 500, nB: 500, sdA: 5, sdB: 5, diff: 2 })).toBe(0);
  });

  it('moreShotsNeeded with equal means gives null', () => {
    expect(moreShotsNeeded({ nA: 5, nB: 5, sdA: 1, sdB: 1, diff: 0 })).toBeNull();
  });

  it('moreShotsNeeded with one shot in a group throws', () => {
    expect(() => moreShotsNeeded({ nA: 1, nB: 5, sdA: 1, sdB: 1, diff: 1 })).toThrow(RangeError);
    expect(() => moreShotsNeeded({ nA: 5, nB: 1, sdA: 1, sdB: 1, diff: 1 })).toThrow('moreShotsNeeded needs at least two shots in each group');
  });
});

describe('shotsToSettle', () => {
  // (z0.975 + z0.8)² = 2.801585² = 7.84888 (normal tables). sd 8 and 8, diff 1, margin 2.7432:
  // room = max(1, 1.7432) = 1.7432; 7.84888·128/1.7432² = 330.6 → 331 per build, 321 more after 10.
  it('shotsToSettle with a small difference aims at the margin', () => {
    expect(shotsToSettle({ nA: 10, nB: 10, sdA: 8, sdB: 8, diff: 1, margin: 2.7432 })).toBe(321);
  });
  // diff 6 > margin: room 6; 7.84888·50/36 = 10.9 → 11 per build, 3 more after 8.
  it('shotsToSettle with a large difference aims at clearing zero', () => {
    expect(shotsToSettle({ nA: 8, nB: 9, sdA: 5, sdB: 5, diff: -6, margin: 2.7432 })).toBe(3);
  });
  it('shotsToSettle never answers less than one shot', () => {
    expect(shotsToSettle({ nA: 500, nB: 500, sdA: 1, sdB: 1, diff: 0.1, margin: 3 })).toBe(1);
  });
  it('shotsToSettle with a margin of 0 throws', () => {
    expect(() => shotsToSettle({ nA: 5, nB: 5, sdA: 1, sdB: 1, diff: 0.1, margin: 0 })).toThrow('shotsToSettle needs a positive margin');
  });
  // Two shots each is enough to ask: 7.84888·2/1² = 15.7 → 16 per build, 14 more after 2.
  it('shotsToSettle with two shots in each group answers, with one in either it throws', () => {
    expect(shotsToSettle({ nA: 2, nB: 2, sdA: 1, sdB: 1, diff: 1, margin: 0.5 })).toBe(14);
    expect(() => shotsToSettle({ nA: 1, nB: 5, sdA: 1, sdB: 1, diff: 0.1, margin: 1 })).toThrow('shotsToSettle needs at least two shots in each group');
    expect(() => shotsToSettle({ nA: 5, nB: 1, sdA: 1, sdB: 1, diff: 0.1, margin: 1 })).toThrow('shotsToSettle needs at least two shots in each group');
  });
});
