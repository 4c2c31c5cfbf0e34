import { StyleSheet, View } from 'react-native';
import type { Recipe } from '@/analysis/import';
import { colors, space } from '../theme';
import { AppText } from '../ui/app-text';
import { Card } from '../ui/card';
import { DetailList } from '../ui/detail-list';
import { recipeColumnLines, recipeFileSettings } from './recipe-columns';

type RecipeMappingProps = { recipe: Recipe };

/** What a saved recipe does: how it splits a file, and what each column is read as. */
export function RecipeMapping({ recipe }: RecipeMappingProps) {
  const lines = recipeColumnLines(recipe);
  return (
    <View style={styles.box}>
      <Card>
        <DetailList items={recipeFileSettings(recipe)} />
      </Card>
      <Card>
        <View accessibilityRole={'list' as never} accessibilityLabel="Columns">
          {lines.map((l, i) => (
            <View key={l.header} style={[styles.line, i === lines.length - 1 && styles.last]}>
              <AppText variant="bodyStrong" style={[styles.header, l.ignored && styles.ignored]}>
                {l.header}
              </AppText>
              <AppText tone={l.ignored ? 'muted' : 'default'} style={styles.reading}>
                {l.reading}
              </AppText>
            </View>
          ))}
        </View>
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  line: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    gap: space.md,
    paddingVertical: space.sm,
    borderBottomWidth: StyleSheet.hairlineWidth,
    borderBottomColor: colors.border,
  },
  last: { borderBottomWidth: 0 },
  header: { flexBasis: 180, flexGrow: 1, minWidth: 0 },
  ignored: { color: colors.textMuted },
  reading: { flexBasis: 180, flexGrow: 2, minWidth: 0 },
});
