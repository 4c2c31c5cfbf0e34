import { useRouter } from 'expo-router';
import { StyleSheet } from 'react-native';
import { formatDate, plural } from '../format';
import { useRecipesQuery } from '../queries/recipes';
import { AppText } from '../ui/app-text';
import { Card } from '../ui/card';
import { EmptyState } from '../ui/empty-state';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { ResponsiveGrid } from '../ui/responsive-grid';
import { keptColumnCount } from './recipe-columns';

/** The shop's saved import recipes, by name; each leads to its own page. */
export function RecipeList() {
  const router = useRouter();
  const query = useRecipesQuery();
  if (query.isPending) return <LoadingState label="Loading the recipes…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  if (query.data.length === 0) {
    return (
      <EmptyState
        title="No saved recipes yet"
        message="A fitter saves one in the import step (“Save this mapping as”); the next file from the same bay is then read the same way."
      />
    );
  }
  return (
    <ResponsiveGrid>
      {query.data.map((r) => (
        <Card
          key={r.id}
          accessibilityLabel={`Recipe ${r.name}`}
          onPress={() => router.push({ pathname: '/recipes/[id]', params: { id: r.id } })}
        >
          <AppText variant="bodyStrong" numberOfLines={2} style={styles.name}>
            {r.name}
          </AppText>
          <AppText variant="caption" tone="muted">
            {`${plural(keptColumnCount(r.recipe), 'column')} read · saved ${formatDate(r.createdAt)}`}
          </AppText>
        </Card>
      ))}
    </ResponsiveGrid>
  );
}

const styles = StyleSheet.create({ name: { flexShrink: 1 } });
