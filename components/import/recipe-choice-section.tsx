import { StyleSheet, View } from 'react-native';
import { useRecipesQuery } from '../queries/recipes';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { ErrorState } from '../ui/error-state';
import { SelectField } from '../ui/select-field';
import { Section } from '../ui/section';
import { TextField } from '../ui/text-field';

type RecipeChoiceSectionProps = {
  recipeId: string | null;
  onRecipeId: (id: string | null) => void;
  saveAs: string;
  onSaveAs: (name: string) => void;
};

const NONE = '';

/** Staff only: start from a saved recipe of the shop, and save this mapping for next time. */
export function RecipeChoiceSection({ recipeId, onRecipeId, saveAs, onSaveAs }: RecipeChoiceSectionProps) {
  const recipes = useRecipesQuery();
  const options = [{ value: NONE, label: 'None: read the file as it comes' }, ...(recipes.data ?? []).map((r) => ({ value: r.id, label: r.name }))];
  return (
    <Section title="Recipe">
      {recipes.isError ? <ErrorState error={recipes.error} onRetry={() => void recipes.refetch()} title="Saved recipes did not load" /> : null}
      <View style={styles.block}>
        <SelectField
          label="Start from a saved recipe"
          value={recipeId ?? NONE}
          options={options}
          onChange={(id) => onRecipeId(id === NONE ? null : id)}
          disabled={recipes.isPending}
        />
        {recipeId ? (
          <AppText variant="caption" tone="muted">
            The recipe replaces the column choices above; changes you make now go on top of it.
          </AppText>
        ) : null}
        <TextField
          label="Save this mapping as"
          value={saveAs}
          onChangeText={onSaveAs}
          placeholder="e.g. Bay 2 export"
          hint="Optional. Saved with the import, for the next file from the same bay."
          maxLength={120}
        />
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({ block: { gap: space.sm } });
