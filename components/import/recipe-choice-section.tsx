import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useDeleteRecipeMutation, useRecipesQuery } from '../queries/recipes';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { ErrorState } from '../ui/error-state';
import { SelectField } from '../ui/select-field';
import { Section } from '../ui/section';
import { TextField } from '../ui/text-field';
import { ConfirmStep } from '../ui/confirm-step';
import { deleteRecipeQuestion } from './import-words';

type RecipeChoiceSectionProps = {
  recipeId: string | null;
  onRecipeId: (id: string | null) => void;
  saveAs: string;
  onSaveAs: (name: string) => void;
};

const NONE = '';

/** Staff only: start from a saved recipe of the shop (or delete it), and save this mapping for next time. */
export function RecipeChoiceSection({ recipeId, onRecipeId, saveAs, onSaveAs }: RecipeChoiceSectionProps) {
  const recipes = useRecipesQuery();
  const remove = useDeleteRecipeMutation();
  const [confirming, setConfirming] = useState(false);
  const options = [{ value: NONE, label: 'None: read the file as it comes' }, ...(recipes.data ?? []).map((r) => ({ value: r.id, label: r.name }))];
  const chosen = recipes.data?.find((r) => r.id === recipeId) ?? null;
  const choose = (id: string | null) => {
    setConfirming(false);
    remove.reset();
    onRecipeId(id);
  };
  const confirmDelete = () => {
    if (!chosen) return;
    remove.mutate(chosen.id, { onSuccess: () => choose(null) });
  };
  return (
    <Section title="Recipe">
      {recipes.isError ? <ErrorState error={recipes.error} onRetry={() => void recipes.refetch()} title="Saved recipes did not load" /> : null}
      <View style={styles.block}>
        <SelectField
          label="Start from a saved recipe"
          value={recipeId ?? NONE}
          options={options}
          onChange={(id) => choose(id === NONE ? null : id)}
          disabled={recipes.isPending || remove.isPending}
        />
        {chosen ? (
          <AppText variant="caption" tone="muted">
            The recipe replaces the column choices above; changes you make now go on top of it.
          </AppText>
        ) : null}
        {chosen && !confirming ? (
          <View style={styles.row}>
            <Button
              title="Delete this recipe"
              accessibilityLabel={`Delete the recipe ${chosen.name}`}
              variant="quiet"
              compact
              onPress={() => setConfirming(true)}
            />
          </View>
        ) : null}
        {chosen && confirming ? (
          <ConfirmStep
            question={deleteRecipeQuestion(chosen.name)}
            confirmTitle="Delete"
            confirmLabel={`Yes, delete the recipe ${chosen.name}`}
            onConfirm={confirmDelete}
            onCancel={() => {
              setConfirming(false);
              remove.reset();
            }}
            busy={remove.isPending}
            error={remove.error}
          />
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

const styles = StyleSheet.create({ block: { gap: space.sm }, row: { flexDirection: 'row' } });
