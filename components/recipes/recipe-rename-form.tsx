import { StyleSheet, View } from 'react-native';
import { recipeRenameBodySchema, type SavedRecipe } from '@/server/schemas';
import { ApiError, errorMessage } from '../api-client';
import { useRenameRecipeMutation } from '../queries/recipes';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';
import { space } from '../theme';
import { parseWith, useTextForm } from '../use-text-form';

type RecipeRenameFormProps = { recipe: SavedRecipe };

/** The recipe's name, editable; saved with "Rename". */
export function RecipeRenameForm({ recipe }: RecipeRenameFormProps) {
  const rename = useRenameRecipeMutation(recipe.id);
  const { text, set, shown, submit } = useTextForm(
    () => ({ name: recipe.name }),
    parseWith(recipeRenameBodySchema),
    (body) => rename.mutate(body.name),
    rename.error,
  );
  const banner =
    rename.error instanceof ApiError && rename.error.code === 'RECIPE_NAME_TAKEN'
      ? 'Your shop already has a recipe with that name. Choose another.'
      : rename.error && !shown.name
        ? errorMessage(rename.error)
        : null;
  return (
    <View style={styles.form}>
      {banner ? <Notice tone="danger">{banner}</Notice> : null}
      {rename.isSuccess && !rename.isPending && text.name.trim() === rename.data.name ? <Notice tone="success">Renamed.</Notice> : null}
      <TextField label="Name" value={text.name} onChangeText={set('name')} error={shown.name} maxLength={120} onSubmitEditing={submit} />
      <Button title="Rename" variant="secondary" compact onPress={submit} busy={rename.isPending} disabled={text.name.trim() === recipe.name} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.sm } });
