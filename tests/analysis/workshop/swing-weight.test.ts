import {
  GRAMS_PER_OUNCE,
  parseSwingWeight,
  SWING_WEIGHT_A0_IN_OZ,
  SWING_WEIGHT_POINT_IN_OZ,
  swingWeightLabel,
  swingWeightPoints,
} from '@/analysis/workshop';

/** Balance point (in) of a club of `massG` grams whose moment about the 14-in fulcrum is `momentInOz`. */
const balanceFor = (massG: number, momentInOz: number) => 14 + momentInOz / (massG / GRAMS_PER_OUNCE);

describe('swingWeightPoints', () => {
  it('swingWeightPoints of an ounce is exact (NIST SP 811, 2008, Appendix B: 1 oz = 28.349523125 g)', () => {
    expect(GRAMS_PER_OUNCE).toBe(28.349523125);
  });

  // The scale's definition (R. W. Adams, US Patent 1,953,916, 1934: moment about a fulcrum 14 in
  // from the grip end), with A0 at 155 in·oz and 1.75 in·oz a point (from memory, see swing-weight.ts).
  it.each([
    [300, 155, 0],
    [310, 155 + 30 * 1.75, 30],
    [430, 155 + 32 * 1.75, 32],
    [365, 155 + 45.5 * 1.75, 45.5],
  ])('swingWeightPoints of %p g balancing at a moment of %p in·oz is %p points (closed form of the scale)', (massG, moment, points) => {
    expect(swingWeightPoints(massG, balanceFor(massG, moment))).toBeCloseTo(points, 9);
  });

  it('swingWeightPoints of a 500 g·in heavier club is about 10 points (Tutelman, "Estimating heft": one point is 50 gram-inches)', () => {
    // 20 g added 39 in from the grip end: 20 g × 25 in = 500 g·in more about the fulcrum.
    const massG = 420;
    const balanceIn = 28.25;
    const before = swingWeightPoints(massG, balanceIn);
    const after = swingWeightPoints(massG + 20, (massG * balanceIn + 20 * 39) / (massG + 20));
    expect(after - before).toBeGreaterThan(9.9); // 500 / 49.61 = 10.08 with 1.75 in·oz a point
    expect(after - before).toBeLessThan(10.2);
  });

  it('swingWeightPoints with 2 g at the head of a 7 iron moves about one point (common practice, no source: 2 g a point)', () => {
    // head mass centred about 36.5 in from the grip end: 2 g × 22.5 in = 45 g·in
    const massG = 425;
    const balanceIn = 28;
    const change = swingWeightPoints(massG + 2, (massG * balanceIn + 2 * 36.5) / (massG + 2)) - swingWeightPoints(massG, balanceIn);
    expect(change).toBeGreaterThan(0.75);
    expect(change).toBeLessThan(1.25);
  });

  it('swingWeightPoints with a balance point at the fulcrum is the scale’s floor below A0', () => {
    expect(swingWeightPoints(300, 14)).toBeCloseTo(-SWING_WEIGHT_A0_IN_OZ / SWING_WEIGHT_POINT_IN_OZ, 9);
  });

  it.each([[0, 30], [-5, 30], [Number.NaN, 30], [300, Number.POSITIVE_INFINITY]])('swingWeightPoints(%p, %p) throws', (m, b) => {
    expect(() => swingWeightPoints(m, b)).toThrow(RangeError);
  });
});

describe('swingWeightLabel', () => {
  it.each([
    [0, 'A0'],
    [9, 'A9'],
    [30, 'D0'],
    [32, 'D2'],
    [32.2, 'D2'],
    [28.6, 'C8.5'],
    [69.5, 'G9.5'],
  ])('swingWeightLabel(%p) is %p', (points, label) => {
    expect(swingWeightLabel(points)).toBe(label);
  });

  it.each([[-0.5], [70], [Number.NaN]])('swingWeightLabel(%p) outside A0–G9.5 is null', (points) => {
    expect(swingWeightLabel(points)).toBeNull();
  });
});

describe('parseSwingWeight', () => {
  it.each([
    ['D2', 32],
    ['d2', 32],
    [' D-2 ', 32],
    ['C9.5', 29.5],
    ['A0', 0],
    ['G9', 69],
  ])('parseSwingWeight(%p) is %p points', (text, points) => {
    expect(parseSwingWeight(text)).toBe(points);
  });

  it.each([['X1'], ['D12'], ['D'], [''], [null], ['D2.3'], ['D2 heavy feel']])('parseSwingWeight(%p) of a text that is not a swing weight is null', (text) => {
    expect(parseSwingWeight(text)).toBeNull();
  });
});
