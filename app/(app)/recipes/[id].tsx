import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { useState } from 'react';
import { deleteRecipeQuestion } from '@/components/import/import-words';
import { useDeleteRecipeMutation, useRecipeQuery } from '@/components/queries/recipes';
import { RecipeMapping } from '@/components/recipes/recipe-mapping';
import { RecipeRenameForm } from '@/components/recipes/recipe-rename-form';
import { Button } from '@/components/ui/button';
import { ConfirmStep } from '@/components/ui/confirm-step';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { Section } from '@/components/ui/section';

/** One saved recipe: its mapping, its name (rename) and delete, after a question in the page. */
export default function RecipeScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const query = useRecipeQuery(id);
  const remove = useDeleteRecipeMutation();
  const [confirming, setConfirming] = useState(false);
  const recipe = query.data;
  return (
    <Screen>
      <Stack.Screen options={{ title: recipe ? recipe.name : 'Import recipe' }} />
      {query.isPending ? <LoadingState label="Loading the recipe…" /> : null}
      {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
      {recipe ? (
        <>
          <Section title="Rename">
            <RecipeRenameForm recipe={recipe} />
          </Section>
          <Section title="What it reads">
            <RecipeMapping recipe={recipe.recipe} />
          </Section>
          <Section title="Delete">
            {confirming ? (
              <ConfirmStep
                question={deleteRecipeQuestion(recipe.name)}
                confirmTitle="Delete"
                confirmLabel={`Yes, delete the recipe ${recipe.name}`}
                onConfirm={() => remove.mutate(recipe.id, { onSuccess: () => router.replace('/recipes') })}
                onCancel={() => {
                  setConfirming(false);
                  remove.reset();
                }}
                busy={remove.isPending}
                error={remove.error}
              />
            ) : (
              <Button title="Delete this recipe" accessibilityLabel={`Delete the recipe ${recipe.name}`} variant="danger" compact onPress={() => setConfirming(true)} />
            )}
          </Section>
        </>
      ) : null}
    </Screen>
  );
}
