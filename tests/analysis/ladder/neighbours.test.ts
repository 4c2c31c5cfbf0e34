import { areNeighbours } from '@/analysis/ladder';

// Common practice, no source: adjacent clubs of a set differ by about 3–5° of loft.
describe('areNeighbours', () => {
  it.each([
    ['7I', '8I', true],
    ['7I', '9I', false],
    ['9I', 'PW', true],
    ['DR', '3W', true],
    ['3W', '5W', true],
    ['DR', '7I', false],
    ['PW', 'GW', true],
    ['W50', 'W58', false],
    ['4H', '5H', true],
    ['Mystery', '7I', false],
  ])('areNeighbours(%s, %s) without a bag is %s', (a, b, expected) => {
    expect(areNeighbours(a, b)).toBe(expected);
  });

  it('areNeighbours with a bag is true when no bag club lies between', () => {
    const bag = ['DR', '3W', '5H', '7I', '8I', '9I', 'PW', 'W54'];
    expect(areNeighbours('5H', '7I', bag)).toBe(true);
    expect(areNeighbours('3W', '7I', bag)).toBe(false);
    expect(areNeighbours('PW', 'W54', bag)).toBe(true);
  });
});
