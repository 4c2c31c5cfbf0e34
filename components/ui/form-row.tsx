import { Children, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '../theme';

type FormRowProps = { children: ReactNode };

/** Fields side by side that wrap onto new lines on a narrow screen. */
export function FormRow({ children }: FormRowProps) {
  return (
    <View style={styles.row}>
      {Children.toArray(children).map((child, i) => (
        <View key={i} style={styles.cell}>
          {child}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 150, minWidth: 0 },
});
