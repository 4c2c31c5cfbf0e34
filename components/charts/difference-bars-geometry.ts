/**
 * The head-to-head forest plot's numbers: per field the difference A − B and its 95% confidence
 * interval as a horizontal bar around zero, the field's margin as a band (inside it the builds
 * are equivalent), and the verdict the analysis gave (one rule everywhere: equivalent, clear,
 * not yet clear). Spread rows show the difference of the builds' mean distance from their
 * median (the Brown–Forsythe quantities) the same way. Fields have different units, so each row
 * has its own scale, symmetric about zero, so that zero lies on one vertical line for every
 * row. Each row is three lines — name and verdict, the numbers, the bar — so nothing overprints
 * on a phone. Pure: no React.
 */
import { scaleLinear } from 'd3-scale';
import { FIELD_LABELS, type ShotField } from '@/analysis/fields';
import { VERDICT_WORDS, type HeadToHead, type Verdict } from '@/analysis/head-to-head';
import { displayUnits, findUnit, fromCanonical, type UnitSystem } from '@/analysis/units';
import { formatNumber, formatSigned } from './chart-format';
import type { PlotBox } from './chart-types';

export type DifferenceBarsInput = {
  headToHead: Pick<HeadToHead, 'fields'> & Partial<Pick<HeadToHead, 'spread'>>;
  /** The fields whose means to show, in order; fields the comparison lacks are left out. */
  fields: readonly ShotField[];
  /** The fields whose spread to show after them (default none). */
  spreadFields?: readonly ShotField[];
  units: UnitSystem;
  widthPx: number;
};

export type DifferenceRow = {
  kind: 'mean' | 'spread';
  field: ShotField;
  label: string;
  /** Display unit as written after a number ('yd', 'mph', '°', 'rpm', ''). */
  unitLabel: string;
  /** Display units. */
  diff: number;
  ciLow: number;
  ciHigh: number;
  margin: number;
  /** Half the row's scale (the scale runs −half … +half), display units. */
  halfRange: number;
  /** The analysis's verdict, and it in words ("equivalent", "clear", "not yet clear"). */
  verdict: Verdict;
  verdictText: string;
  /** "+4.2 yd (95%: +1.1 to +7.3)"; for spread "sd 6.5 vs 4.0 yd · ratio 1.64". */
  valueText: string;
  rangeLabels: [string, string];
  /** Row top, the name line's baseline, the numbers line's baseline and the bar's centre, px. */
  top: number;
  labelY: number;
  valueY: number;
  barY: number;
  diffX: number;
  lowX: number;
  highX: number;
  marginLowX: number;
  marginHighX: number;
};

export type DifferenceBarsGeometry = {
  widthPx: number;
  heightPx: number;
  plot: PlotBox;
  zeroX: number;
  rows: DifferenceRow[];
};

export const DIFFERENCE_ROW_PX = 84;
export const DIFFERENCE_MARGIN = { top: 28, bottom: 8, left: 8, right: 8 } as const;

/** Decimals a field's difference is written with, in its display unit. */
export function differenceDecimals(field: ShotField): number {
  if (field === 'spinRate' || field === 'backSpin' || field === 'sideSpin') return 0;
  if (field === 'smashFactor') return 3;
  if (field === 'flightTime') return 2;
  return 1;
}

/**
 * The smallest of 1, 2, 2.5, 5 × 10^k at or above `value` (for a row's scale end). O(1).
 * @example niceCeil(7.3) // => 10
 */
export function niceCeil(value: number): number {
  if (!(value > 0) || !Number.isFinite(value)) return 1;
  const p = 10 ** Math.floor(Math.log10(value));
  for (const s of [1, 2, 2.5, 5, 10]) if (s * p >= value * (1 - 1e-12)) return s * p;
  return 10 * p;
}

type Interval = { diff: number; ci95: [number, number]; margin: number; verdict: Verdict };

/**
 * Everything the forest plot draws, in px: per field (in the given order, those the comparison
 * has) the difference, its 95% interval and its margin in the user's units, on a row scale
 * running from −h to +h with h = niceCeil(1.1 × the largest |end| or margin), zero in the
 * middle of every row; then the spread rows asked for. The verdict is the analysis's, never
 * worked out again here. O(fields).
 * @throws RangeError when widthPx is not a positive number
 * @example differenceBarsGeometry({ headToHead, fields: ['carry'], units: 'imperial', widthPx: 390 }).rows[0].valueText
 */
