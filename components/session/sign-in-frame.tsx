import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { AppText } from '../ui/app-text';
import { BrandMark } from '../ui/brand-mark';
import { colors, radius, space } from '../theme';

type SignInFrameProps = { children: ReactNode };

/** The page around the sign-in form: the name, a line on what Ovalyard is for, a card. */
export function SignInFrame({ children }: SignInFrameProps) {
  return (
    <ScrollView style={styles.page} contentContainerStyle={styles.content} keyboardShouldPersistTaps="handled">
      <View style={styles.column}>
        <View style={styles.brand}>
          <BrandMark size={48} />
          <View>
            <AppText variant="title" tone="onInk" accessibilityRole="header">
              Ovalyard
            </AppText>
            <AppText tone="onInk" style={styles.tagline}>
              Fitting sessions into club decisions
            </AppText>
          </View>
        </View>
        <View style={styles.card}>{children}</View>
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  page: { flex: 1, backgroundColor: colors.ink },
  content: { flexGrow: 1, justifyContent: 'center', padding: space.lg },
  column: { width: '100%', maxWidth: 440, alignSelf: 'center', gap: space.xl },
  brand: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  tagline: { opacity: 0.8 },
  card: { backgroundColor: colors.paper, borderRadius: radius.lg, padding: space.xl, gap: space.lg },
});
