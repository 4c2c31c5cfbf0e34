import { displayUnits, fromCanonical, type UnitSystem } from '../units';

/**
 * A chance as "about N in 10" (N rounded, 0 and 10 said as "fewer than 1" and "nearly all"). O(1).
 * @throws RangeError when p is not within 0…1
 * @example chanceWords(0.68) // => 'about 7 in 10'
 */
export function chanceWords(p: number): string {
  if (!(p >= 0 && p <= 1)) throw new RangeError('A chance lies between 0 and 1.');
  const n = Math.round(p * 10);
  if (n === 0) return 'fewer than 1 in 10';
  if (n === 10) return 'nearly all';
  return `about ${n} in 10`;
}

/**
 * The on-target odds of a build in a player's words: "about 7 in 10 of your next shots finish in
 * a 33 yd fairway; about 4 in 10 within 12 yd of the green’s middle". O(1).
 * @example oddsInPlainWords({ fairwayWidthM: 30.1752, fairway: 0.68, greenRadiusM: 10.9728, green: 0.41 }, 'imperial')
 * // => 'About 7 in 10 of your next shots finish in a 33 yd fairway; about 4 in 10 within 12 yd of the green’s middle.'
 */
export function oddsInPlainWords(odds: { fairwayWidthM: number; fairway: number; greenRadiusM: number; green: number }, units: UnitSystem): string {
  const unit = displayUnits(units).carry;
  const width = Math.round(fromCanonical(odds.fairwayWidthM, unit, 'carry'));
  const radius = Math.round(fromCanonical(odds.greenRadiusM, unit, 'carry'));
  const fairway = chanceWords(odds.fairway);
  return `${fairway.charAt(0).toUpperCase()}${fairway.slice(1)} of your next shots finish in a ${width} ${unit} fairway; ${chanceWords(odds.green)} within ${radius} ${unit} of the green’s middle.`;
}
