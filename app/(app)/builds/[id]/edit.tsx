import { Stack, useLocalSearchParams } from 'expo-router';
import { clubInfo } from '@/analysis/clubs';
import { BuildForm } from '@/components/builds/build-form';
import { buildName } from '@/components/builds/build-summary';
import { useGoBack } from '@/components/navigation';
import { useBuildQuery, useUpdateBuildMutation } from '@/components/queries/builds';
import { AppText } from '@/components/ui/app-text';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';

/** /builds/:id/edit — the build is loaded by its id; back leads to its fitting. */
export default function EditBuildScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const query = useBuildQuery(id);
  const update = useUpdateBuildMutation();
  const build = query.data;
  const goBack = useGoBack(build ? { pathname: '/fittings/[id]', params: { id: build.fittingId } } : '/fittings');
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Edit build' }} />
      {query.isPending ? <LoadingState label="Loading the build…" /> : null}
      {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
      {build ? (
        <>
          <AppText variant="title" accessibilityRole="header">
            {`${clubInfo(build.club)?.label ?? build.club} · ${buildName(build.label)}`}
          </AppText>
          <BuildForm
            build={build}
            busy={update.isPending}
            error={update.error}
            onCancel={goBack}
            onSubmit={(change) => update.mutate({ id: build.id, change }, { onSuccess: goBack })}
          />
        </>
      ) : null}
    </Screen>
  );
}
