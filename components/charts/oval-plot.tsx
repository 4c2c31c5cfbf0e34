import { View } from 'react-native';
import Svg, { Circle, G, Line, Path, Text as SvgText } from 'react-native-svg';
import type { UnitSystem } from '@/analysis/units';
import { colors, fonts } from '@/components/theme';
import { chartColors, DROPPED_OPACITY, OVAL_FILL_OPACITY } from './chart-colors';
import { ChartLegend, type LegendItem } from './chart-legend';
import type { PlotShot } from './chart-types';
import { DOT_RADIUS_PX, ovalPlotGeometry, ovalPlotSummary, type OvalGroup } from './oval-plot-geometry';

export type OvalPlotProps = {
  /** Canonical club code of the shots, e.g. '7I'. */
  club: string;
  /** The shots of this club (every build), metres, offline + right. */
  shots: readonly PlotShot[];
  /** This club's groups from the session analysis (GroupAnalysis fits): one per build, in legend order. */
  groups: readonly OvalGroup[];
  units: UnitSystem;
  /** The chart's width in px (measure it with onLayout); the height follows the data. */
  widthPx: number;
  /** Draw the prediction ovals (dashed). Default true. */
  showPrediction?: boolean;
  /** Display names of builds keyed by build label ('' for no build). */
  buildLabels?: Readonly<Record<string, string>>;
  selectedShotId?: string | null;
  onSelectShot?: (id: string) => void;
};

const HIT_RADIUS_PX = 9;
const label = { fontFamily: fonts.regular, fontSize: 11, fill: chartColors.axisText } as const;

/** The ground from above for one club: shots by build, ovals, the target line and a carry grid. */
export function OvalPlot({ club, shots, groups, units, widthPx, showPrediction = true, buildLabels, selectedShotId, onSelectShot }: OvalPlotProps) {
  const g = ovalPlotGeometry({ shots, groups, units, widthPx, showPrediction, buildLabels });
  const { plot } = g;
  const legend: LegendItem[] = [
    ...g.builds.map((b) => ({ key: `b-${b.key}`, label: `${b.label} (n ${b.n})`, color: b.color, shape: b.shape })),
    { key: 'stray', label: 'Stray', color: colors.textMuted, hollow: true },
    { key: 'dropped', label: 'Dropped', color: colors.textMuted, faded: true },
  ];
  if (showPrediction && g.ovals.some((o) => o.kind === 'prediction')) {
    legend.push({ key: 'prediction', label: 'Next-shot oval', color: colors.textMuted, dashed: true });
  }
  return (
    <View accessible accessibilityRole="image" accessibilityLabel={ovalPlotSummary(club, shots, g.builds.length)}>
      <Svg width={g.widthPx} height={g.heightPx}>
        {g.carryLines.map((l) => (
          <G key={`c${l.value}`}>
            <Line x1={plot.left} x2={plot.right} y1={l.px} y2={l.px} stroke={chartColors.grid} strokeWidth={l.label ? 1 : 0.5} />
            {l.label ? <SvgText {...label} x={plot.left - 6} y={l.px + 4} textAnchor="end">{l.label}</SvgText> : null}
          </G>
        ))}
        {g.offlineLines.map((l) => (
          <G key={`o${l.value}`}>
            {l.value !== 0 ? <Line x1={l.px} x2={l.px} y1={plot.top} y2={plot.bottom} stroke={chartColors.grid} strokeWidth={0.5} /> : null}
            {l.label ? <SvgText {...label} x={l.px} y={plot.bottom + 14} textAnchor="middle">{l.label}</SvgText> : null}
          </G>
        ))}
        <Line x1={g.targetLineX} x2={g.targetLineX} y1={plot.top} y2={plot.bottom} stroke={chartColors.targetLine} strokeWidth={1.5} />
        <SvgText {...label} x={4} y={plot.top - 10}>{`Carry (${g.unit})`}</SvgText>
        <SvgText {...label} x={(plot.left + plot.right) / 2} y={plot.bottom + 32} textAnchor="middle">{`Offline (${g.unit}), target line in the middle`}</SvgText>
        {g.ovals.map((o) =>
          o.kind === 'descriptive' ? (
            <Path key={`d-${o.buildKey}`} d={o.path} fill={o.color} fillOpacity={OVAL_FILL_OPACITY} stroke={o.color} strokeWidth={1.5} />
          ) : (
            <Path key={`p-${o.buildKey}`} d={o.path} fill="none" stroke={o.color} strokeWidth={1.25} strokeDasharray="6 4" />
          ),
        )}
        {g.dots.map((d) => (
          <G key={d.id} testID="shot-dot" opacity={d.dropped ? DROPPED_OPACITY : 1} onPress={onSelectShot ? () => onSelectShot(d.id) : undefined}>
            {d.id === selectedShotId ? <Circle cx={d.x} cy={d.y} r={DOT_RADIUS_PX + 4} fill="none" stroke={chartColors.selection} strokeWidth={2} /> : null}
            <Path d={d.path} fill={d.stray ? colors.surface : d.color} stroke={d.color} strokeWidth={1.5} />
            {onSelectShot ? <Circle cx={d.x} cy={d.y} r={HIT_RADIUS_PX} fill="transparent" /> : null}
          </G>
        ))}
      </Svg>
      <ChartLegend items={legend} />
    </View>
  );
}
