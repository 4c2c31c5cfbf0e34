/**
 * The head-to-head's rows in words, for the verdict list under the plot: per field the
 * difference with its interval and margin in the user's units, the verdict (the analysis's,
 * never worked out again) and the shots still needed; per spread field both sds, their ratio
 * and the Brown–Forsythe p. Pure.
 */
import { FIELD_LABELS, type ShotField } from '@/analysis/fields';
import { formatAmount, VERDICT_WORDS, type HeadToHead, type Verdict } from '@/analysis/head-to-head';
import type { UnitSystem } from '@/analysis/units';

export type VerdictRow = {
  key: string;
  label: string;
  verdict: Verdict;
  verdictText: string;
  /** "+4.2 yd (95%: −1.0 to +9.4), margin ±3 yd". */
  detail: string;
  /** "About 12 more shots per build would settle it", or null. */
  more: string | null;
};

const MINUS = '\u2212';
const signed = (field: ShotField, v: number, units: UnitSystem) => `${v < 0 ? MINUS : '+'}${formatAmount(field, Math.abs(v), units)}`;

function moreText(n: number | null): string | null {
  if (n === null) return null;
  return n > 100 ? 'More than 100 more shots per build would settle it' : `About ${n} more shots per build would settle it`;
}

/**
 * The verdict rows of the given mean fields and spread fields, those the comparison has. O(fields).
 * @example verdictRows(h, ['carry'], ['offline'], 'imperial')[0].detail // => '+6 yd (95%: +2 to +10), margin ±3 yd'
 */
export function verdictRows(h: Pick<HeadToHead, 'fields' | 'spread'>, fields: readonly ShotField[], spreadFields: readonly ShotField[], units: UnitSystem): VerdictRow[] {
  const rows: VerdictRow[] = [];
  for (const f of fields) {
    const c = h.fields[f];
    if (!c) continue;
    rows.push({
      key: `mean-${f}`,
      label: FIELD_LABELS[f],
      verdict: c.verdict,
      verdictText: VERDICT_WORDS[c.verdict],
      detail: `${signed(f, c.diff, units)} (95%: ${signed(f, c.ci95[0], units)} to ${signed(f, c.ci95[1], units)}), margin ±${formatAmount(f, c.margin, units)}`,
      more: moreText(c.shotsNeeded),
    });
  }
  for (const f of spreadFields) {
    const s = h.spread.fields[f];
    if (!s) continue;
    rows.push({
      key: `spread-${f}`,
      label: f === 'offline' ? 'Left–right spread' : `${FIELD_LABELS[f]} spread`,
      verdict: s.verdict,
      verdictText: VERDICT_WORDS[s.verdict],
      detail: `sd ${formatAmount(f, s.sdA, units)} vs ${formatAmount(f, s.sdB, units)}, ratio ${s.ratio.toFixed(2)}, Brown–Forsythe p ${s.p < 0.001 ? '< 0.001' : s.p.toFixed(3)}`,
      more: moreText(s.shotsNeeded),
    });
  }
  return rows;
}
