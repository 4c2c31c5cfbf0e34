/**
 * The dispersion plot's numbers: the ground seen from above for one club, x = offline (target
 * line vertical in the middle, left of it to the left), y = carry (downrange up the screen), one
 * px per display unit the same on both axes. Pure: no React.
 */
import { scaleLinear } from 'd3-scale';
import { curveLinearClosed, line } from 'd3-shape';
import { clubInfo } from '@/analysis/clubs';
import { ovalOutline, type GroundPoint, type Oval } from '@/analysis/ovals';
import { fromCanonical, type UnitSystem } from '@/analysis/units';
import { buildColor } from './chart-colors';
import { countWords, distanceUnit, formatNumber } from './chart-format';
import { isMultipleOf, stepForSpacing, ticksEvery } from './chart-ticks';
import type { GridLine, MarkerShape, PlotBox, PlotShot } from './chart-types';
import { markerPath, markerShape } from './marker-path';

/** One build's group of this club, as the session analysis gives it (GroupAnalysis fits). */
export type OvalGroup = { build: string | null; n: number; oval: Oval | null; predictionOval: Oval | null };

export type OvalPlotInput = {
  shots: readonly PlotShot[];
  groups: readonly OvalGroup[];
  units: UnitSystem;
  widthPx: number;
  /** Draw (and fit the domain to) the prediction ovals. Default true. */
  showPrediction?: boolean;
  /** Display names of builds; default the build label itself, "No build" for null. */
  buildLabels?: Readonly<Record<string, string>>;
  /** Plot height limits in px (the plotting area, not the whole chart). */
  minPlotHeightPx?: number;
  maxPlotHeightPx?: number;
};

export type OvalPlotBuild = {
  key: string;
  build: string | null;
  label: string;
  n: number;
  color: string;
  shape: MarkerShape;
};

export type OvalPlotDot = {
  id: string;
  x: number;
  y: number;
  color: string;
  shape: MarkerShape;
  /** Marker outline, closed. */
  path: string;
  stray: boolean;
  dropped: boolean;
};

export type OvalPlotOval = { buildKey: string; kind: 'descriptive' | 'prediction'; color: string; path: string; points: [number, number][] };

export type OvalPlotGeometry = {
  widthPx: number;
  heightPx: number;
  plot: PlotBox;
  unit: 'yd' | 'm';
  /** px per display unit, both axes. */
  pxPerUnit: number;
  /** Display units. */
  domain: { offline: [number, number]; carry: [number, number] };
  targetLineX: number;
  carryLines: GridLine[];
  offlineLines: GridLine[];
  builds: OvalPlotBuild[];
  ovals: OvalPlotOval[];
  dots: OvalPlotDot[];
};

/** Chart margins around the plotting area, px. */
export const OVAL_PLOT_MARGIN = { top: 24, right: 12, bottom: 40, left: 44 } as const;
export const DOT_RADIUS_PX = 4.5;
export const OVAL_SEGMENTS = 72;
/** Domain padding: a share of the data's span and a fixed amount, display units. */
const PAD_SHARE = 0.08;
const PAD_UNITS = 2;
/** Smallest half-width of the offline axis and smallest carry span, display units. */
const MIN_HALF_OFFLINE = 10;
const MIN_CARRY_SPAN = 20;

/** The key of a build in maps and React keys ('' for no build). */
export const buildKey = (build: string | null): string => build ?? '';

/** A build's display name. */
export function buildName(build: string | null, labels?: Readonly<Record<string, string>>): string {
  if (build === null) return labels?.[''] ?? 'No build';
  return labels?.[build] ?? build;
}

/** An oval with every length in display units (angle unchanged). */
function ovalInUnits(oval: Oval, unit: 'yd' | 'm'): Oval {
  const k = fromCanonical(1, unit, 'carry');
  return {
    ...oval,
    centerOffline: oval.centerOffline * k,
    centerCarry: oval.centerCarry * k,
    semiMajor: oval.semiMajor * k,
    semiMinor: oval.semiMinor * k,
    area: oval.area * k * k,
  };
}

/**
 * The half extents of an oval's bounding box: offline sqrt(a²sin²θ + b²cos²θ), carry
 * sqrt(a²cos²θ + b²sin²θ), θ the long axis from the carry axis. O(1).
 * https://en.wikipedia.org/wiki/Ellipse (the ellipse's bounding box)
 * @example ovalHalfExtents({ semiMajor: 10, semiMinor: 4, angleDeg: 0, … }) // => { offline: 4, carry: 10 }
 */
