import { jStat } from 'jstat';
import { fairwayOdds } from '@/analysis/odds';

describe('fairwayOdds', () => {
  // Normal closed form: P(|Z| ≤ 1.959964) = 0.95 (normal tables); a huge group's predictive t is the normal.
  it('fairwayOdds of a huge centred group with width ±1.959964 sd gives 0.95', () => {
    expect(fairwayOdds({ n: 1e8, meanM: 0, sdM: 10, widthM: 2 * 1.959964 * 10 })).toBeCloseTo(0.95, 6);
  });

  // Student t closed form for the next shot (prediction interval): the corridor ±c around a mean of
  // 10 shots holds 2·T₉(c/(s·√1.1)) − 1, computed independently with jstat's Student t.
  it('fairwayOdds of ten shots follows the Student t with 9 degrees of freedom and scale s·√(1 + 1/10)', () => {
    const p = fairwayOdds({ n: 10, meanM: 0, sdM: 9.144, widthM: 27.432 });
    expect(p).toBeCloseTo(2 * jStat.studentt.cdf(13.716 / (9.144 * Math.sqrt(1.1)), 9) - 1, 10);
    // Fewer shots are less sure: the same mean and sd from 4 shots give lower odds.
    expect(fairwayOdds({ n: 4, meanM: 0, sdM: 9.144, widthM: 27.432 })).toBeLessThan(p);
  });

  it('fairwayOdds of a group missing right is lower than of the same group on line', () => {
    const onLine = fairwayOdds({ n: 12, meanM: 0, sdM: 8, widthM: 27.432 });
    const right = fairwayOdds({ n: 12, meanM: 10, sdM: 8, widthM: 27.432 });
    expect(right).toBeLessThan(onLine);
    // t with 11 df: P(−13.716 − 10 ≤ X ≤ 13.716 − 10), X = 8·√(13/12)·T (jstat).
    const s = 8 * Math.sqrt(13 / 12);
    expect(right).toBeCloseTo(jStat.studentt.cdf(3.716 / s, 11) - jStat.studentt.cdf(-23.716 / s, 11), 10);
  });

  it('fairwayOdds with one shot or a width of 0 throws', () => {
    expect(() => fairwayOdds({ n: 1, meanM: 0, sdM: 1, widthM: 10 })).toThrow(RangeError);
    expect(() => fairwayOdds({ n: 5, meanM: 0, sdM: 1, widthM: 0 })).toThrow(RangeError);
  });
});
