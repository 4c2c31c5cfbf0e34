import { colors } from '@/components/theme';
import { BUILD_COLORS, buildColor, chartColors } from '@/components/charts/chart-colors';

// Okabe & Ito, "Color Universal Design (CUD): how to make figures and presentations that are
// friendly to colorblind people" (2008): blue (0, 114, 178), vermillion (213, 94, 0), bluish
// green (0, 158, 115), reddish purple (204, 121, 167), orange (230, 159, 0), sky blue (86, 180, 233).
// RGB values as widely reproduced from that page (from memory).
const OKABE_ITO_RGB = [
  [0, 114, 178],
  [213, 94, 0],
  [0, 158, 115],
  [204, 121, 167],
  [230, 159, 0],
  [86, 180, 233],
];

const rgb = (hex: string) => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));

// WCAG 2.1 (W3C Recommendation, 2018), definitions of "relative luminance" and "contrast ratio".
function luminance(hex: string): number {
  const [r, g, b] = rgb(hex).map((v) => {
    const c = v / 255;
    return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
const contrast = (a: string, b: string) => {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
};

describe('BUILD_COLORS', () => {
  it('BUILD_COLORS are the Okabe–Ito palette in order', () => {
    expect(BUILD_COLORS.map(rgb)).toEqual(OKABE_ITO_RGB);
  });

  it('BUILD_COLORS for builds A, B and C keep 3:1 contrast on paper and surface (WCAG 2.1 SC 1.4.11)', () => {
    for (const c of BUILD_COLORS.slice(0, 3)) {
      expect(contrast(c, colors.paper)).toBeGreaterThanOrEqual(3);
      expect(contrast(c, colors.surface)).toBeGreaterThanOrEqual(3);
    }
  });

  it('buildColor cycles through the palette', () => {
    expect(buildColor(0)).toBe(BUILD_COLORS[0]);
    expect(buildColor(BUILD_COLORS.length + 1)).toBe(BUILD_COLORS[1]);
  });
});

describe('chartColors', () => {
  it('chartColors text colours keep 4.5:1 contrast on the chart background (WCAG 2.1 SC 1.4.3)', () => {
    for (const c of [chartColors.axisText, chartColors.text, chartColors.caution, chartColors.clear, chartColors.unclear]) {
      expect(contrast(c, chartColors.background)).toBeGreaterThanOrEqual(4.5);
    }
  });

  it('WCAG contrast of black on white is 21:1', () => {
    expect(contrast('#000000', '#FFFFFF')).toBeCloseTo(21, 9); // WCAG 2.1, "contrast ratio" note
  });
});
