/**
 * The launch window plot's numbers: x = spin rate (rpm), y = launch angle (deg); the window of
 * launches within the optimiser's share of the best carry, the best launch, and a club's shots.
 * Pure: no React.
 */
import { scaleLinear } from 'd3-scale';
import { curveLinearClosed, line } from 'd3-shape';
import type { LaunchOptimum } from '@/analysis/flight';
import { fromCanonical, type UnitSystem } from '@/analysis/units';
import { distanceUnit, formatNumber, formatThousands } from './chart-format';
import type { GridLine, LaunchPoint, PlotBox } from './chart-types';

export type LaunchWindowInput = {
  /** The window to draw; null for a club without one (a wedge): the shots alone. */
  optimum: Pick<LaunchOptimum, 'best' | 'window' | 'objective'> | null;
  points: readonly LaunchPoint[];
  units: UnitSystem;
  widthPx: number;
};

export type LaunchWindowGeometry = {
  widthPx: number;
  heightPx: number;
  plot: PlotBox;
  domain: { spinRpm: [number, number]; launchDeg: [number, number] };
  spinTicks: GridLine[];
  launchTicks: GridLine[];
  /** The window's outline, closed; null when the window is empty. */
  windowPath: string | null;
  windowPoints: [number, number][];
  best: { x: number; y: number; label: string } | null;
  dots: { key: string; x: number; y: number }[];
};

export const LAUNCH_MARGIN = { top: 28, right: 24, bottom: 40, left: 40 } as const;

/**
 * Everything the launch window plot draws, in px. The domain holds the whole window outline
 * (tips included: it is never cut at the plot's edge), the best launch and every finite point,
 * with 8% padding, rounded out to d3's nice ticks; the height is clamp(0.62 × width, 240, 420).
 * O(window rows + points).
 * @throws RangeError when widthPx is not a positive number
 * @example launchWindowGeometry({ optimum: optimiseLaunch(74.65), points, units: 'imperial', widthPx: 390 }).best.label
 */
export function launchWindowGeometry(input: LaunchWindowInput): LaunchWindowGeometry {
  if (!(input.widthPx > 0) || !Number.isFinite(input.widthPx)) throw new RangeError('launchWindowGeometry needs a positive width');
  const best = input.optimum?.best ?? null;
  const polygon = input.optimum?.window.polygon ?? [];
  const points = input.points.filter((p) => Number.isFinite(p.launchAngleDeg) && Number.isFinite(p.spinRateRpm));
  const spins: number[] = [];
  const launches: number[] = [];
  for (const p of [...(best ? [best] : []), ...polygon, ...points]) {
    spins.push(p.spinRateRpm);
    launches.push(p.launchAngleDeg);
  }
  if (spins.length === 0) {
    spins.push(2000, 6000);
    launches.push(10, 20);
  }
  const padded = (values: number[], minSpan: number): [number, number] => {
    let lo = Infinity;
    let hi = -Infinity;
    for (const v of values) {
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
    const span = Math.max(hi - lo, minSpan);
    const mid = (lo + hi) / 2;
    return [mid - span * 0.54, mid + span * 0.54];
  };
  const m = LAUNCH_MARGIN;
  const heightPx = Math.round(Math.min(420, Math.max(240, 0.62 * input.widthPx)));
  const plot: PlotBox = { left: m.left, top: m.top, right: Math.max(m.left + 40, input.widthPx - m.right), bottom: heightPx - m.bottom };
  const spinTickCount = input.widthPx < 500 ? 4 : 8;
  const x = scaleLinear().domain(padded(spins, 1000)).range([plot.left, plot.right]).nice(spinTickCount);
  const y = scaleLinear().domain(padded(launches, 4)).range([plot.bottom, plot.top]).nice(5);
  const windowPoints = polygon.map((p) => [x(p.spinRateRpm), y(p.launchAngleDeg)] as [number, number]);
  const toPath = line().curve(curveLinearClosed).digits(2);
  const unit = distanceUnit(input.units);
  const aim = input.optimum?.objective === 'total' ? 'total' : 'carry';
  return {
    widthPx: input.widthPx,
    heightPx,
    plot,
    domain: { spinRpm: x.domain() as [number, number], launchDeg: y.domain() as [number, number] },
    spinTicks: x.ticks(spinTickCount).map((v) => ({ value: v, px: x(v), label: formatThousands(v) })),
    launchTicks: y.ticks(5).map((v) => ({ value: v, px: y(v), label: `${formatNumber(v, Number.isInteger(v) ? 0 : 1)}°` })),
    windowPath: windowPoints.length >= 3 ? toPath(windowPoints) : null,
    windowPoints,
    best: best
      ? {
          x: x(best.spinRateRpm),
          y: y(best.launchAngleDeg),
          label: `Best ${formatNumber(best.launchAngleDeg, 1)}°, ${formatThousands(best.spinRateRpm)} rpm, ${formatNumber(fromCanonical(aim === 'total' ? best.totalM : best.carryM, unit, 'carry'))} ${unit} ${aim}`,
        }
      : null,
    dots: points.map((p, i) => ({ key: p.id ?? String(i), x: x(p.spinRateRpm), y: y(p.launchAngleDeg) })),
  };
}

/**
 * Whether a point lies inside a closed polygon (even–odd ray casting). O(vertices).
 * https://en.wikipedia.org/wiki/Point_in_polygon
 */
export function insidePolygon(px: number, py: number, polygon: readonly (readonly [number, number])[]): boolean {
  let inside = false;
  for (let i = 0, j = polygon.length - 1; i < polygon.length; j = i++) {
    const [xi, yi] = polygon[i];
    const [xj, yj] = polygon[j];
    if (yi > py !== yj > py && px < ((xj - xi) * (py - yi)) / (yj - yi) + xi) inside = !inside;
  }
  return inside;
}
