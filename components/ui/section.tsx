import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '../theme';
import { AppText } from './app-text';

type SectionProps = { title: string; children: ReactNode; action?: ReactNode };

/** A titled block of a page, with an optional button beside the title. */
export function Section({ title, children, action }: SectionProps) {
  return (
    <View style={styles.section}>
      <View style={styles.head}>
        <AppText variant="heading" accessibilityRole="header" style={styles.title}>
          {title}
        </AppText>
        {action}
      </View>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.md },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.md, flexWrap: 'wrap' },
  title: { flexShrink: 1 },
});
