import type { UnitSystem } from '@/analysis/units';

const MINUS = '\u2212';

/** The distance unit a unit system displays: 'yd' or 'm'. */
export function distanceUnit(system: UnitSystem): 'yd' | 'm' {
  return system === 'imperial' ? 'yd' : 'm';
}

/**
 * A number rounded to `decimals`, with a true minus sign and no "−0". O(1).
 * @example formatNumber(-0.04, 1) // => '0.0'
 */
export function formatNumber(value: number, decimals = 0): string {
  const text = Math.abs(value).toFixed(decimals);
  const zero = Number(text) === 0;
  return value < 0 && !zero ? `${MINUS}${text}` : text;
}

/**
 * A number with its sign always written (+3, −2, 0). O(1).
 * @example formatSigned(2.46, 1) // => '+2.5'
 */
export function formatSigned(value: number, decimals = 0): string {
  const text = formatNumber(value, decimals);
  return Number(Math.abs(value).toFixed(decimals)) === 0 || value < 0 ? text : `+${text}`;
}

/**
 * A whole number with thousands grouped by a thin comma (2,450), the same on every runtime. O(digits).
 * @example formatThousands(10000) // => '10,000'
 */
export function formatThousands(value: number): string {
  const digits = formatNumber(Math.round(value));
  return digits.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}

const WORDS = ['no', 'one', 'two', 'three', 'four', 'five', 'six', 'seven', 'eight', 'nine', 'ten'];

/**
 * A count with its noun, small counts in words ("two builds"), larger in digits. O(1).
 * @example countWords(2, 'build') // => 'two builds'
 */
export function countWords(n: number, one: string, many = `${one}s`): string {
  const word = Number.isInteger(n) && n >= 0 && n < WORDS.length ? WORDS[n] : String(n);
  return `${word} ${n === 1 ? one : many}`;
}