export function ovalHalfExtents(oval: Pick<Oval, 'semiMajor' | 'semiMinor' | 'angleDeg'>): { offline: number; carry: number } {
  const t = (oval.angleDeg * Math.PI) / 180;
  const a = oval.semiMajor;
  const b = oval.semiMinor;
  const s = Math.sin(t);
  const c = Math.cos(t);
  return { offline: Math.sqrt(a * a * s * s + b * b * c * c), carry: Math.sqrt(a * a * c * c + b * b * s * s) };
}

/** The builds in the order of `groups`, then any build only the shots name (first seen). */
function orderBuilds(input: OvalPlotInput): OvalPlotBuild[] {
  const seen = new Map<string, { build: string | null; n: number | null }>();
  for (const g of input.groups) if (!seen.has(buildKey(g.build))) seen.set(buildKey(g.build), { build: g.build, n: g.n });
  const counts = new Map<string, number>();
  for (const s of input.shots) {
    const key = buildKey(s.build);
    counts.set(key, (counts.get(key) ?? 0) + 1);
    if (!seen.has(key)) seen.set(key, { build: s.build, n: null });
  }
  return [...seen.entries()].map(([key, v], i) => ({
    key,
    build: v.build,
    label: buildName(v.build, input.buildLabels),
    n: v.n ?? counts.get(key) ?? 0,
    color: buildColor(i),
    shape: markerShape(i),
  }));
}

const offlineLabel = (v: number): string => (v === 0 ? '0' : `${formatNumber(Math.abs(v))} ${v < 0 ? 'L' : 'R'}`);

/**
 * Everything the dispersion plot draws, in px: equal scale on both axes; the domain fits every
 * shot and every drawn oval with a margin and is centred on the target line; the plot height
 * follows the data's aspect within [minPlotHeightPx, maxPlotHeightPx] (default 200 and
 * clamp(1.3 × width, 360, 640)) — when the data is too tall the offline range widens, when too
 * flat the carry range does, so the scale stays equal. Carry and offline grid lines every 10
 * display units (coarser only when 10 would be under 6 px apart), labels as dense as fits.
 * O(shots + ovals × segments).
 * @throws RangeError when widthPx is not a positive number
 * @example ovalPlotGeometry({ shots, groups, units: 'imperial', widthPx: 390 }).heightPx // => e.g. 412
 */
