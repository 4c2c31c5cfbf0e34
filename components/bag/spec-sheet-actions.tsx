import { useRouter } from 'expo-router';
import { Linking, StyleSheet, View } from 'react-native';
import type { SpecSheet } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { useAcceptSpecSheetMutation, useSendSpecSheetMutation, specSheetPdfUrl } from '../queries/spec-sheets';
import { isStaff } from '../session/permissions';
import { useMe } from '../session/session-provider';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { NoPrint } from './no-print';

/** What can be done with a sheet: send (staff), accept (the player), print, the PDF. */
export function SpecSheetActions({ sheet }: { sheet: SpecSheet }) {
  const me = useMe();
  const router = useRouter();
  const staff = isStaff(me.role);
  const send = useSendSpecSheetMutation(sheet.fittingId);
  const accept = useAcceptSpecSheetMutation();
  const print = () => router.push({ pathname: '/print/spec-sheet', params: sheet.id ? { id: sheet.id } : { fittingId: sheet.fittingId } });
  return (
    <NoPrint style={styles.box}>
      {send.error ? <Notice tone="danger">{errorMessage(send.error)}</Notice> : null}
      {send.isSuccess ? <Notice tone="success">{`Sent to ${sheet.playerName}, with a copy to the shop.`}</Notice> : null}
      {accept.error ? <Notice tone="danger">{errorMessage(accept.error)}</Notice> : null}
      {!staff && sheet.state === 'sent' ? (
        <Notice tone="info" title="Happy with it?">
          <AppText>Accepting tells your fitter to build the clubs as written here.</AppText>
          <Button title="Accept the spec sheet" busy={accept.isPending} onPress={() => sheet.id && accept.mutate(sheet.id)} />
        </Notice>
      ) : null}
      <View style={styles.row}>
        {staff && sheet.state !== 'accepted' ? (
          <Button title={sheet.state === 'sent' ? 'Send again' : 'Send to the player'} busy={send.isPending} onPress={() => send.mutate()} disabled={sheet.choices.length === 0} />
        ) : null}
        <Button title="Print" variant="secondary" compact onPress={print} />
        {sheet.id ? <Button title="PDF (A4)" variant="secondary" compact onPress={() => void Linking.openURL(specSheetPdfUrl(sheet.id!, 'a4'))} /> : null}
        {sheet.id ? <Button title="PDF (Letter)" variant="quiet" compact onPress={() => void Linking.openURL(specSheetPdfUrl(sheet.id!, 'letter'))} /> : null}
      </View>
    </NoPrint>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'center' },
});
