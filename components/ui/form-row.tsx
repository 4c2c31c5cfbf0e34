import { Children, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '../theme';

type FormRowProps = {
  children: ReactNode;
  /** A field's narrowest width before the row wraps (150 px: two fields side by side on a phone). */
  basisPx?: number;
};

/** Fields side by side that wrap onto new lines on a narrow screen. */
export function FormRow({ children, basisPx = 150 }: FormRowProps) {
  return (
    <View style={styles.row}>
      {Children.toArray(children).map((child, i) => (
        <View key={i} style={[styles.cell, { flexBasis: basisPx }]}>
          {child}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, minWidth: 0 },
});
