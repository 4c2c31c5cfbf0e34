import { Stack } from 'expo-router';
import { RecipeList } from '@/components/recipes/recipe-list';
import { useMe } from '@/components/session/session-provider';
import { AppText } from '@/components/ui/app-text';
import { Screen } from '@/components/ui/screen';

/** The owner's saved import recipes (the layout sends everyone else to their start page). */
export default function RecipesScreen() {
  const me = useMe();
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Import recipes' }} />
      <AppText tone="muted">
        {`The column mappings saved at ${me.shop.name}. A recipe reads the next file from the same bay the same way; changing or deleting one leaves files already imported as they are.`}
      </AppText>
      <RecipeList />
    </Screen>
  );
}
