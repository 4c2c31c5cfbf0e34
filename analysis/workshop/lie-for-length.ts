/**
 * Lie change that keeps the sole level after a length change. Common practice, no source: about
 * 1° more upright for every ½ in longer (1° flatter per ½ in shorter), i.e. 2° per inch.
 */
export const LIE_DEG_PER_LENGTH_IN = 2;

/**
 * The lie change (deg, + more upright) that goes with a length change (in, + longer), by the
 * common-practice rule of about 1° per ½ in. O(1).
 * @throws RangeError when the length change is not a finite number
 * @example lieChangeForLengthChangeDeg(0.5) // => 1
 * @example lieChangeForLengthChangeDeg(-0.75) // => -1.5
 */
export function lieChangeForLengthChangeDeg(lengthChangeIn: number): number {
  if (!Number.isFinite(lengthChangeIn)) throw new RangeError(`length change ${lengthChangeIn} in is not a finite number`);
  return lengthChangeIn * LIE_DEG_PER_LENGTH_IN;
}
