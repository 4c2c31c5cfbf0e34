import { Stack, useLocalSearchParams } from 'expo-router';
import { useMessagesQuery } from '@/components/queries/fitting-course';
import { MessageThread } from '@/components/remote/message-thread';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';

/** The messages of one fitting between the player and the shop. */
export default function FittingMessagesScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const query = useMessagesQuery(id);
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Messages' }} />
      {query.isPending ? <LoadingState label="Loading the messages…" /> : null}
      {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
      {query.data ? <MessageThread fittingId={id} messages={query.data.messages} unread={query.data.unread} /> : null}
    </Screen>
  );
}
