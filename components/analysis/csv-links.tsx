import { StyleSheet, Text, View } from 'react-native';
import { exportPaths } from '../queries/analysis';
import { colors, fonts, layout, radius, space } from '../theme';
import { AppText } from '../ui/app-text';

type CsvLinksProps = { fittingId: string };

/** Links that download the shots and the group summaries as CSV (fitter and owner). */
export function CsvLinks({ fittingId }: CsvLinksProps) {
  const paths = exportPaths(fittingId);
  const link = (href: string, label: string) => (
    <Text
      accessibilityRole="link"
      accessibilityLabel={label}
      {...({ href, hrefAttrs: { download: true } } as object)}
      style={styles.link}
    >
      {label}
    </Text>
  );
  return (
    <View style={styles.box}>
      <View style={styles.row}>
        {link(paths.shots, 'Download the shots (CSV)')}
        {link(paths.groups, 'Download the groups (CSV)')}
      </View>
      <AppText variant="caption" tone="muted">In your units; text that a spreadsheet could take for a formula is written so it is shown, never run.</AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  link: {
    minHeight: layout.minTouchPx,
    lineHeight: layout.minTouchPx - 2,
    paddingHorizontal: space.lg,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.border,
    backgroundColor: colors.surface,
    color: colors.ink,
    fontFamily: fonts.semibold,
    fontSize: 16,
  },
});
