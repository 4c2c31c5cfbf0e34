import { chanceWords, oddsInPlainWords } from '@/analysis/plain-words';

describe('chanceWords', () => {
  it('chanceWords, chances worked by hand, rounds to tenths', () => {
    expect(chanceWords(0.68)).toBe('about 7 in 10');
    expect(chanceWords(0.349)).toBe('about 3 in 10');
    expect(chanceWords(0.35)).toBe('about 4 in 10');
    expect(chanceWords(0.04)).toBe('fewer than 1 in 10');
    expect(chanceWords(0.97)).toBe('nearly all');
  });

  it('chanceWords, a chance outside 0…1 or NaN, throws RangeError', () => {
    expect(() => chanceWords(1.2)).toThrow(RangeError);
    expect(() => chanceWords(Number.NaN)).toThrow(RangeError);
  });
});

describe('oddsInPlainWords', () => {
  // 33 yd = 30.1752 m and 12 yd = 10.9728 m (1 yd = 0.9144 m exactly, International Yard and Pound Agreement, 1959).
  it('oddsInPlainWords, a 33 yd fairway at 0.68 and a 12 yd green at 0.41, reads them in yards', () => {
    expect(oddsInPlainWords({ fairwayWidthM: 30.1752, fairway: 0.68, greenRadiusM: 10.9728, green: 0.41 }, 'imperial')).toBe(
      'About 7 in 10 of your next shots finish in a 33 yd fairway; about 4 in 10 within 12 yd of the green’s middle.',
    );
  });

  it('oddsInPlainWords, the same targets in metric units, reads 30 m and 11 m', () => {
    expect(oddsInPlainWords({ fairwayWidthM: 30.1752, fairway: 0.68, greenRadiusM: 10.9728, green: 0.41 }, 'metric')).toBe(
      'About 7 in 10 of your next shots finish in a 30 m fairway; about 4 in 10 within 11 m of the green’s middle.',
    );
  });
});
