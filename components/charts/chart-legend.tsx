import { View } from 'react-native';
import Svg, { Path } from 'react-native-svg';
import { AppText } from '@/components/ui/app-text';
import { colors, space } from '@/components/theme';
import type { MarkerShape } from './chart-types';
import { markerPath } from './marker-path';

export type LegendItem = { key: string; label: string; color: string; shape?: MarkerShape; hollow?: boolean; faded?: boolean; dashed?: boolean };

type ChartLegendProps = { items: readonly LegendItem[] };

/** A wrapping row of legend entries: a small marker (or a dashed line) and its words. */
export function ChartLegend({ items }: ChartLegendProps) {
  return (
    <View style={{ flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.xs, paddingTop: space.sm }}>
      {items.map((item) => (
        <View key={item.key} style={{ flexDirection: 'row', alignItems: 'center', gap: space.xs }}>
          <Svg width={18} height={14} accessibilityElementsHidden importantForAccessibility="no">
            {item.dashed ? (
              <Path d="M1,7H17" stroke={item.color} strokeWidth={2} strokeDasharray="4 3" />
            ) : (
              <Path
                d={markerPath(item.shape ?? 'circle', 9, 7, 5)}
                fill={item.hollow ? colors.surface : item.color}
                stroke={item.color}
                strokeWidth={1.5}
                opacity={item.faded ? 0.3 : 1}
              />
            )}
          </Svg>
          <AppText variant="caption">{item.label}</AppText>
        </View>
      ))}
    </View>
  );
}
