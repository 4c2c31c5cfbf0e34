import { lieChangeForLengthChangeDeg } from './lie-for-length';

/**
 * Rules of thumb for swing-weight changes. Common practice, no source: about 2 g of mass at the
 * head per swing-weight point; about 3 points per ½ in of length (6 per inch).
 */
export const HEAD_GRAMS_PER_SWING_WEIGHT_POINT = 2;
export const SWING_WEIGHT_POINTS_PER_LENGTH_IN = 6;

/**
 * Swing-weight points from mass added at the head (g; negative when removed), by the
 * common-practice 2 g per point. O(1).
 * @throws RangeError when the mass is not a finite number
 * @example swingWeightChangeForHeadMass(4) // => 2
 */
export function swingWeightChangeForHeadMass(addedMassG: number): number {
  if (!Number.isFinite(addedMassG)) throw new RangeError(`mass ${addedMassG} g is not a finite number`);
  return addedMassG / HEAD_GRAMS_PER_SWING_WEIGHT_POINT;
}

/**
 * Swing-weight points from a length change (in, + longer), by the common-practice 3 points per
 * ½ in. O(1).
 * @throws RangeError when the length change is not a finite number
 * @example swingWeightChangeForLength(-0.5) // => -3
 */
export function swingWeightChangeForLength(lengthChangeIn: number): number {
  if (!Number.isFinite(lengthChangeIn)) throw new RangeError(`length change ${lengthChangeIn} in is not a finite number`);
  return lengthChangeIn * SWING_WEIGHT_POINTS_PER_LENGTH_IN;
}

/** What a change to a build does, by the rules of thumb above. */
export interface BuildChangeEffect {
  /** Swing-weight points from the added mass; null without a mass change. */
  massPoints: number | null;
  /** Swing-weight points from the length change; null without one. */
  lengthPoints: number | null;
  /** Lie change (deg, + upright) that keeps the sole level at the new length; null without one. */
  lieDeg: number | null;
  /** Both together (points); null when neither is known. */
  totalPoints: number | null;
}

/**
 * The effect of adding mass at the head and changing the length, each by its common-practice
 * rule (mass assumed at the head; grip and shaft unchanged). O(1).
 * @throws RangeError when a given value is not finite
 * @example buildChangeEffect({ addedMassG: 4, lengthChangeIn: 0.5 }) // => { massPoints: 2, lengthPoints: 3, lieDeg: 1, totalPoints: 5 }
 */
export function buildChangeEffect(change: { addedMassG?: number | null; lengthChangeIn?: number | null }): BuildChangeEffect {
  const mass = change.addedMassG ?? null;
  const length = change.lengthChangeIn ?? null;
  const massPoints = mass === null || mass === 0 ? null : swingWeightChangeForHeadMass(mass);
  const lengthPoints = length === null || length === 0 ? null : swingWeightChangeForLength(length);
  const lieDeg = length === null || length === 0 ? null : lieChangeForLengthChangeDeg(length);
  const totalPoints = massPoints === null && lengthPoints === null ? null : (massPoints ?? 0) + (lengthPoints ?? 0);
  return { massPoints, lengthPoints, lieDeg, totalPoints };
}