export function differenceBarsGeometry(input: DifferenceBarsInput): DifferenceBarsGeometry {
  if (!(input.widthPx > 0) || !Number.isFinite(input.widthPx)) throw new RangeError('differenceBarsGeometry needs a positive width');
  const m = DIFFERENCE_MARGIN;
  const units = displayUnits(input.units);
  const wanted: { kind: 'mean' | 'spread'; field: ShotField; c: Interval; sds?: [number, number]; ratio?: number }[] = [];
  for (const field of input.fields) {
    const c = input.headToHead.fields[field];
    if (c) wanted.push({ kind: 'mean', field, c });
  }
  for (const field of input.spreadFields ?? []) {
    const s = input.headToHead.spread?.fields[field];
    if (s) wanted.push({ kind: 'spread', field, c: s, sds: [s.sdA, s.sdB], ratio: s.ratio });
  }
  const plot: PlotBox = {
    left: m.left,
    top: m.top,
    right: Math.max(m.left + 40, input.widthPx - m.right),
    bottom: m.top + wanted.length * DIFFERENCE_ROW_PX,
  };
  const zeroX = (plot.left + plot.right) / 2;
  const rows = wanted.map(({ kind, field, c, sds, ratio }, i): DifferenceRow => {
    const unit = units[field];
    const unitLabel = findUnit(unit)?.label ?? unit;
    const toUnit = (v: number) => (field === 'smashFactor' ? v : fromCanonical(v, unit, field));
    const diff = toUnit(c.diff);
    const ciLow = toUnit(Math.min(c.ci95[0], c.ci95[1]));
    const ciHigh = toUnit(Math.max(c.ci95[0], c.ci95[1]));
    const margin = toUnit(c.margin);
    const halfRange = niceCeil(1.1 * Math.max(Math.abs(ciLow), Math.abs(ciHigh), Math.abs(diff), margin));
    const x = scaleLinear().domain([-halfRange, halfRange]).range([plot.left, plot.right]);
    // An interval clear of zero never reads as touching zero: up to two more decimals if needed.
    let dp = differenceDecimals(field);
    const clear = ciLow > 0 || ciHigh < 0;
    const roundsToZero = (v: number, d: number) => Number(Math.abs(v).toFixed(d)) === 0;
    for (let extra = 0; clear && extra < 2 && (roundsToZero(ciLow, dp) || roundsToZero(ciHigh, dp)); extra++) dp++;
    const withUnit = (text: string) => (unitLabel === '' ? text : unitLabel === '°' ? `${text}°` : `${text} ${unitLabel}`);
    const top = plot.top + i * DIFFERENCE_ROW_PX;
    const rangeText = formatNumber(halfRange, halfRange < 1 ? 3 : halfRange % 1 === 0 ? 0 : 1);
    const valueText =
      kind === 'mean'
        ? `${withUnit(formatSigned(diff, dp))} (95%: ${formatSigned(ciLow, dp)} to ${formatSigned(ciHigh, dp)})`
        : `sd ${formatNumber(toUnit(sds![0]), dp)} vs ${withUnit(formatNumber(toUnit(sds![1]), dp))} · ratio ${ratio!.toFixed(2)}`;
    return {
      kind,
      field,
      label: kind === 'mean' ? FIELD_LABELS[field] : field === 'offline' ? 'Left–right spread' : `${FIELD_LABELS[field]} spread`,
      unitLabel,
      diff,
      ciLow,
      ciHigh,
      margin,
      halfRange,
      verdict: c.verdict,
      verdictText: VERDICT_WORDS[c.verdict],
      valueText,
      rangeLabels: [withUnit(`\u2212${rangeText}`), withUnit(`+${rangeText}`)],
      top,
      labelY: top + 17,
      valueY: top + 34,
      barY: top + 52,
      diffX: x(diff),
      lowX: x(ciLow),
      highX: x(ciHigh),
      marginLowX: x(-margin),
      marginHighX: x(margin),
    };
  });
  return { widthPx: input.widthPx, heightPx: plot.bottom + m.bottom, plot, zeroX, rows };
}
