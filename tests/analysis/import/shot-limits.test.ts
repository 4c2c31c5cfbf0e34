import fc from 'fast-check';
import { SHOT_FIELDS, type ShotValues } from '@/analysis/fields';
import { SHOT_LIMITS, checkLimit, checkShotValues, shotValuesSchema } from '@/analysis/import';

describe('shot limits', () => {
  // Limits named in the product's import issue (ball speed ≤ 110 m/s, smash ≤ ~1.60,
  // spin ≤ 15,000 rpm, club speed ≤ ~70 m/s, launch −20..70°, carry ≥ 0).
  it('SHOT_LIMITS holds the limits the import issue names', () => {
    expect(SHOT_LIMITS.ballSpeed.max).toBe(110);
    expect(SHOT_LIMITS.smashFactor.max).toBe(1.6);
    expect(SHOT_LIMITS.spinRate.max).toBe(15000);
    expect(SHOT_LIMITS.clubSpeed.max).toBe(70);
    expect(SHOT_LIMITS.launchAngle).toEqual({ min: -20, max: 70 });
    expect(SHOT_LIMITS.carry.min).toBe(0);
  });

  it('checkLimit of a value inside its limits gives null; outside gives the reason', () => {
    expect(checkLimit('ballSpeed', 70)).toBeNull();
    expect(checkLimit('ballSpeed', 112)).toBe('ball speed 112 m/s is above the limit of 110 m/s');
    expect(checkLimit('carry', -1)).toBe('carry -1 m is below the limit of 0 m');
    expect(checkLimit('launchAngle', Number.NaN)).toBe('launch angle is not a number');
  });

  it('checkShotValues and shotValuesSchema give the same verdict on any values (property)', () => {
    const value = fc.oneof(fc.double({ min: -20000, max: 20000, noNaN: true }), fc.constant(0), fc.constant(110), fc.constant(110.0001));
    const values = fc.record(Object.fromEntries(SHOT_FIELDS.map((f) => [f, value])) as Record<string, fc.Arbitrary<number>>, { requiredKeys: [] });
    fc.assert(
      fc.property(values, (v) => {
        expect(checkShotValues(v as ShotValues) === null).toBe(shotValuesSchema.safeParse(v).success);
      }),
      { numRuns: 500 },
    );
  });
});
