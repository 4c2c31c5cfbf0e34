/**
 * A head-to-head field's reading, one rule for the plot, the table, the words, the JSON and the
 * command line: 'equivalent' when the 95% interval of the difference lies inside ±margin (the two
 * one-sided tests of Schuirmann 1987 at 2.5% each), else 'clear' when it excludes 0, else
 * 'unclear' (shown as "not yet clear", with the shots that would settle it).
 */
export type Verdict = 'equivalent' | 'clear' | 'unclear';

/**
 * The verdict of an interval against a margin. O(1).
 * Schuirmann, "A comparison of the two one-sided tests procedure and the power approach for
 * assessing the equivalence of average bioavailability", J. Pharmacokinet. Biopharm. 15 (1987)
 * 657–680: equivalent at level α when the (1 − 2α) interval lies inside ±margin.
 * @throws RangeError when the margin is not positive or an end of the interval is not finite
 * @example verdictOf([-1.2, 2.0], 2.7432) // => 'equivalent'
 * @example verdictOf([0.8, 5.1], 2.7432) // => 'clear'
 * @example verdictOf([-10.2, 12.5], 2.7432) // => 'unclear'
 */
export function verdictOf(ci95: readonly [number, number], margin: number): Verdict {
  if (!(margin > 0) || !Number.isFinite(margin)) throw new RangeError('verdictOf: the margin must be a positive number');
  const lo = Math.min(ci95[0], ci95[1]);
  const hi = Math.max(ci95[0], ci95[1]);
  if (!Number.isFinite(lo) || !Number.isFinite(hi)) throw new RangeError('verdictOf: the interval must be finite');
  if (lo > -margin && hi < margin) return 'equivalent';
  if (lo > 0 || hi < 0) return 'clear';
  return 'unclear';
}

/** The words the screens use for a verdict. */
export const VERDICT_WORDS: Readonly<Record<Verdict, string>> = {
  equivalent: 'equivalent',
  clear: 'clear',
  unclear: 'not yet clear',
};
