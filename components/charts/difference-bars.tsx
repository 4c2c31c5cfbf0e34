import { View } from 'react-native';
import Svg, { Circle, G, Line, Text as SvgText } from 'react-native-svg';
import type { ShotField } from '@/analysis/fields';
import type { HeadToHead } from '@/analysis/head-to-head';
import type { UnitSystem } from '@/analysis/units';
import { fonts } from '@/components/theme';
import { chartColors } from './chart-colors';
import { countWords } from './chart-format';
import { differenceBarsGeometry } from './difference-bars-geometry';

export type DifferenceBarsProps = {
  /** SessionAnalysis.headToHead (or compareBuilds' result). */
  headToHead: Pick<HeadToHead, 'fields'>;
  /** The fields to show, in order, e.g. ['carry', 'offline', 'ballSpeed', 'spinRate']. */
  fields: readonly ShotField[];
  /** Display names of builds A and B. */
  labelA: string;
  labelB: string;
  units: UnitSystem;
  /** The chart's width in px (measure it with onLayout). */
  widthPx: number;
};

const small = { fontFamily: fonts.regular, fontSize: 11, fill: chartColors.axisText } as const;

/** A forest plot of A − B per field with 95% intervals; intervals clear of zero drawn in ink. */
export function DifferenceBars({ headToHead, fields, labelA, labelB, units, widthPx }: DifferenceBarsProps) {
  const g = differenceBarsGeometry({ headToHead, fields, units, widthPx });
  const { plot } = g;
  const clear = g.rows.filter((r) => r.clear).length;
  const summary = `${labelA} minus ${labelB}: ${countWords(g.rows.length, 'field')}, ${clear} clear of zero`;
  return (
    <View accessible accessibilityRole="image" accessibilityLabel={summary}>
      <Svg width={g.widthPx} height={g.heightPx}>
        <SvgText {...small} x={plot.left} y={14}>{`\u2190 more for ${labelB}`}</SvgText>
        <SvgText {...small} x={plot.right} y={14} textAnchor="end">{`more for ${labelA} \u2192`}</SvgText>
        {g.rows.map((r) => {
          const color = r.clear ? chartColors.clear : chartColors.unclear;
          return (
            <G key={r.field} testID="difference-row">
              <Line x1={plot.left} x2={plot.right} y1={r.top} y2={r.top} stroke={chartColors.grid} strokeWidth={0.5} />
              <SvgText fontFamily={fonts.semibold} fontSize={13} fill={chartColors.text} x={plot.left} y={r.labelY}>{r.label}</SvgText>
              <SvgText fontFamily={r.clear ? fonts.semibold : fonts.regular} fontSize={12} fill={color} x={plot.right} y={r.labelY} textAnchor="end">
                {`${r.valueText} · ${r.verdict}`}
              </SvgText>
              <Line x1={g.zeroX} x2={g.zeroX} y1={r.barY - 12} y2={r.barY + 12} stroke={chartColors.targetLine} strokeWidth={1} />
              <Line x1={r.lowX} x2={r.highX} y1={r.barY} y2={r.barY} stroke={color} strokeWidth={r.clear ? 3 : 2} />
              <Line x1={r.lowX} x2={r.lowX} y1={r.barY - 6} y2={r.barY + 6} stroke={color} strokeWidth={2} />
              <Line x1={r.highX} x2={r.highX} y1={r.barY - 6} y2={r.barY + 6} stroke={color} strokeWidth={2} />
              <Circle cx={r.diffX} cy={r.barY} r={5} fill={r.clear ? color : chartColors.background} stroke={color} strokeWidth={2} />
              <SvgText {...small} x={g.zeroX} y={r.barY + 22} textAnchor="middle">0</SvgText>
              <SvgText {...small} x={plot.left} y={r.barY + 20}>{r.rangeLabels[0]}</SvgText>
              <SvgText {...small} x={plot.right} y={r.barY + 20} textAnchor="end">{r.rangeLabels[1]}</SvgText>
            </G>
          );
        })}
      </Svg>
    </View>
  );
}
