import { Stack } from 'expo-router';
import { useShopQuery } from '@/components/queries/shop';
import { ShopClose } from '@/components/settings/shop-close';
import { ShopUnitsForm } from '@/components/settings/shop-units-form';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { Section } from '@/components/ui/section';

/** The owner's shop page: default units, the export, closing and reopening. */
export default function ShopScreen() {
  const query = useShopQuery();
  return (
    <Screen>
      <Stack.Screen options={{ title: query.data?.name ?? 'The shop' }} />
      {query.isPending ? <LoadingState label="Loading the shop…" /> : null}
      {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
      {query.data && !query.data.closedAt ? (
        <Section title="Units for new people">
          <ShopUnitsForm shop={query.data} />
        </Section>
      ) : null}
      {query.data ? (
        <Section title={query.data.closedAt ? 'Closed' : 'Export and close'}>
          <ShopClose shop={query.data} />
        </Section>
      ) : null}
    </Screen>
  );
}