export function ovalPlotGeometry(input: OvalPlotInput): OvalPlotGeometry {
  if (!(input.widthPx > 0) || !Number.isFinite(input.widthPx)) throw new RangeError('ovalPlotGeometry needs a positive width');
  const unit = distanceUnit(input.units);
  const k = fromCanonical(1, unit, 'carry');
  const showPrediction = input.showPrediction ?? true;
  const builds = orderBuilds(input);
  const byKey = new Map(builds.map((b) => [b.key, b]));

  const drawn: { buildKey: string; kind: 'descriptive' | 'prediction'; oval: Oval }[] = [];
  for (const g of input.groups) {
    if (g.oval) drawn.push({ buildKey: buildKey(g.build), kind: 'descriptive', oval: ovalInUnits(g.oval, unit) });
    if (showPrediction && g.predictionOval) drawn.push({ buildKey: buildKey(g.build), kind: 'prediction', oval: ovalInUnits(g.predictionOval, unit) });
  }

  // Data extents in display units.
  let maxAbsX = 0;
  let yLo = Infinity;
  let yHi = -Infinity;
  for (const s of input.shots) {
    if (!Number.isFinite(s.carry) || !Number.isFinite(s.offline)) continue;
    maxAbsX = Math.max(maxAbsX, Math.abs(s.offline * k));
    yLo = Math.min(yLo, s.carry * k);
    yHi = Math.max(yHi, s.carry * k);
  }
  for (const d of drawn) {
    const e = ovalHalfExtents(d.oval);
    maxAbsX = Math.max(maxAbsX, Math.abs(d.oval.centerOffline) + e.offline);
    yLo = Math.min(yLo, d.oval.centerCarry - e.carry);
    yHi = Math.max(yHi, d.oval.centerCarry + e.carry);
  }
  if (!(yHi >= yLo)) {
    yLo = 0;
    yHi = MIN_CARRY_SPAN;
  }
  let halfX = Math.max(MIN_HALF_OFFLINE, maxAbsX * (1 + PAD_SHARE) + PAD_UNITS);
  const spanY = yHi - yLo;
  yLo -= spanY * PAD_SHARE + PAD_UNITS;
  yHi += spanY * PAD_SHARE + PAD_UNITS;
  if (yHi - yLo < MIN_CARRY_SPAN) {
    const mid = (yLo + yHi) / 2;
    yLo = mid - MIN_CARRY_SPAN / 2;
    yHi = mid + MIN_CARRY_SPAN / 2;
  }

  // Equal aspect within the height limits.
  const m = OVAL_PLOT_MARGIN;
  const plotW = Math.max(1, input.widthPx - m.left - m.right);
  const minH = input.minPlotHeightPx ?? 200;
  const maxH = Math.max(minH, input.maxPlotHeightPx ?? Math.min(640, Math.max(360, 1.3 * input.widthPx)));
  let px = plotW / (2 * halfX);
  let plotH = (yHi - yLo) * px;
  if (plotH > maxH) {
    px = maxH / (yHi - yLo);
    halfX = plotW / (2 * px);
    plotH = maxH;
  } else if (plotH < minH) {
    const mid = (yLo + yHi) / 2;
    const half = minH / px / 2;
    yLo = mid - half;
    yHi = mid + half;
    plotH = minH;
  }
  const plot: PlotBox = { left: m.left, top: m.top, right: m.left + plotW, bottom: m.top + plotH };
  const x = scaleLinear().domain([-halfX, halfX]).range([plot.left, plot.right]);
  const y = scaleLinear().domain([yLo, yHi]).range([plot.bottom, plot.top]);

  const gridStep = stepForSpacing(px, 6);
  const carryLabelStep = stepForSpacing(px, 18);
  const offlineLabelStep = stepForSpacing(px, 40);
  const carryLines = ticksEvery(yLo, yHi, gridStep).map((v) => ({
    value: v,
    px: y(v),
    label: isMultipleOf(v, carryLabelStep) ? formatNumber(v) : null,
  }));
  const offlineLines = ticksEvery(-halfX, halfX, gridStep).map((v) => ({
    value: v,
    px: x(v),
    label: isMultipleOf(v, offlineLabelStep) ? offlineLabel(v) : null,
  }));

  const toPath = line<GroundPoint>()
    .x((p) => x(p.offline))
    .y((p) => y(p.carry))
    .curve(curveLinearClosed)
    .digits(2);
  const ovals: OvalPlotOval[] = drawn.map((d) => {
    const outline = ovalOutline(d.oval, OVAL_SEGMENTS);
    return {
      buildKey: d.buildKey,
      kind: d.kind,
      color: byKey.get(d.buildKey)!.color,
      path: toPath(outline) ?? '',
      points: outline.map((p) => [x(p.offline), y(p.carry)] as [number, number]),
    };
  });

  const dots: OvalPlotDot[] = [];
  for (const s of input.shots) {
    if (!Number.isFinite(s.carry) || !Number.isFinite(s.offline)) continue;
    const b = byKey.get(buildKey(s.build))!;
    const cx = x(s.offline * k);
    const cy = y(s.carry * k);
    dots.push({
      id: s.id,
      x: cx,
      y: cy,
      color: b.color,
      shape: b.shape,
      path: markerPath(b.shape, cx, cy, DOT_RADIUS_PX),
      stray: s.stray,
      dropped: s.decision === 'drop',
    });
  }

  return {
    widthPx: input.widthPx,
    heightPx: plot.bottom + m.bottom,
    plot,
    unit,
    pxPerUnit: px,
    domain: { offline: [-halfX, halfX], carry: [yLo, yHi] },
    targetLineX: x(0),
    carryLines,
    offlineLines,
    builds,
    ovals,
    dots,
  };
}

/**
 * The plot's spoken summary: "7 iron: 20 shots, two builds" (and the strays and dropped shots
 * when there are any). O(shots).
 * @example ovalPlotSummary('7I', shots, 2) // => '7 iron: 20 shots, two builds, 1 stray'
 */
export function ovalPlotSummary(club: string, shots: readonly Pick<PlotShot, 'stray' | 'decision'>[], buildCount: number): string {
  const name = clubInfo(club)?.label ?? club;
  const strays = shots.filter((s) => s.stray).length;
  const dropped = shots.filter((s) => s.decision === 'drop').length;
  const parts = [`${shots.length} ${shots.length === 1 ? 'shot' : 'shots'}`, countWords(buildCount, 'build')];
  if (strays > 0) parts.push(`${strays} ${strays === 1 ? 'stray' : 'strays'}`);
  if (dropped > 0) parts.push(`${dropped} dropped`);
  return `${name}: ${parts.join(', ')}`;
}
