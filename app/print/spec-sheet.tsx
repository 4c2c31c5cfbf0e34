import { useLocalSearchParams } from 'expo-router';
import { Platform, ScrollView, StyleSheet, View } from 'react-native';
import { NoPrint } from '@/components/bag/no-print';
import { PrintStyle } from '@/components/bag/print-style';
import { SpecSheetDocument } from '@/components/bag/spec-sheet-document';
import { useFittingSpecSheetQuery, useSpecSheetQuery } from '@/components/queries/spec-sheets';
import { useSession } from '@/components/session/session-provider';
import { Button } from '@/components/ui/button';
import { ErrorState } from '@/components/ui/error-state';
import { LoadingState } from '@/components/ui/loading-state';
import { useGoBack } from '@/components/navigation';

/** /print/spec-sheet?id=… or ?fittingId=… — the sheet alone, 700 px wide, with the print stylesheet. */
export default function PrintSpecSheetScreen() {
  const { id = '', fittingId = '' } = useLocalSearchParams<{ id?: string; fittingId?: string }>();
  const session = useSession();
  const goBack = useGoBack(id ? { pathname: '/spec-sheets/[id]', params: { id } } : { pathname: '/fittings/[id]/spec-sheet', params: { id: fittingId } });
  const sent = useSpecSheetQuery(id);
  const draft = useFittingSpecSheetQuery(fittingId, { enabled: !id && fittingId !== '' });
  const query = id ? sent : draft;
  const units = session.me?.units ?? 'imperial';
  return (
    <ScrollView style={styles.page} contentContainerStyle={styles.content}>
      <PrintStyle />
      <View style={styles.paper}>
        <NoPrint style={styles.actions}>
          <Button title="Print" onPress={() => Platform.OS === 'web' && window.print()} />
          <Button title="Back" variant="quiet" onPress={goBack} />
        </NoPrint>
        {query.isPending ? <LoadingState label="Loading the spec sheet…" /> : null}
        {query.isError ? <ErrorState error={query.error} onRetry={() => void query.refetch()} /> : null}
        {query.data ? <SpecSheetDocument sheet={query.data} units={units} /> : null}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  // White like the paper it prints on; no app header or tabs on this page.
  page: { flex: 1, backgroundColor: '#FFFFFF' },
  content: { padding: 16 },
  paper: { width: '100%', maxWidth: 700, alignSelf: 'center', gap: 16 },
  actions: { flexDirection: 'row', gap: 12 },
});
