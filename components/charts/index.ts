// The charts: components and their pure geometry. The only entry of components/charts.
export { OvalPlot } from './oval-plot';
export type { OvalPlotProps } from './oval-plot';
export { LadderChart } from './ladder-chart';
export type { LadderChartProps } from './ladder-chart';
export { LaunchWindowPlot } from './launch-window-plot';
export type { LaunchWindowPlotProps } from './launch-window-plot';
export { DifferenceBars } from './difference-bars';
export type { DifferenceBarsProps } from './difference-bars';
export { ChartLegend } from './chart-legend';
export type { LegendItem } from './chart-legend';

export { ovalPlotGeometry, ovalPlotSummary, ovalHalfExtents, buildKey, buildName } from './oval-plot-geometry';
export type { OvalGroup, OvalPlotGeometry, OvalPlotInput } from './oval-plot-geometry';
export { ladderChartGeometry, gapFlagWord, ladderClubLabel, GAP_FLAG_WORDS, LOFT_FLAG_WORDS } from './ladder-chart-geometry';
export type { LadderGeometry } from './ladder-chart-geometry';
export { launchWindowGeometry, insidePolygon } from './launch-window-plot-geometry';
export type { LaunchWindowGeometry } from './launch-window-plot-geometry';
export { differenceBarsGeometry, niceCeil } from './difference-bars-geometry';
export type { DifferenceBarsGeometry, DifferenceRow } from './difference-bars-geometry';
export { BUILD_COLORS, buildColor, chartColors } from './chart-colors';
export { FIELD_LABELS } from './field-labels';
export type { LaunchPoint, PlotShot } from './chart-types';
