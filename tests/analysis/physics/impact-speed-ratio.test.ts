import { BALL_MASS_LIMIT_KG, impactSpeedRatio } from '@/analysis/physics';

describe('impactSpeedRatio', () => {
  // A. R. Penner, "The physics of golf", Rep. Prog. Phys. 66 (2003) (formula from memory):
  // v_ball/v_club = (1 + e)/(1 + m/M); m 45.93 g, M 200 g: e 0.83 → 1.48823, e 0.80 → 1.46383 (computed).
  it('impactSpeedRatio of a square impact is Penner’s (1 + e)/(1 + m/M)', () => {
    expect(impactSpeedRatio({ restitution: 0.83, ballMassKg: 0.04593, headMassKg: 0.2, loftDeg: 0 })).toBeCloseTo(1.48823, 5);
    expect(impactSpeedRatio({ restitution: 0.8, ballMassKg: 0.04593, headMassKg: 0.2, loftDeg: 0 })).toBeCloseTo(1.46383, 5);
  });

  // Closed form: a perfectly elastic ball struck by an infinitely heavy wall moving at v leaves at 2v.
  it('impactSpeedRatio of an elastic ball and a very heavy head tends to 2', () => {
    expect(impactSpeedRatio({ restitution: 1, ballMassKg: 0.04593, headMassKg: 1e9, loftDeg: 0 })).toBeCloseTo(2, 6);
  });

  // Classical mechanics of a solid sphere (I = 2/5·m·r²): struck sliding, it ends rolling at 5/7
  // of the relative speed, so a ball hit along a very heavy face leaves at 2/7 of the face's speed
  // (from memory: the "five sevenths" rule of a sliding ball); with e = 0 and loft 90° only that part is left.
  it('impactSpeedRatio along the face alone is the rolling ball’s 2/7', () => {
    expect(impactSpeedRatio({ restitution: 0, ballMassKg: 0.04593, headMassKg: 1e9, loftDeg: 90 })).toBeCloseTo(2 / 7, 6);
  });

  it('impactSpeedRatio falls as loft rises', () => {
    const at = (loftDeg: number) => impactSpeedRatio({ restitution: 0.83, ballMassKg: BALL_MASS_LIMIT_KG, headMassKg: 0.27, loftDeg });
    expect(at(10)).toBeGreaterThan(at(30));
    expect(at(30)).toBeGreaterThan(at(50));
  });

  it.each([
    [{ restitution: 1.2, ballMassKg: 0.04593, headMassKg: 0.2, loftDeg: 0 }],
    [{ restitution: 0.8, ballMassKg: 0, headMassKg: 0.2, loftDeg: 0 }],
    [{ restitution: 0.8, ballMassKg: 0.04593, headMassKg: 0.2, loftDeg: 100 }],
  ])('impactSpeedRatio with %j throws', (input) => {
    expect(() => impactSpeedRatio(input)).toThrow(RangeError);
  });
});
