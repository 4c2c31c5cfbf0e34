import { buildChangeEffect, lieChangeForLengthChangeDeg, swingWeightChangeForHeadMass, swingWeightChangeForLength } from '@/analysis/workshop';

// Rules of thumb of the trade (common practice, no source): about 1° of lie per ½ in of length;
// about 2 g of head mass per swing-weight point; about 3 swing-weight points per ½ in of length.
describe('lieChangeForLengthChangeDeg', () => {
  it.each([
    [0.5, 1],
    [1, 2],
    [-0.75, -1.5],
    [0, 0],
  ])('lieChangeForLengthChangeDeg(%p in) is %p° (1° per ½ in, common practice)', (inches, deg) => {
    expect(lieChangeForLengthChangeDeg(inches)).toBe(deg);
  });

  it('lieChangeForLengthChangeDeg of a number that is not finite throws', () => {
    expect(() => lieChangeForLengthChangeDeg(Number.NaN)).toThrow(RangeError);
  });
});

describe('swingWeightChangeForHeadMass', () => {
  it.each([
    [4, 2],
    [6, 3],
    [-2, -1],
  ])('swingWeightChangeForHeadMass(%p g) is %p points (2 g a point, common practice)', (g, points) => {
    expect(swingWeightChangeForHeadMass(g)).toBe(points);
  });

  it('swingWeightChangeForHeadMass of infinity throws', () => {
    expect(() => swingWeightChangeForHeadMass(Number.POSITIVE_INFINITY)).toThrow(RangeError);
  });
});

describe('swingWeightChangeForLength', () => {
  it.each([
    [0.5, 3],
    [-0.5, -3],
    [0.25, 1.5],
  ])('swingWeightChangeForLength(%p in) is %p points (3 points per ½ in, common practice)', (inches, points) => {
    expect(swingWeightChangeForLength(inches)).toBe(points);
  });
});

describe('buildChangeEffect', () => {
  it('buildChangeEffect of +4 g and +½ in adds the two rules and gives the lie that goes with the length', () => {
    expect(buildChangeEffect({ addedMassG: 4, lengthChangeIn: 0.5 })).toEqual({ massPoints: 2, lengthPoints: 3, lieDeg: 1, totalPoints: 5 });
  });

  it('buildChangeEffect of a mass change alone has no length or lie part', () => {
    expect(buildChangeEffect({ addedMassG: 6 })).toEqual({ massPoints: 3, lengthPoints: null, lieDeg: null, totalPoints: 3 });
  });

  it('buildChangeEffect of no change is all null', () => {
    expect(buildChangeEffect({ addedMassG: 0, lengthChangeIn: null })).toEqual({ massPoints: null, lengthPoints: null, lieDeg: null, totalPoints: null });
  });
});
