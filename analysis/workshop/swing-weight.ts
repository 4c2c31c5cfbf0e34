/**
 * Swing weight on the 14-inch fulcrum ("lorythmic") scale. The club balances on a fulcrum 14 in
 * from the grip end; its swing weight is the moment of its weight about that fulcrum,
 * W · (B − 14 in), written as a letter A–G and a digit 0–9, one step a "point".
 *
 * Sources: R. W. Adams, "Apparatus for measuring moments of golf clubs and the like", US Patent
 * 1,953,916 (1934) — the 14-inch fulcrum scale; D. Tutelman, "Estimating heft" (tutelman.com,
 * golf/design/swingwt3) — one swing-weight point is about 50 gram-inches of moment (published,
 * secondary). From memory, not read in a source: one point is exactly 1.75 in·oz (49.6 g·in) and
 * A0 sits at 155 in·oz (R. Maltby, "Golf Club Design, Fitting, Alteration and Repair", the
 * method quoted by Tutelman, "Measuring swingweight"). Check these two against a calibrated
 * scale before relying on an absolute reading; differences between two builds depend only on
 * the size of a point.
 */

/** Ounce in grams (NIST SP 811, 2008, Appendix B: 1 oz avoirdupois = 28.349523125 g exactly). */
export const GRAMS_PER_OUNCE = 28.349523125;

/** The fulcrum's distance from the grip end (in). */
export const SWING_WEIGHT_FULCRUM_IN = 14;

/** One swing-weight point (in·oz), from memory (see the file's note). */
export const SWING_WEIGHT_POINT_IN_OZ = 1.75;

/** The moment at A0 (in·oz), from memory (see the file's note). */
export const SWING_WEIGHT_A0_IN_OZ = 155;

const LETTERS = 'ABCDEFG';

/**
 * Swing-weight points above A0 of a club of `totalMassG` grams whose balance point lies
 * `balancePointIn` inches from the grip end: (W_oz · (B − 14) − 155) / 1.75. D0 is 30 points,
 * D2 32. O(1).
 * @throws RangeError when the mass is not positive or a value is not finite
 * @example swingWeightPoints(310, 33.3) // => 32.03 (about D2)
 */
export function swingWeightPoints(totalMassG: number, balancePointIn: number): number {
  if (!Number.isFinite(totalMassG) || !(totalMassG > 0)) throw new RangeError(`total mass ${totalMassG} g is not a positive number`);
  if (!Number.isFinite(balancePointIn)) throw new RangeError(`balance point ${balancePointIn} in is not a finite number`);
  const momentInOz = (totalMassG / GRAMS_PER_OUNCE) * (balancePointIn - SWING_WEIGHT_FULCRUM_IN);
  return (momentInOz - SWING_WEIGHT_A0_IN_OZ) / SWING_WEIGHT_POINT_IN_OZ;
}

/**
 * Swing-weight points as the scale writes them, to the nearest half point: "D2", "C9.5". Null
 * outside A0–G9.5 (the scale's letters end there). O(1).
 * @example swingWeightLabel(32) // => 'D2'
 * @example swingWeightLabel(28.6) // => 'C8.5'
 */
export function swingWeightLabel(points: number): string | null {
  if (!Number.isFinite(points)) return null;
  const half = Math.round(points * 2) / 2;
  if (half < 0 || half >= LETTERS.length * 10) return null;
  const letter = LETTERS[Math.floor(half / 10)];
  const digit = half - Math.floor(half / 10) * 10;
  return `${letter}${digit}`;
}

/**
 * Points above A0 of a written swing weight ("D2", "d2", "C9.5", "D-2"); null when the text is
 * not a swing weight. Bounded work: at most 8 characters are read. O(1).
 * @example parseSwingWeight('D2') // => 32
 */
export function parseSwingWeight(text: string | null | undefined): number | null {
  if (!text) return null;
  const t = text.trim().toUpperCase().replace('-', '');
  if (t.length < 2 || t.length > 8) return null;
  const letter = LETTERS.indexOf(t[0]);
  if (letter < 0) return null;
  const rest = t.slice(1);
  if (!/^\d(\.5|\.0)?$/.test(rest)) return null;
  return letter * 10 + Number(rest);
}
