import { calibratedReference, clubSpeedForLength, clubSpeedFromBallSpeed, estimateCarry, impactLaunch, TYPICAL_HEADS, typicalLengthIn } from '@/analysis/bag';

const YD = 0.9144; // NIST SP 811 (2008), Appendix B
const reference = { clubSpeedMps: 45, lengthIn: 45.5 };

describe('clubSpeedForLength', () => {
  it('clubSpeedForLength scales the speed with the length (same turning rate, closed form v = ω·L)', () => {
    expect(clubSpeedForLength(reference, 37)).toBeCloseTo((45 * 37) / 45.5, 12);
    expect(clubSpeedForLength(reference, 45.5)).toBe(45);
  });

  it('clubSpeedForLength of a length that is not positive throws', () => {
    expect(() => clubSpeedForLength(reference, 0)).toThrow(RangeError);
  });
});

describe('clubSpeedFromBallSpeed', () => {
  it('clubSpeedFromBallSpeed undoes the impact estimate’s ball speed', () => {
    const ball = impactLaunch(38, 22, TYPICAL_HEADS.hybrid).ballSpeedMps;
    expect(clubSpeedFromBallSpeed(ball, '4H', 22)).toBeCloseTo(38, 9);
  });

  it('clubSpeedFromBallSpeed of a putter or an unknown club is null', () => {
    expect(clubSpeedFromBallSpeed(5, 'PT', 3)).toBeNull();
    expect(clubSpeedFromBallSpeed(50, 'XX', 20)).toBeNull();
  });
});

describe('estimateCarry', () => {
  it('estimateCarry of a driver stays within the governing bodies’ overall distance standard (≤ 317 yd + 3 yd, carry and roll)', () => {
    const fast = estimateCarry({ club: 'DR', loftDeg: 9, lengthIn: 46 }, { clubSpeedMps: 55, lengthIn: 46 })!;
    expect(fast.carryM / YD).toBeLessThan(320);
  });

  it('estimateCarry falls with loft through the irons and wedges at one player’s speed', () => {
    const carries = [['5I', 25], ['7I', 31], ['9I', 40], ['PW', 45], ['W54', 54], ['W58', 58]].map(
      ([club, loft]) => estimateCarry({ club: club as string, loftDeg: loft as number, lengthIn: null }, reference)!.carryM,
    );
    for (let i = 1; i < carries.length; i++) expect(carries[i]).toBeLessThan(carries[i - 1]);
  });

  it('estimateCarry without a loft uses the typical loft of the kind and says so', () => {
    const e = estimateCarry({ club: '8I', loftDeg: null, lengthIn: null }, reference)!;
    expect(e).toMatchObject({ loftDeg: 36, loftFrom: 'typical' });
    expect(e.clubSpeedMps).toBeCloseTo(clubSpeedForLength(reference, typicalLengthIn('8I')!), 12);
  });

  it('estimateCarry of a putter, an unknown club or without a reference is null', () => {
    expect(estimateCarry({ club: 'PT', loftDeg: 3, lengthIn: 34 }, reference)).toBeNull();
    expect(estimateCarry({ club: 'XX', loftDeg: 20, lengthIn: 40 }, reference)).toBeNull();
    expect(estimateCarry({ club: '7I', loftDeg: 31, lengthIn: 37 }, null)).toBeNull();
  });
});

describe('calibratedReference', () => {
  it('calibratedReference gives the speed at which the estimate carries the hit club as far as it was hit', () => {
    const hit = { club: '7I', loftDeg: 31, lengthIn: 37, carryM: 128 };
    const reference = calibratedReference(hit)!;
    expect(reference.lengthIn).toBe(37);
    expect(estimateCarry(hit, reference)!.carryM).toBeCloseTo(128, 6);
  });

  it('calibratedReference of a faster player’s carry is a faster speed', () => {
    const slow = calibratedReference({ club: '7I', loftDeg: 31, lengthIn: 37, carryM: 110 })!;
    const fast = calibratedReference({ club: '7I', loftDeg: 31, lengthIn: 37, carryM: 150 })!;
    expect(fast.clubSpeedMps).toBeGreaterThan(slow.clubSpeedMps);
  });

  it('calibratedReference of a putter, an unknown club or a carry out of reach is null', () => {
    expect(calibratedReference({ club: 'PT', loftDeg: 3, lengthIn: 34, carryM: 5 })).toBeNull();
    expect(calibratedReference({ club: 'XX', loftDeg: 20, lengthIn: 40, carryM: 150 })).toBeNull();
    expect(calibratedReference({ club: '7I', loftDeg: 31, lengthIn: 37, carryM: 900 })).toBeNull();
  });
});
