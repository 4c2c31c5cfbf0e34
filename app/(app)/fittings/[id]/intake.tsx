import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { useFittingQuery } from '@/components/queries/fittings';
import { useIntakeQuery, useSendIntakeMutation } from '@/components/queries/fitting-course';
import { usePlayerQuery } from '@/components/queries/players';
import { IntakeForm } from '@/components/remote/intake-form';
import { lengthUnitOf } from '@/components/remote/intake-form-values';
import { IntakeSummary } from '@/components/remote/intake-summary';
import { IntakeNextSteps } from '@/components/remote/intake-next-steps';
import { useMe } from '@/components/session/session-provider';
import { AppText } from '@/components/ui/app-text';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';

/** The intake of a remote fitting: the player answers it on their phone; the fitter reads it. */
export default function IntakeScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const me = useMe();
  const router = useRouter();
  const fitting = useFittingQuery(id);
  const intake = useIntakeQuery(id);
  const isPlayer = me.role === 'player';
  const player = usePlayerQuery(me.playerId ?? '', { enabled: isPlayer });
  const send = useSendIntakeMutation(id);
  const unit = lengthUnitOf(me.units);
  const loading = fitting.isPending || intake.isPending || (isPlayer && player.isPending);
  const failed = fitting.error ?? intake.error;
  return (
    <Screen>
      <Stack.Screen options={{ title: isPlayer ? 'Your intake' : 'Intake' }} />
      {loading ? <LoadingState label="Loading the intake…" /> : null}
      {failed ? <ErrorState error={failed} onRetry={() => void intake.refetch()} /> : null}
      {!loading && !failed && fitting.data && intake.data ? (
        isPlayer ? (
          <>
            <AppText tone="muted">{`Before your remote fitting at ${me.shop.name}: a few measures and words about your game, your bag and your own launch-monitor files.`}</AppText>
            {send.isSuccess ? <AppText tone="accent">Thank you: your intake is in.</AppText> : null}
            <IntakeForm unit={unit} intake={intake.data.intake} player={player.data ?? null} busy={send.isPending} error={send.error} onSubmit={(body) => send.mutate(body)} />
            <IntakeNextSteps fitting={fitting.data} playerId={me.playerId} onOpen={(href) => router.push(href)} />
          </>
        ) : intake.data.intake ? (
          <IntakeSummary intake={intake.data.intake} unit={unit} />
        ) : (
          <EmptyState title="No intake yet" message={`${fitting.data.playerName} has not sent the intake yet. They are told by e-mail when you open a remote fitting.`} />
        )
      ) : null}
    </Screen>
  );
}
