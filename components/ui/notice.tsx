import { Children, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radius, space } from '../theme';
import { AppText } from './app-text';

type NoticeProps = { tone: 'danger' | 'caution' | 'success' | 'info'; title?: string; children: ReactNode };

const palette = {
  danger: { bg: colors.dangerSoft, border: colors.danger, fg: colors.danger },
  caution: { bg: colors.cautionSoft, border: colors.caution, fg: colors.caution },
  success: { bg: colors.successSoft, border: colors.success, fg: colors.success },
  info: { bg: colors.surfaceSunk, border: colors.border, fg: colors.ink },
} as const;

/** Plain words (a string, or strings and numbers side by side as `{name} has…` makes them). */
const isPlainText = (children: ReactNode): boolean =>
  Children.toArray(children).every((c) => typeof c === 'string' || typeof c === 'number');

/** A coloured band in the page: a form error, a caution, a confirmation. Plain words are set in the app's font. */
export function Notice({ tone, title, children }: NoticeProps) {
  const p = palette[tone];
  return (
    <View
      style={[styles.box, { backgroundColor: p.bg, borderLeftColor: p.border }]}
      accessibilityRole={tone === 'danger' ? 'alert' : undefined}
    >
      {title ? (
        <AppText variant="bodyStrong" style={{ color: p.fg }}>
          {title}
        </AppText>
      ) : null}
      {isPlainText(children) ? <AppText>{children}</AppText> : children}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderRadius: radius.md, borderLeftWidth: 4, padding: space.md, gap: space.xs },
});
