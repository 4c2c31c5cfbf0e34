import { StyleSheet, View } from 'react-native';
import { useBagClubHistoryQuery } from '../queries/bags';
import { buildSummary } from '../builds/build-summary';
import { colors, space } from '../theme';
import { AppText } from '../ui/app-text';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { STATUS_WORDS } from './bag-words';

const ACTION_WORDS = { add: 'Went in the bag', update: 'Changed', replace: 'Replaced', out: 'Taken out', wear: 'Wear counts' } as const;

const when = (iso: string) => new Date(iso).toLocaleString('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });

/** Every recorded change of a club: what, who and when, newest first. */
export function BagHistoryList({ bagClubId }: { bagClubId: string }) {
  const query = useBagClubHistoryQuery(bagClubId);
  if (query.isPending) return <LoadingState label="Loading the history…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  return (
    <View>
      {query.data.map((h) => (
        <View key={h.id} style={styles.item}>
          <AppText variant="bodyStrong">{`${ACTION_WORDS[h.action]} · ${STATUS_WORDS[h.snapshot.status]}`}</AppText>
          <AppText variant="caption" tone="muted">{`${when(h.changedAt)}${h.changedByName ? ` by ${h.changedByName}` : ''}${h.fittingId ? ' · from a fitting' : ''}`}</AppText>
          <AppText variant="caption">{buildSummary(h.snapshot) ?? 'No specs'}</AppText>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  item: { gap: 2, paddingVertical: space.sm, borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: colors.border },
});
