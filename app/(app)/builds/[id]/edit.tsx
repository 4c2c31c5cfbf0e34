import { Stack, useLocalSearchParams } from 'expo-router';
import { clubInfo } from '@/analysis/clubs';
import { BuildForm } from '@/components/builds/build-form';
import { buildName } from '@/components/builds/build-summary';
import { useGoBack } from '@/components/navigation';
import { useBuildQuery, useUpdateBuildMutation } from '@/components/queries/builds';
import { AppText } from '@/components/ui/app-text';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Notice } from '@/components/ui/notice';
import { Screen } from '@/components/ui/screen';

/** /builds/:id/edit?fittingId=… — the API lists builds per fitting, so the fitting comes along. */
export default function EditBuildScreen() {
  const { id, fittingId = '' } = useLocalSearchParams<{ id: string; fittingId?: string }>();
  const goBack = useGoBack(fittingId ? { pathname: '/fittings/[id]', params: { id: fittingId } } : '/fittings');
  const query = useBuildQuery(fittingId, id);
  const update = useUpdateBuildMutation(fittingId);
  const build = query.data;
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Edit build' }} />
      {!fittingId || build === null ? (
        <Notice tone="danger" title="Build not found">
          Open the build from its fitting’s page, under Builds.
        </Notice>
      ) : null}
      {fittingId && query.isPending ? <LoadingState label="Loading the build…" /> : null}
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
