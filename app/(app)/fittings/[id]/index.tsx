import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { ChooseBuildsSection } from '@/components/bag/choose-builds-section';
import { FittingBuilds } from '@/components/builds/fitting-builds';
import { BaySafetyNote } from '@/components/fittings/bay-safety-note';
import { FittingAnalysisArea } from '@/components/fittings/fitting-analysis-area';
import { FittingBayFiles } from '@/components/fittings/fitting-bay-files';
import { FittingDetails } from '@/components/fittings/fitting-details';
import { formatDate } from '@/components/format';
import { useFittingQuery } from '@/components/queries/fittings';
import { isStaff } from '@/components/session/permissions';
import { useMe } from '@/components/session/session-provider';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { Section } from '@/components/ui/section';

export default function FittingScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const router = useRouter();
  const me = useMe();
  const query = useFittingQuery(id);

  if (query.isPending) return <LoadingState label="Loading the fitting…" />;
  if (query.isError) {
    return (
      <Screen>
        <Stack.Screen options={{ title: 'Fitting' }} />
        <ErrorState error={query.error} onRetry={() => void query.refetch()} />
      </Screen>
    );
  }
  const fitting = query.data;
  return (
    <Screen>
      <Stack.Screen options={{ title: `${fitting.playerName} · ${formatDate(fitting.date)}` }} />
      <BaySafetyNote />
      {/* The shots come first: they are what the fitter and the player open the page for. */}
      <FittingBayFiles fitting={fitting} />
      <Section title="Shots and analysis">
        <FittingAnalysisArea fitting={fitting} />
      </Section>
      <FittingBuilds fitting={fitting} />
      <ChooseBuildsSection fitting={fitting} />
      <Section
        title="Details and conditions"
        action={
          isStaff(me.role) ? (
            <Button
              title="Edit"
              variant="secondary"
              compact
              onPress={() => router.push({ pathname: '/fittings/[id]/edit', params: { id } })}
            />
          ) : null
        }
      >
        <FittingDetails fitting={fitting} />
      </Section>
    </Screen>
  );
}
