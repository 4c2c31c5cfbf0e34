import { clubInfo, type ClubKind } from '@/analysis/clubs';
import { BALL_MASS_LIMIT_KG, impactSpeedRatio } from './impact-speed-ratio';

/**
 * The most springy face the rules allow: the older coefficient-of-restitution limit 0.830 of
 * the R&A / USGA rules of equipment (today a characteristic-time limit of 239 µs + 18 µs
 * tolerance, which is about the same spring). Used for drivers, woods and hybrids.
 */
export const RESTITUTION_LIMIT = 0.83;

/**
 * Allowance for measurement error in a smash factor, relative: a club speed read 3% slow raises
 * the smash factor by about 3%. Our choice, no source: generous, so that only readings a real
 * impact cannot give are called misreads.
 */
export const SMASH_MEASUREMENT_ALLOWANCE = 0.03;

/**
 * Per kind of club: the heaviest head, how far below its typical loft a club may meet the ball
 * (a strong-lofted set and a forward-leaning shaft both take loft off), and the restitution.
 * Common practice, no source (from memory): heads weigh about 195–210 g (driver), 210–230 g
 * (woods), 225–255 g (hybrids), 240–290 g (irons) and 290–310 g (wedges); the heaviest is
 * taken. A driver's loft is taken as 6° at impact at the least. Irons and wedges meet the
 * ball at lower speeds along the face's normal, where a ball is springier: 0.86 is taken for
 * them (from memory, generous), above the rules' 0.830 for the faces of woods.
 */
export const IMPACT_CLUBS: Readonly<Record<Exclude<ClubKind, 'putter'>, { headMassKg: number; loftBelowTypicalDeg: number; leastLoftDeg: number; restitution: number }>> = {
  driver: { headMassKg: 0.21, loftBelowTypicalDeg: 4.5, leastLoftDeg: 6, restitution: RESTITUTION_LIMIT },
  wood: { headMassKg: 0.23, loftBelowTypicalDeg: 5, leastLoftDeg: 8, restitution: RESTITUTION_LIMIT },
  hybrid: { headMassKg: 0.255, loftBelowTypicalDeg: 8, leastLoftDeg: 10, restitution: RESTITUTION_LIMIT },
  iron: { headMassKg: 0.29, loftBelowTypicalDeg: 14, leastLoftDeg: 10, restitution: 0.86 },
  wedge: { headMassKg: 0.31, loftBelowTypicalDeg: 18, leastLoftDeg: 20, restitution: 0.86 },
};

/** The impact bound on a club's smash factor and how it was worked out. */
export interface SmashFactorLimit {
  /** Above this a smash factor is a misread: the ideal bound plus the measurement allowance. */
  limit: number;
  /** What the impact model allows for the most favourable impact of this club (no allowance). */
  ideal: number;
  kind: ClubKind | null;
  /** The loft at impact the bound assumes, degrees. */
  loftDeg: number;
  headMassKg: number;
  restitution: number;
}

/**
 * The highest smash factor a club can give, from the impact model (Penner 2003; see
 * impactSpeedRatio) at the most favourable impact for the club: the rules' restitution limit
 * 0.830 (more for irons and wedges), the heaviest ball the rules allow (45.93 g), the heaviest
 * head of its kind, and its typical loft less what strong lofts and shaft lean can take off
 * (IMPACT_CLUBS); then
 * SMASH_MEASUREMENT_ALLOWANCE on top. A club Ovalyard does not know gets the most generous
 * bound of all kinds (square impact, heaviest head). Putters have no bound (null): a putt's
 * speeds are too small for the ratio to mean much. O(1).
 * @example smashFactorLimit('DR') // => { limit: 1.535, ideal: 1.491, kind: 'driver', loftDeg: 6, … }
 * @example smashFactorLimit('PT') // => null
 */
export function smashFactorLimit(club: string): SmashFactorLimit | null {
  const info = clubInfo(club);
  if (info?.kind === 'putter') return null;
  let headMassKg: number;
  let loftDeg: number;
  let restitution: number;
  if (info) {
    const model = IMPACT_CLUBS[info.kind as Exclude<ClubKind, 'putter'>];
    headMassKg = model.headMassKg;
    loftDeg = Math.max(model.leastLoftDeg, info.typicalLoftDeg - model.loftBelowTypicalDeg);
    restitution = model.restitution;
  } else {
    const all = Object.values(IMPACT_CLUBS);
    headMassKg = Math.max(...all.map((c) => c.headMassKg));
    restitution = Math.max(...all.map((c) => c.restitution));
    loftDeg = 0;
  }
  const ideal = impactSpeedRatio({ restitution, ballMassKg: BALL_MASS_LIMIT_KG, headMassKg, loftDeg });
  return { limit: ideal * (1 + SMASH_MEASUREMENT_ALLOWANCE), ideal, kind: info?.kind ?? null, loftDeg, headMassKg, restitution };
}

/**
 * Whether a smash factor is more than the impact allows for the club (a misread), with the
 * bound. O(1).
 * @returns the bound when the value is above it, else null (also for putters and non-finite values)
 * @example smashFactorMisread('DR', 1.62)?.limit // => 1.535
 */
export function smashFactorMisread(club: string, smashFactor: number): SmashFactorLimit | null {
  if (!Number.isFinite(smashFactor)) return null;
  const bound = smashFactorLimit(club);
  return bound && smashFactor > bound.limit ? bound : null;
}
