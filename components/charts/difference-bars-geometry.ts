/**
 * The head-to-head forest plot's numbers: per field the difference A − B and its 95% confidence
 * interval as a horizontal bar around zero. Fields have different units, so each row has its
 * own scale, symmetric about zero, so that zero lies on one vertical line for every row; each
 * row's end labels say its scale. Pure: no React.
 */
import { scaleLinear } from 'd3-scale';
import type { ShotField } from '@/analysis/fields';
import type { HeadToHead } from '@/analysis/head-to-head';
import { displayUnits, findUnit, fromCanonical, type UnitSystem } from '@/analysis/units';
import { formatNumber, formatSigned } from './chart-format';
import type { PlotBox } from './chart-types';
import { FIELD_LABELS } from './field-labels';

export type DifferenceBarsInput = {
  headToHead: Pick<HeadToHead, 'fields'>;
  /** The fields to show, in order; fields the comparison lacks are left out. */
  fields: readonly ShotField[];
  units: UnitSystem;
  widthPx: number;
};

export type DifferenceRow = {
  field: ShotField;
  label: string;
  /** Display unit as written after a number ('yd', 'mph', '°', 'rpm', ''). */
  unitLabel: string;
  /** Display units. */
  diff: number;
  ciLow: number;
  ciHigh: number;
  /** Half the row's scale (the scale runs −half … +half), display units. */
  halfRange: number;
  /** The interval excludes zero. */
  clear: boolean;
  verdict: 'clear' | 'not yet clear';
  /** "+4.2 yd (95%: +1.1 to +7.3)". */
  valueText: string;
  rangeLabels: [string, string];
  /** Row top, label baseline and bar centre, px. */
  top: number;
  labelY: number;
  barY: number;
  diffX: number;
  lowX: number;
  highX: number;
};

export type DifferenceBarsGeometry = {
  widthPx: number;
  heightPx: number;
  plot: PlotBox;
  zeroX: number;
  rows: DifferenceRow[];
};

export const DIFFERENCE_ROW_PX = 64;
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

/**
 * Everything the forest plot draws, in px: per field (in the given order, those the comparison
 * has) the difference and its 95% interval in the user's units, on a row scale running from
 * −h to +h with h = niceCeil(1.1 × the largest |end|), zero in the middle of every row; clear
 * when the interval excludes zero. O(fields).
 * @throws RangeError when widthPx is not a positive number
 * @example differenceBarsGeometry({ headToHead, fields: ['carry'], units: 'imperial', widthPx: 390 }).rows[0].valueText
 */
export function differenceBarsGeometry(input: DifferenceBarsInput): DifferenceBarsGeometry {
  if (!(input.widthPx > 0) || !Number.isFinite(input.widthPx)) throw new RangeError('differenceBarsGeometry needs a positive width');
  const m = DIFFERENCE_MARGIN;
  const units = displayUnits(input.units);
  const present = input.fields.filter((f) => input.headToHead.fields[f] !== undefined);
  const plot: PlotBox = {
    left: m.left,
    top: m.top,
    right: Math.max(m.left + 40, input.widthPx - m.right),
    bottom: m.top + present.length * DIFFERENCE_ROW_PX,
  };
  const zeroX = (plot.left + plot.right) / 2;
  const rows = present.map((field, i): DifferenceRow => {
    const c = input.headToHead.fields[field]!;
    const unit = units[field];
    const unitLabel = findUnit(unit)?.label ?? unit;
    const toUnit = (v: number) => fromCanonical(v, unit, field);
    const diff = toUnit(c.diff);
    const ciLow = toUnit(Math.min(c.ci95[0], c.ci95[1]));
    const ciHigh = toUnit(Math.max(c.ci95[0], c.ci95[1]));
    const halfRange = niceCeil(1.1 * Math.max(Math.abs(ciLow), Math.abs(ciHigh), Math.abs(diff)));
    const x = scaleLinear().domain([-halfRange, halfRange]).range([plot.left, plot.right]);
    const clear = ciLow > 0 || ciHigh < 0;
    // An interval clear of zero never reads as touching zero: up to two more decimals if needed.
    let dp = differenceDecimals(field);
    const roundsToZero = (v: number, d: number) => Number(Math.abs(v).toFixed(d)) === 0;
    for (let extra = 0; clear && extra < 2 && (roundsToZero(ciLow, dp) || roundsToZero(ciHigh, dp)); extra++) dp++;
    const withUnit = (text: string) => (unitLabel === '' ? text : unitLabel === '°' ? `${text}°` : `${text} ${unitLabel}`);
    const top = plot.top + i * DIFFERENCE_ROW_PX;
    const rangeText = formatNumber(halfRange, halfRange < 1 ? 3 : halfRange % 1 === 0 ? 0 : 1);
    return {
      field,
      label: FIELD_LABELS[field],
      unitLabel,
      diff,
      ciLow,
      ciHigh,
      halfRange,
      clear,
      verdict: clear ? 'clear' : 'not yet clear',
      valueText: `${withUnit(formatSigned(diff, dp))} (95%: ${formatSigned(ciLow, dp)} to ${formatSigned(ciHigh, dp)})`,
      rangeLabels: [withUnit(`\u2212${rangeText}`), withUnit(`+${rangeText}`)],
      top,
      labelY: top + 16,
      barY: top + 34,
      diffX: x(diff),
      lowX: x(ciLow),
      highX: x(ciHigh),
    };
  });
  return { widthPx: input.widthPx, heightPx: plot.bottom + m.bottom, plot, zeroX, rows };
}
