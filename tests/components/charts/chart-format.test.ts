import { countWords, formatNumber, formatSigned, formatThousands } from '@/components/charts/chart-format';

describe('formatNumber and friends', () => {
  it('formatNumber writes a true minus and never −0', () => {
    expect(formatNumber(-2.46, 1)).toBe('\u22122.5');
    expect(formatNumber(-0.04, 1)).toBe('0.0');
  });

  it('formatSigned writes + for positive values only', () => {
    expect([formatSigned(2.46, 1), formatSigned(-3), formatSigned(0)]).toEqual(['+2.5', '\u22123', '0']);
  });

  it('formatThousands groups digits by three', () => {
    expect([formatThousands(950), formatThousands(2450.4), formatThousands(10000)]).toEqual(['950', '2,450', '10,000']);
  });

  it('countWords writes small counts in words', () => {
    expect([countWords(1, 'build'), countWords(2, 'build'), countWords(12, 'build')]).toEqual(['one build', 'two builds', '12 builds']);
  });
});
