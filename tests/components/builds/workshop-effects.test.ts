import { workshopEffectLines, type EffectInput } from '@/components/builds/workshop-effects';

// Rules of thumb of the trade (common practice, no source): about 2 g at the head per
// swing-weight point; about 3 points and about 1° of lie per ½ in of length.
const saved: EffectInput['saved'] = { addedMassG: null, lengthIn: 45.75, swingWeight: 'D2' };
const typed: EffectInput['typed'] = { addedMassG: null, addedMassWhere: null, lengthIn: 45.75, totalWeightG: null, balancePointIn: null };

describe('workshopEffectLines', () => {
  it('workshopEffectLines of 4 g added at the heel says about 2 swing-weight points and the new swing weight', () => {
    expect(workshopEffectLines({ saved, typed: { ...typed, addedMassG: 4, addedMassWhere: 'heel' } })).toEqual([
      '+4 g at the heel: about +2 swing-weight points',
      'Swing weight D2 → about D4',
    ]);
  });

  it('workshopEffectLines of half an inch shorter says about −3 points and 1° flatter', () => {
    expect(workshopEffectLines({ saved, typed: { ...typed, lengthIn: 45.25 } })).toEqual([
      '−0.5 in of length: about −3 swing-weight points; about 1° flatter keeps the sole level',
      'Swing weight D2 → about C9',
    ]);
  });

  it('workshopEffectLines measures the mass from the saved mass, not from nothing', () => {
    expect(workshopEffectLines({ saved: { ...saved, addedMassG: 6 }, typed: { ...typed, addedMassG: 4 } })[0]).toBe('−2 g: about −1 swing-weight point');
  });

  it('workshopEffectLines with a total weight and balance point gives the 14-inch scale reading', () => {
    // 310 g = 10.935 oz; balancing at 33.3 in: 10.935 × 19.3 = 211.05 in·oz → (211.05 − 155)/1.75 = 32.0 → D2 (scale constants from memory)
    expect(workshopEffectLines({ saved, typed: { ...typed, totalWeightG: 310, balancePointIn: 33.3 } })).toEqual(['310 g balancing 33.3 in from the grip end: D2 on the 14-inch scale']);
  });

  it('workshopEffectLines of no change is empty', () => {
    expect(workshopEffectLines({ saved, typed })).toEqual([]);
  });
});
