/**
 * The ladder chart's numbers. Layout: clubs top to bottom in bag order (longest first) on every
 * screen width, carry along x. Why one orientation: the carry axis reads left to right like a
 * distance, club names stay horizontal and readable, the gap between two neighbours sits
 * between their rows, and the chart only grows in height with the number of clubs (14 at
 * most), which a phone scrolls easily. Pure: no React.
 */
import { scaleLinear } from 'd3-scale';
import { clubInfo } from '@/analysis/clubs';
import type { GapFlag, LadderRung, LoftStepFlag } from '@/analysis/ladder';
import { fromCanonical, type UnitSystem } from '@/analysis/units';
import { distanceUnit, formatNumber, formatSigned } from './chart-format';
import { isMultipleOf, stepForSpacing, ticksEvery } from './chart-ticks';
import type { GridLine, PlotBox } from './chart-types';

export type LadderChartInput = { rungs: readonly LadderRung[]; units: UnitSystem; widthPx: number };

export type LadderRow = {
  club: string;
  label: string;
  /** Row centre, px. */
  y: number;
  medianX: number;
  q1X: number;
  q3X: number;
  medianLabel: string;
  n: number;
};

export type LadderGap = {
  /** The two clubs, longer first. */
  from: string;
  to: string;
  /** Ends of the bracket (the two row centres) and the label's baseline, px. */
  y1: number;
  y2: number;
  labelY: number;
  /** "12 yd" or "5 yd · tight". */
  text: string;
  flag: GapFlag;
  /** "4° loft" or "8° loft · wide"; "clubs skipped" when the two are not neighbours (a club between was not hit); null otherwise. */
  loftText: string | null;
  /** The two clubs are neighbours (gaps are flagged only between neighbours). */
  neighbours: boolean;
  loftFlag: LoftStepFlag;
};

export type LadderGeometry = {
  widthPx: number;
  heightPx: number;
  plot: PlotBox;
  unit: 'yd' | 'm';
  domain: [number, number];
  /** x of the gap column's bracket. */
  gapColumnX: number;
  carryLines: GridLine[];
  rows: LadderRow[];
  gaps: LadderGap[];
};

export const LADDER_ROW_PX = 44;
export const LADDER_MARGIN = { top: 8, bottom: 36, labelColumn: 64, gapColumn: 112, right: 4 } as const;

/** The word that goes with a carry-gap flag, so a flag is never told by colour alone. */
export const GAP_FLAG_WORDS: Readonly<Record<Exclude<GapFlag, null>, string>> = {
  tight: 'tight',
  wide: 'wide',
  reversed: 'reversed',
};

/** The word that goes with a loft-step flag. */
export const LOFT_FLAG_WORDS: Readonly<Record<Exclude<LoftStepFlag, null>, string>> = {
  tight: 'tight',
  wide: 'wide',
};

/** The word for a carry-gap flag, or null for a gap that is fine. */
export function gapFlagWord(flag: GapFlag): string | null {
  return flag === null ? null : GAP_FLAG_WORDS[flag];
}

/**
 * A club's full name for a chart row: "Driver", "3 wood", "7 iron", "Pitching wedge", "56° wedge"
 * (an unknown code as written). O(1).
 * @example ladderClubLabel('PW') // => 'Pitching wedge'
 */
export function ladderClubLabel(code: string): string {
  return clubInfo(code)?.label ?? code;
}

/** Width per character of the 13 px row labels, a little over Inter's average (px). */
const LABEL_CHAR_PX = 7;

/** The label column: wide enough for the longest club name of the ladder (at least the margin's). */
function labelColumnPx(labels: readonly string[]): number {
  let chars = 0;
  for (const l of labels) chars = Math.max(chars, l.length);
  return Math.max(LADDER_MARGIN.labelColumn, Math.ceil(chars * LABEL_CHAR_PX) + 10);
}

