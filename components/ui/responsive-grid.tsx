import { Children, type ReactNode } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { layout, space } from '../theme';

type ResponsiveGridProps = { children: ReactNode };

/** One column on a phone; two from ~760 px on (rows of two, an odd last item keeps its width). */
export function ResponsiveGrid({ children }: ResponsiveGridProps) {
  const { width } = useWindowDimensions();
  const items = Children.toArray(children);
  if (width < layout.twoColumnFromPx) return <View style={styles.column}>{items}</View>;
  const rows: ReactNode[][] = [];
  for (let i = 0; i < items.length; i += 2) rows.push(items.slice(i, i + 2));
  return (
    <View style={styles.column}>
      {rows.map((pair, i) => (
        <View key={i} style={styles.row}>
          <View style={styles.cell}>{pair[0]}</View>
          <View style={styles.cell}>{pair[1] ?? null}</View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  column: { gap: space.md },
  row: { flexDirection: 'row', gap: space.md },
  cell: { flex: 1, minWidth: 0 },
});
