import { BALL_MASS_LIMIT_KG, impactSpeedRatio, RESTITUTION_LIMIT, SMASH_MEASUREMENT_ALLOWANCE, smashFactorLimit, smashFactorMisread } from '@/analysis/physics';

describe('smashFactorLimit', () => {
  // The R&A / USGA rules of equipment: ball ≤ 45.93 g; the older COR limit 0.830.
  it('smashFactorLimit uses the rules’ heaviest ball and their restitution limit', () => {
    expect(BALL_MASS_LIMIT_KG).toBe(0.04593);
    expect(RESTITUTION_LIMIT).toBe(0.83);
  });

  it('smashFactorLimit of a driver is the impact bound at its least loft plus the stated allowance', () => {
    const l = smashFactorLimit('DR')!;
    expect(l.kind).toBe('driver');
    expect(l.ideal).toBeCloseTo(impactSpeedRatio({ restitution: 0.83, ballMassKg: 0.04593, headMassKg: l.headMassKg, loftDeg: l.loftDeg }), 12);
    expect(l.limit).toBeCloseTo(l.ideal * (1 + SMASH_MEASUREMENT_ALLOWANCE), 12);
    // Never below Penner's square impact of a 200 g head (1.48823, computed), so no real drive is a misread.
    expect(l.limit).toBeGreaterThan(1.48823);
  });

  it('smashFactorLimit of a lofted wedge is well below a driver’s, and falls with the wedge’s loft', () => {
    expect(smashFactorLimit('SW')!.limit).toBeLessThan(smashFactorLimit('DR')!.limit - 0.1);
    expect(smashFactorLimit('W60')!.limit).toBeLessThan(smashFactorLimit('W50')!.limit);
  });

  it('smashFactorLimit of a putter is null and of an unknown club the most generous bound', () => {
    expect(smashFactorLimit('PT')).toBeNull();
    const unknown = smashFactorLimit('Mystery club')!;
    expect(unknown.loftDeg).toBe(0);
    expect(unknown.limit).toBeGreaterThan(smashFactorLimit('DR')!.limit);
  });

  it('smashFactorMisread flags 1.62 on a driver and not 1.50', () => {
    expect(smashFactorMisread('DR', 1.62)).not.toBeNull();
    expect(smashFactorMisread('DR', 1.5)).toBeNull();
    expect(smashFactorMisread('DR', Number.NaN)).toBeNull();
  });
});
