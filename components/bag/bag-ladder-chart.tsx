import { View } from 'react-native';
import Svg, { Circle, G, Line, Rect, Text as SvgText } from 'react-native-svg';
import type { BagLadderRung } from '@/analysis/ladder';
import type { UnitSystem } from '@/analysis/units';
import { BUILD_COLORS, chartColors } from '../charts/chart-colors';
import { countWords } from '../charts/chart-format';
import { ladderChartGeometry } from '../charts/ladder-chart-geometry';
import { fonts } from '../theme';
import { chartRungs } from './bag-words';

type BagLadderChartProps = { ladder: readonly BagLadderRung[]; units: UnitSystem; widthPx: number };

const small = { fontFamily: fonts.regular, fontSize: 11, fill: chartColors.axisText } as const;
const color = BUILD_COLORS[0];

/**
 * The bag's ladder on the session ladder's layout (ladderChartGeometry): per club its carry, the
 * gap and loft step to its neighbour in the bag. A carry hit in a fitting is a filled mark with
 * its middle half; an estimate a hollow ring; an entered carry a hollow square.
 */
export function BagLadderChart({ ladder, units, widthPx }: BagLadderChartProps) {
  const { rungs, sources, labels } = chartRungs(ladder);
  // The layout leaves 24 px more on the right than the session ladder, for the longest flag words ("−2 yd · reversed").
  const g = ladderChartGeometry({ rungs, units, widthPx: Math.max(120, widthPx - 24) });
  const { plot } = g;
  const flagged = g.gaps.filter((gap) => gap.flag !== null).length;
  const estimates = sources.filter((s) => s === 'estimate').length;
  const summary = `Bag ladder: ${countWords(g.rows.length, 'club')}, ${countWords(flagged, 'flagged gap')}, ${countWords(estimates, 'estimated carry', 'estimated carries')}`;
  return (
    <View accessible accessibilityRole="image" accessibilityLabel={summary}>
      <Svg width={widthPx} height={g.heightPx + 18}>
        {g.carryLines.map((l) => (
          <G key={`c${l.value}`}>
            <Line x1={l.px} x2={l.px} y1={plot.top} y2={plot.bottom} stroke={chartColors.grid} strokeWidth={l.label ? 1 : 0.5} />
            {l.label ? <SvgText {...small} x={l.px} y={plot.bottom + 14} textAnchor="middle">{l.label}</SvgText> : null}
          </G>
        ))}
        <SvgText {...small} x={(plot.left + plot.right) / 2} y={plot.bottom + 30} textAnchor="middle">{`Carry (${g.unit})`}</SvgText>
        {g.rows.map((r, i) => {
          const source = sources[i];
          return (
            <G key={r.club} testID="bag-ladder-row">
              <SvgText fontFamily={fonts.medium} fontSize={12} fill={chartColors.text} x={4} y={r.y + 4}>{labels[i]}</SvgText>
              {source === 'hit' ? (
                <>
                  <Rect x={r.q1X} y={r.y - 5} width={Math.max(1, r.q3X - r.q1X)} height={10} rx={5} fill={color} fillOpacity={0.25} />
                  <Rect x={r.medianX - 1.5} y={r.y - 8} width={3} height={16} rx={1} fill={color} />
                </>
              ) : source === 'estimate' ? (
                <Circle cx={r.medianX} cy={r.y} r={5} fill="none" stroke={color} strokeWidth={1.8} />
              ) : (
                <Rect x={r.medianX - 4.5} y={r.y - 4.5} width={9} height={9} fill="none" stroke={color} strokeWidth={1.8} />
              )}
              <SvgText {...small} fill={chartColors.text} x={r.medianX} y={r.y - 11} textAnchor="middle">{r.medianLabel}</SvgText>
            </G>
          );
        })}
        {g.gaps.map((gap) => {
          const c = gap.flag ? chartColors.caution : chartColors.axisText;
          return (
            <G key={`${gap.from}-${gap.to}`}>
              <Line x1={g.gapColumnX} x2={g.gapColumnX} y1={gap.y1 + 3} y2={gap.y2 - 3} stroke={c} strokeWidth={gap.flag ? 2 : 1} />
              <SvgText fontFamily={gap.flag ? fonts.semibold : fonts.regular} fontSize={12} fill={c} x={g.gapColumnX + 6} y={gap.labelY}>{gap.text}</SvgText>
              {gap.loftText ? <SvgText {...small} fill={gap.loftFlag ? chartColors.caution : chartColors.axisText} x={g.gapColumnX + 6} y={gap.labelY + 13}>{gap.loftText}</SvgText> : null}
            </G>
          );
        })}
        <G>
          <Rect x={4} y={g.heightPx + 2} width={14} height={8} rx={4} fill={color} fillOpacity={0.5} />
          <SvgText {...small} x={22} y={g.heightPx + 10}>hit</SvgText>
          <Circle cx={56} cy={g.heightPx + 6} r={4.5} fill="none" stroke={color} strokeWidth={1.6} />
          <SvgText {...small} x={66} y={g.heightPx + 10}>estimate</SvgText>
          <Rect x={122} y={g.heightPx + 2} width={8} height={8} fill="none" stroke={color} strokeWidth={1.6} />
          <SvgText {...small} x={136} y={g.heightPx + 10}>entered</SvgText>
        </G>
      </Svg>
    </View>
  );
}
