import { View } from 'react-native';
import Svg, { Circle, G, Line, Path, Text as SvgText } from 'react-native-svg';
import type { LaunchOptimum } from '@/analysis/flight';
import type { UnitSystem } from '@/analysis/units';
import { colors, fonts } from '@/components/theme';
import { chartColors } from './chart-colors';
import { ChartLegend } from './chart-legend';
import type { LaunchPoint } from './chart-types';
import { launchWindowGeometry } from './launch-window-plot-geometry';

export type LaunchWindowPlotProps = {
  /** From launchWindowForClub / optimiseLaunch for the club's ball speed; null: shots only (a wedge). */
  optimum: Pick<LaunchOptimum, 'best' | 'window' | 'objective'> | null;
  /** The player's shots of one club: launch angle and spin rate. */
  points: readonly LaunchPoint[];
  units: UnitSystem;
  /** The chart's width in px (measure it with onLayout). */
  widthPx: number;
  /** Share of the best the window holds, for the legend; default 1 (%). */
  withinPct?: number;
};

const small = { fontFamily: fonts.regular, fontSize: 11, fill: chartColors.axisText } as const;

/** Launch angle against spin rate: the window near the best carry or total, the best launch, the shots. */
export function LaunchWindowPlot({ optimum, points, units, widthPx, withinPct = 1 }: LaunchWindowPlotProps) {
  const g = launchWindowGeometry({ optimum, points, units, widthPx });
  const { plot, best } = g;
  const shotsText = `${points.length} ${points.length === 1 ? 'shot' : 'shots'} plotted`;
  const summary = best ? `Launch window: ${best.label}; ${shotsText}` : `Launch and spin: ${shotsText}`;
  const aim = optimum?.objective === 'total' ? 'total' : 'carry';
  return (
    <View accessible accessibilityRole="image" accessibilityLabel={summary}>
      <Svg width={g.widthPx} height={g.heightPx}>
        {g.spinTicks.map((t) => (
          <G key={`s${t.value}`}>
            <Line x1={t.px} x2={t.px} y1={plot.top} y2={plot.bottom} stroke={chartColors.grid} strokeWidth={0.75} />
            <SvgText {...small} x={t.px} y={plot.bottom + 14} textAnchor="middle">{t.label}</SvgText>
          </G>
        ))}
        {g.launchTicks.map((t) => (
          <G key={`l${t.value}`}>
            <Line x1={plot.left} x2={plot.right} y1={t.px} y2={t.px} stroke={chartColors.grid} strokeWidth={0.75} />
            <SvgText {...small} x={plot.left - 6} y={t.px + 4} textAnchor="end">{t.label}</SvgText>
          </G>
        ))}
        <SvgText {...small} x={(plot.left + plot.right) / 2} y={plot.bottom + 32} textAnchor="middle">Spin rate (rpm)</SvgText>
        <SvgText {...small} x={4} y={plot.top - 12}>Launch angle (°)</SvgText>
        {g.windowPath ? <Path d={g.windowPath} fill={chartColors.windowSoft} fillOpacity={0.8} stroke={chartColors.window} strokeWidth={1.5} /> : null}
        {g.dots.map((d) => (
          <Circle key={d.key} testID="launch-dot" cx={d.x} cy={d.y} r={4} fill={chartColors.points} fillOpacity={0.7} />
        ))}
        {best ? (
          <G>
            <Path d={`M${best.x - 7},${best.y}H${best.x + 7}M${best.x},${best.y - 7}V${best.y + 7}`} stroke={chartColors.best} strokeWidth={3} />
            <Circle cx={best.x} cy={best.y} r={9} fill="none" stroke={chartColors.best} strokeWidth={1.5} />
          </G>
        ) : null}
      </Svg>
      <ChartLegend
        items={[
          ...(best
            ? [
                { key: 'window', label: `Within ${withinPct}% of the best ${aim}`, color: chartColors.window, shape: 'square' as const },
                { key: 'best', label: best.label, color: chartColors.best },
              ]
            : []),
          { key: 'shots', label: 'Shots', color: colors.ink },
        ]}
      />
    </View>
  );
}
