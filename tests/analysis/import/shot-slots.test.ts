import fc from 'fast-check';
import { SHOT_FIELDS } from '@/analysis/fields';
import { SLOT, slotsFromValues, valuesFromSlots } from '@/analysis/import/shot-slots';

describe('shot slots', () => {
  it('SLOT gives each field its index in SHOT_FIELDS', () => {
    SHOT_FIELDS.forEach((f, i) => expect(SLOT[f]).toBe(i));
  });

  it('valuesFromSlots after slotsFromValues gives back any values (property)', () => {
    const values = fc.record(Object.fromEntries(SHOT_FIELDS.map((f) => [f, fc.double({ noNaN: true })])) as Record<string, fc.Arbitrary<number>>, { requiredKeys: [] });
    fc.assert(
      fc.property(values, (v) => {
        const back = valuesFromSlots(slotsFromValues(v));
        expect(back).toEqual(v);
        expect(Object.keys(back).sort()).toEqual(Object.keys(v).sort());
      }),
    );
  });

  it('valuesFromSlots gives a plain object', () => {
    const v = valuesFromSlots(slotsFromValues({ carry: 150 }));
    expect(Object.getPrototypeOf(v)).toBe(Object.prototype);
    expect(JSON.stringify(v)).toBe('{"carry":150}');
  });
});
