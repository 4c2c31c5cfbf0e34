import { Stack } from 'expo-router';
import { useShopMarginsQuery } from '@/components/queries/shop-margins';
import { isStaff } from '@/components/session/permissions';
import { useMe } from '@/components/session/session-provider';
import { MarginsForm } from '@/components/settings/margins-form';
import { AppText } from '@/components/ui/app-text';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';

export default function ShopMarginsScreen() {
  const me = useMe();
  const query = useShopMarginsQuery({ enabled: isStaff(me.role) });
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Decision margins' }} />
      {!isStaff(me.role) ? <Notice tone="info">The shop’s staff set the margins.</Notice> : null}
      {isStaff(me.role) && query.isPending ? <LoadingState label="Loading the margins…" /> : null}
      {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
      {query.data ? (
        <>
          <AppText tone="muted">
            The smallest difference between two builds that matters to the shop, per field. A head-to-head calls a field equivalent when its 95% interval lies inside the margin, clear when it leaves out zero, and not yet clear otherwise. The defaults are common practice.
          </AppText>
          <MarginsForm view={query.data} units={me.units} />
        </>
      ) : null}
    </Screen>
  );
}
