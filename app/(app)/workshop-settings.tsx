import { Stack } from 'expo-router';
import { WorkshopSettingsForm } from '@/components/bag/workshop-settings-form';
import { useWorkshopSettingsQuery } from '@/components/queries/workshop-settings';
import { canManageTeam } from '@/components/session/permissions';
import { useMe } from '@/components/session/session-provider';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';

/** /workshop-settings — wedge-wear counts and the static-fit table (owner edits, fitters read). */
export default function WorkshopSettingsScreen() {
  const me = useMe();
  const query = useWorkshopSettingsQuery();
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Workshop settings' }} />
      {query.isPending ? <LoadingState label="Loading the settings…" /> : null}
      {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
      {query.data ? <WorkshopSettingsForm key={query.data.updatedAt ?? 'default'} settings={query.data} canEdit={canManageTeam(me.role)} /> : null}
    </Screen>
  );
}
