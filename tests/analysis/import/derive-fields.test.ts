import fc from 'fast-check';
import { deriveFields } from '@/analysis/import';

// Formulas from the product page ("Canonical data"); check values are exact identities:
// the 3-4-5 right triangle (hypot), atan2(1, 1) = 45° and atan2(−1, 1) = −45°.
describe('deriveFields', () => {
  it('deriveFields of back spin 3000 and side spin 4000 gives spin rate 5000 (3-4-5 triangle)', () => {
    const { values, derived } = deriveFields({ backSpin: 3000, sideSpin: 4000 });
    expect(values.spinRate).toBeCloseTo(5000, 9);
    expect(derived).toEqual(['spinRate', 'spinAxis']);
  });

  it('deriveFields of equal back and side spin gives a spin axis of 45°; negative side spin tilts left', () => {
    expect(deriveFields({ backSpin: 3000, sideSpin: 3000 }).values.spinAxis).toBeCloseTo(45, 12);
    expect(deriveFields({ backSpin: 3000, sideSpin: -3000 }).values.spinAxis).toBeCloseTo(-45, 12);
    expect(deriveFields({ backSpin: 3000, sideSpin: 0 }).values.spinAxis).toBe(0);
  });

  it('deriveFields of ball and club speed gives the smash factor', () => {
    const { values, derived } = deriveFields({ ballSpeed: 50, clubSpeed: 37.5 });
    expect(values.smashFactor).toBeCloseTo(4 / 3, 12);
    expect(derived).toEqual(['smashFactor']);
  });

  it('deriveFields of face angle and club path gives face to path = face − path', () => {
    expect(deriveFields({ faceAngle: 1.5, clubPath: -2.5 }).values.faceToPath).toBeCloseTo(4, 12);
  });

  it('deriveFields of dynamic loft and attack angle gives spin loft = loft − attack', () => {
    expect(deriveFields({ dynamicLoft: 20, attackAngle: -4 }).values.spinLoft).toBeCloseTo(24, 12);
  });

  it('deriveFields never replaces a value the shot has', () => {
    const given = { ballSpeed: 50, clubSpeed: 37.5, smashFactor: 1.3, backSpin: 3000, sideSpin: 4000, spinRate: 5100, spinAxis: 50 };
    const { values, derived } = deriveFields(given);
    expect(values).toEqual(given);
    expect(derived).toEqual([]);
  });

  it('deriveFields with a club speed of zero derives no smash factor', () => {
    expect(deriveFields({ ballSpeed: 5, clubSpeed: 0 }).derived).toEqual([]);
  });

  it('deriveFields does not change its input', () => {
    const input = { backSpin: 3000, sideSpin: 500 };
    deriveFields(input);
    expect(input).toEqual({ backSpin: 3000, sideSpin: 500 });
  });

  it('deriveFields spin rate and axis give back the back and side spin (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 12000 }), fc.integer({ min: -4000, max: 4000 }), (back, side) => {
        const { values } = deriveFields({ backSpin: back, sideSpin: side });
        const axisRad = (values.spinAxis! * Math.PI) / 180;
        expect(values.spinRate! * Math.cos(axisRad)).toBeCloseTo(back, 6);
        expect(values.spinRate! * Math.sin(axisRad)).toBeCloseTo(side, 6);
      }),
    );
  });
});
