/**
 * Ball speed over club speed at impact, from the impulse model of a golf impact.
 *
 * Head-on (square, no loft), A. R. Penner, "The physics of golf", Reports on Progress in
 * Physics 66 (2003) 131–171, from memory: v_ball / v_club = (1 + e) / (1 + m/M), with e the
 * coefficient of restitution, m the ball's mass and M the head's. With loft θ the same impulse
 * model splits the impact: the normal part is v·cos θ·(1 + e)/(1 + m/M); along the face the
 * ball leaves rolling (a solid sphere, I = 2/5·m·r², no slip at separation), which gives
 * v·sin θ·(2/7)/(1 + 2m/(7M)) (derived here from the no-slip condition, not quoted).
 */

/** Ball mass at the limit of the rules of equipment (R&A / USGA: ball ≤ 45.93 g). */
export const BALL_MASS_LIMIT_KG = 0.04593;

/** Inputs of one impact. */
export interface ImpactInput {
  /** Coefficient of restitution of ball and face. */
  restitution: number;
  ballMassKg: number;
  headMassKg: number;
  /** Loft at impact, degrees (0 = square, head-on). */
  loftDeg: number;
}

/**
 * Ball speed / club speed (the smash factor) of an impact with the given restitution, masses
 * and loft at impact: sqrt(normal² + along²) with normal = cos θ·(1 + e)/(1 + m/M) and along =
 * sin θ·(2/7)/(1 + 2m/(7M)). At θ = 0 this is Penner's (1 + e)/(1 + m/M). O(1).
 * @throws RangeError when a mass is not positive, e is outside [0, 1] or the loft outside [0, 90]
 * @example impactSpeedRatio({ restitution: 0.83, ballMassKg: 0.04593, headMassKg: 0.2, loftDeg: 0 }) // => 1.48823
 */
export function impactSpeedRatio(input: ImpactInput): number {
  const { restitution: e, ballMassKg: m, headMassKg: M, loftDeg } = input;
  if (!(m > 0) || !(M > 0)) throw new RangeError('impactSpeedRatio: masses must be positive');
  if (!(e >= 0 && e <= 1)) throw new RangeError('impactSpeedRatio: restitution must lie in [0, 1]');
  if (!(loftDeg >= 0 && loftDeg <= 90)) throw new RangeError('impactSpeedRatio: loft must lie in [0°, 90°]');
  const theta = (loftDeg * Math.PI) / 180;
  const normal = (Math.cos(theta) * (1 + e)) / (1 + m / M);
  const along = (Math.sin(theta) * (2 / 7)) / (1 + (2 * m) / (7 * M));
  return Math.hypot(normal, along);
}
