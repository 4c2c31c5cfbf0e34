import { View } from 'react-native';
import Svg, { Circle, G, Line, Rect, Text as SvgText } from 'react-native-svg';
import type { ShotField } from '@/analysis/fields';
import type { HeadToHead } from '@/analysis/head-to-head';
import type { UnitSystem } from '@/analysis/units';
import { fonts } from '@/components/theme';
import { chartColors } from './chart-colors';
import { countWords } from './chart-format';
import { differenceBarsGeometry } from './difference-bars-geometry';

export type DifferenceBarsProps = {
  /** SessionAnalysis.headToHead (or compareBuilds' result). */
  headToHead: Pick<HeadToHead, 'fields'> & Partial<Pick<HeadToHead, 'spread'>>;
  /** The fields to show, in order, e.g. ['carry', 'offline', 'ballSpeed', 'spinRate']. */
  fields: readonly ShotField[];
  /** The fields whose spread to show after them, e.g. ['offline', 'carry']. */
  spreadFields?: readonly ShotField[];
  /** Display names of builds A and B. */
  labelA: string;
  labelB: string;
  units: UnitSystem;
  /** The chart's width in px (measure it with onLayout). */
  widthPx: number;
};

const small = { fontFamily: fonts.regular, fontSize: 11, fill: chartColors.axisText } as const;

/**
 * A forest plot of A − B per field with 95% intervals, the margin as a shaded band around zero
 * and the analysis's verdict in words; clear differences drawn in ink.
 */
export function DifferenceBars({ headToHead, fields, spreadFields, labelA, labelB, units, widthPx }: DifferenceBarsProps) {
  const g = differenceBarsGeometry({ headToHead, fields, spreadFields, units, widthPx });
  const { plot } = g;
  const count = (v: string) => g.rows.filter((r) => r.verdict === v).length;
  const summary = `${labelA} minus ${labelB}: ${countWords(g.rows.length, 'row')}, ${count('clear')} clear, ${count('equivalent')} equivalent, ${count('unclear')} not yet clear`;
  return (
    <View accessible accessibilityRole="image" accessibilityLabel={summary}>
      <Svg width={g.widthPx} height={g.heightPx}>
        <SvgText {...small} x={plot.left} y={14}>{`\u2190 more for ${labelB}`}</SvgText>
        <SvgText {...small} x={plot.right} y={14} textAnchor="end">{`more for ${labelA} \u2192`}</SvgText>
        {g.rows.map((r) => {
          const strong = r.verdict === 'clear';
          const color = strong ? chartColors.clear : chartColors.unclear;
          return (
            <G key={`${r.kind}-${r.field}`} testID="difference-row">
              <Line x1={plot.left} x2={plot.right} y1={r.top} y2={r.top} stroke={chartColors.grid} strokeWidth={0.5} />
              <SvgText fontFamily={fonts.semibold} fontSize={13} fill={chartColors.text} x={plot.left} y={r.labelY}>{r.label}</SvgText>
              <SvgText fontFamily={strong ? fonts.semibold : fonts.regular} fontSize={12} fill={color} x={plot.right} y={r.labelY} textAnchor="end">{r.verdictText}</SvgText>
              <SvgText {...small} fill={chartColors.text} x={plot.left} y={r.valueY}>{r.valueText}</SvgText>
              <Rect x={r.marginLowX} y={r.barY - 10} width={Math.max(1, r.marginHighX - r.marginLowX)} height={20} fill={chartColors.windowSoft} />
              <Line x1={g.zeroX} x2={g.zeroX} y1={r.barY - 12} y2={r.barY + 12} stroke={chartColors.targetLine} strokeWidth={1} />
              <Line x1={r.lowX} x2={r.highX} y1={r.barY} y2={r.barY} stroke={color} strokeWidth={strong ? 3 : 2} />
              <Line x1={r.lowX} x2={r.lowX} y1={r.barY - 6} y2={r.barY + 6} stroke={color} strokeWidth={2} />
              <Line x1={r.highX} x2={r.highX} y1={r.barY - 6} y2={r.barY + 6} stroke={color} strokeWidth={2} />
              <Circle cx={r.diffX} cy={r.barY} r={5} fill={strong ? color : chartColors.background} stroke={color} strokeWidth={2} />
              <SvgText {...small} x={plot.left} y={r.barY + 24}>{r.rangeLabels[0]}</SvgText>
              <SvgText {...small} x={g.zeroX} y={r.barY + 24} textAnchor="middle">0</SvgText>
              <SvgText {...small} x={plot.right} y={r.barY + 24} textAnchor="end">{r.rangeLabels[1]}</SvgText>
            </G>
          );
        })}
      </Svg>
    </View>
  );
}
