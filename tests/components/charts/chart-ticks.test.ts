import { isMultipleOf, stepForSpacing, ticksEvery } from '@/components/charts/chart-ticks';

describe('ticksEvery', () => {
  it('ticksEvery gives the multiples of the step inside the range', () => {
    expect(ticksEvery(143, 171, 10)).toEqual([150, 160, 170]);
    expect(ticksEvery(-25, 25, 10)).toEqual([-20, -10, 0, 10, 20]);
    expect(ticksEvery(140, 160, 10)).toEqual([140, 150, 160]);
  });

  it('ticksEvery with a zero step throws', () => {
    expect(() => ticksEvery(0, 10, 0)).toThrow(RangeError);
  });
});

describe('stepForSpacing', () => {
  it('stepForSpacing picks 10 when 10 units are far enough apart, coarser otherwise', () => {
    expect(stepForSpacing(2, 18)).toBe(10);
    expect(stepForSpacing(1, 18)).toBe(20);
    expect(stepForSpacing(0.2, 18)).toBe(100);
  });

  it('isMultipleOf tells multiples of a step', () => {
    expect(isMultipleOf(150, 50)).toBe(true);
    expect(isMultipleOf(160, 50)).toBe(false);
  });
});
