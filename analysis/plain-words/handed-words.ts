/**
 * Words for the ball's curve, the club's path and the face, as the player and their fitter say
 * them for the player's hand. The convention, stated once:
 *
 * - Stored values are canonical and the same for either hand: + is right of the target line as
 *   seen from behind the golfer looking at the target (offline, launch direction, club path,
 *   face angle, spin axis, side spin). A session of a left-hander is never mirrored in storage.
 * - Left and right words ("miss right", "starts left") are absolute: the same for both hands.
 * - Handed words turn with the hand. A right-hander stands left of the ball, a left-hander right
 *   of it. For a right-hander a curve to the left is a draw (a strong one a hook) and to the
 *   right a fade (a slice); a path to the right is in-to-out; a face pointing right is open. For
 *   a left-hander each is the mirror: a curve to the right is a draw (hook), to the left a fade
 *   (slice); a path to the left is in-to-out; a face pointing left is open.
 *
 * Thresholds are a fitter's rough reading (common practice, no source): a spin axis within ±2°
 * is "straight", beyond ±10° a hook or slice; a path or face within ±1° is "square".
 */
export type Hand = 'right' | 'left';

/** +1 when a right-hander's word for "toward the right" applies, −1 for a left-hander. */
const mirror = (hand: Hand) => (hand === 'right' ? 1 : -1);

export const STRAIGHT_AXIS_DEG = 2;
export const HOOK_AXIS_DEG = 10;
export const SQUARE_DEG = 1;

/**
 * The curve of a shot or a group's mean by its spin axis (canonical: + tilts so the ball curves right). O(1).
 * @example curveWord(-6, 'right') // => 'draw'
 * @example curveWord(6, 'left') // => 'draw'
 * @example curveWord(14, 'right') // => 'slice'
 */
export function curveWord(spinAxisDeg: number, hand: Hand): 'straight' | 'draw' | 'fade' | 'hook' | 'slice' {
  if (Math.abs(spinAxisDeg) < STRAIGHT_AXIS_DEG) return 'straight';
  const handed = spinAxisDeg * mirror(hand); // > 0: away from the golfer's body side (a right-hander's fade)
  const strong = Math.abs(spinAxisDeg) > HOOK_AXIS_DEG;
  if (handed > 0) return strong ? 'slice' : 'fade';
  return strong ? 'hook' : 'draw';
}

/**
 * The club's path (canonical: + points right of the target line). O(1).
 * @example pathWord(3, 'right') // => 'in-to-out'
 * @example pathWord(3, 'left') // => 'out-to-in'
 */
export function pathWord(clubPathDeg: number, hand: Hand): 'square' | 'in-to-out' | 'out-to-in' {
  if (Math.abs(clubPathDeg) < SQUARE_DEG) return 'square';
  return clubPathDeg * mirror(hand) > 0 ? 'in-to-out' : 'out-to-in';
}

/**
 * The face at impact to the target line (canonical: + points right). O(1).
 * @example faceWord(2, 'right') // => 'open'
 * @example faceWord(2, 'left') // => 'closed'
 */
export function faceWord(faceAngleDeg: number, hand: Hand): 'square' | 'open' | 'closed' {
  if (Math.abs(faceAngleDeg) < SQUARE_DEG) return 'square';
  return faceAngleDeg * mirror(hand) > 0 ? 'open' : 'closed';
}

/**
 * Where a group finishes across the line (mean offline, m; canonical + is right): the same for
 * both hands. Within `withinM` of the line: "on line". O(1).
 * @example missWord(-7, 3) // => 'miss left'
 */
export function missWord(offlineM: number, withinM = 3): 'on line' | 'miss left' | 'miss right' {
  if (Math.abs(offlineM) <= withinM) return 'on line';
  return offlineM > 0 ? 'miss right' : 'miss left';
}
