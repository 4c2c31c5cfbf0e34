import { View } from 'react-native';
import Svg, { G, Line, Rect, Text as SvgText } from 'react-native-svg';
import type { LadderRung } from '@/analysis/ladder';
import type { UnitSystem } from '@/analysis/units';
import { fonts } from '@/components/theme';
import { BUILD_COLORS, chartColors } from './chart-colors';
import { countWords } from './chart-format';
import { ladderChartGeometry } from './ladder-chart-geometry';

export type LadderChartProps = {
  /** The session's ladder, in bag order (SessionAnalysis.ladder). */
  rungs: readonly LadderRung[];
  units: UnitSystem;
  /** The chart's width in px (measure it with onLayout); the height follows the number of clubs. */
  widthPx: number;
};

const small = { fontFamily: fonts.regular, fontSize: 11, fill: chartColors.axisText } as const;
const barColor = BUILD_COLORS[0];

/** The bag's gapping: per club the median carry and its q1–q3 spread, the gaps between them. */
export function LadderChart({ rungs, units, widthPx }: LadderChartProps) {
  const g = ladderChartGeometry({ rungs, units, widthPx });
  const { plot } = g;
  const flagged = g.gaps.filter((gap) => gap.flag !== null).length;
  const summary = `Ladder: ${countWords(g.rows.length, 'club')}, ${countWords(flagged, 'flagged gap')}`;
  return (
    <View accessible accessibilityRole="image" accessibilityLabel={summary}>
      <Svg width={g.widthPx} height={g.heightPx}>
        {g.carryLines.map((l) => (
          <G key={`c${l.value}`}>
            <Line x1={l.px} x2={l.px} y1={plot.top} y2={plot.bottom} stroke={chartColors.grid} strokeWidth={l.label ? 1 : 0.5} />
            {l.label ? <SvgText {...small} x={l.px} y={plot.bottom + 14} textAnchor="middle">{l.label}</SvgText> : null}
          </G>
        ))}
        <SvgText {...small} x={(plot.left + plot.right) / 2} y={plot.bottom + 30} textAnchor="middle">{`Carry (${g.unit}), median and middle half of shots`}</SvgText>
        {g.rows.map((r) => (
          <G key={r.club} testID="ladder-row">
            <SvgText fontFamily={fonts.medium} fontSize={13} fill={chartColors.text} x={4} y={r.y + 4}>{r.label}</SvgText>
            <Rect x={r.q1X} y={r.y - 5} width={Math.max(1, r.q3X - r.q1X)} height={10} rx={5} fill={barColor} fillOpacity={0.25} />
            <Rect x={r.medianX - 1.5} y={r.y - 8} width={3} height={16} rx={1} fill={barColor} />
            <SvgText {...small} fill={chartColors.text} x={r.medianX} y={r.y - 11} textAnchor="middle">{r.medianLabel}</SvgText>
          </G>
        ))}
        {g.gaps.map((gap) => {
          const color = gap.flag ? chartColors.caution : chartColors.axisText;
          const loftColor = gap.loftFlag ? chartColors.caution : chartColors.axisText;
          return (
            <G key={`${gap.from}-${gap.to}`} testID="ladder-gap">
              <Line x1={g.gapColumnX} x2={g.gapColumnX} y1={gap.y1 + 3} y2={gap.y2 - 3} stroke={color} strokeWidth={gap.flag ? 2 : 1} />
              <SvgText fontFamily={gap.flag ? fonts.semibold : fonts.regular} fontSize={12} fill={color} x={g.gapColumnX + 6} y={gap.labelY}>{gap.text}</SvgText>
              {gap.loftText ? <SvgText {...small} fill={loftColor} x={g.gapColumnX + 6} y={gap.labelY + 13}>{gap.loftText}</SvgText> : null}
            </G>
          );
        })}
      </Svg>
    </View>
  );
}