/**
 * Everything the ladder draws, in px: per club a row with the q1–q3 bar and the median, and
 * between each pair of neighbours a bracket with the gap in display units and its flag word;
 * loft steps under it where known. Carry grid every 10 display units (coarser when too dense).
 * O(rungs).
 * @throws RangeError when widthPx is not a positive number
 * @example ladderChartGeometry({ rungs, units: 'metric', widthPx: 390 }).gaps[0].text // => '12 m'
 */
export function ladderChartGeometry(input: LadderChartInput): LadderGeometry {
  if (!(input.widthPx > 0) || !Number.isFinite(input.widthPx)) throw new RangeError('ladderChartGeometry needs a positive width');
  const unit = distanceUnit(input.units);
  const d = (m: number) => fromCanonical(m, unit, 'carry');
  const m = LADDER_MARGIN;
  const labels = input.rungs.map((r) => ladderClubLabel(r.club));
  const labelColumn = labelColumnPx(labels);
  const plot: PlotBox = {
    left: labelColumn,
    top: m.top,
    right: Math.max(labelColumn + 40, input.widthPx - m.gapColumn - m.right),
    bottom: m.top + Math.max(1, input.rungs.length) * LADDER_ROW_PX,
  };
  let lo = Infinity;
  let hi = -Infinity;
  for (const r of input.rungs) {
    lo = Math.min(lo, d(r.carryQ1M), d(r.carryMedianM));
    hi = Math.max(hi, d(r.carryQ3M), d(r.carryMedianM));
  }
  if (!(hi >= lo)) {
    lo = 0;
    hi = 100;
  }
  const pad = (hi - lo) * 0.05 + 5;
  const domain: [number, number] = [lo - pad, hi + pad];
  const x = scaleLinear().domain(domain).range([plot.left, plot.right]);
  const pxPerUnit = (plot.right - plot.left) / (domain[1] - domain[0]);
  const gridStep = stepForSpacing(pxPerUnit, 6);
  const labelStep = stepForSpacing(pxPerUnit, 32);
  const carryLines = ticksEvery(domain[0], domain[1], gridStep).map((v) => ({
    value: v,
    px: x(v),
    label: isMultipleOf(v, labelStep) ? formatNumber(v) : null,
  }));
  const rowY = (i: number) => plot.top + (i + 0.5) * LADDER_ROW_PX;
  const rows: LadderRow[] = input.rungs.map((r, i) => ({
    club: r.club,
    label: labels[i],
    y: rowY(i),
    medianX: x(d(r.carryMedianM)),
    q1X: x(d(r.carryQ1M)),
    q3X: x(d(r.carryQ3M)),
    medianLabel: formatNumber(d(r.carryMedianM)),
    n: r.n,
  }));
  const gaps: LadderGap[] = [];
  for (let i = 0; i + 1 < input.rungs.length; i++) {
    const r = input.rungs[i];
    if (r.gapToNextM === null) continue;
    const word = gapFlagWord(r.gapFlag);
    const gapText = `${formatNumber(d(r.gapToNextM))} ${unit}`;
    const loftWord = r.loftStepFlag === null ? null : LOFT_FLAG_WORDS[r.loftStepFlag];
    const neighbours = r.neighbourToNext !== false;
    const loftText = !neighbours
      ? 'clubs skipped'
      : r.loftStepToNextDeg === null
        ? null
        : `${formatSigned(r.loftStepToNextDeg, Number.isInteger(r.loftStepToNextDeg) ? 0 : 1)}° loft${loftWord ? ` · ${loftWord}` : ''}`;
    const boundary = plot.top + (i + 1) * LADDER_ROW_PX;
    gaps.push({
      from: r.club,
      to: input.rungs[i + 1].club,
      y1: rowY(i),
      y2: rowY(i + 1),
      labelY: loftText ? boundary - 1 : boundary + 4,
      text: word ? `${gapText} · ${word}` : gapText,
      flag: r.gapFlag,
      loftText,
      loftFlag: r.loftStepFlag,
      neighbours,
    });
  }
  return {
    widthPx: input.widthPx,
    heightPx: plot.bottom + m.bottom,
    plot,
    unit,
    domain,
    gapColumnX: plot.right + 10,
    carryLines,
    rows,
    gaps,
  };
}
