import { useState } from 'react';
import { Linking, Platform, StyleSheet, View } from 'react-native';
import type { ShopInfo } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { SHOP_EXPORT_URL, useCloseShopMutation, useReopenShopMutation } from '../queries/shop';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';
import { space } from '../theme';

type ShopCloseProps = { shop: ShopInfo };

const day = (iso: string) => iso.slice(0, 10);

/** Opens the shop's zip in the browser (the session cookie goes with it). */
function download(url: string): void {
  if (Platform.OS === 'web') window.location.assign(url);
  else void Linking.openURL(url);
}

/** Export everything; close the shop (typing its name, asked once) or reopen it within the grace period. */
export function ShopClose({ shop }: ShopCloseProps) {
  const close = useCloseShopMutation();
  const reopen = useReopenShopMutation();
  const [typed, setTyped] = useState('');
  return (
    <View style={styles.box}>
      <Button title="Export everything (zip)" variant="secondary" compact onPress={() => download(SHOP_EXPORT_URL)} />
      <AppText tone="muted">One JSON and one CSV file per table: players, fittings, shots, builds, bags, spec sheets and the rest.</AppText>
      {shop.closedAt ? (
        <>
          <Notice tone="caution" title="The shop is closed">
            {`Closed on ${day(shop.closedAt)}. Nobody but you can sign in. Everything is deleted after ${day(shop.purgeAfter ?? shop.closedAt)} unless you reopen it.`}
          </Notice>
          {reopen.error ? <Notice tone="danger">{errorMessage(reopen.error)}</Notice> : null}
          <Button title="Reopen the shop" onPress={() => reopen.mutate({})} busy={reopen.isPending} />
        </>
      ) : (
        <>
          <AppText>{`Closing signs out your fitters and players and keeps them out. For ${shop.graceDays} days you can reopen the shop; after that everything of it is deleted for good. Export first if you want to keep it.`}</AppText>
          <TextField label={`Type the shop’s name (${shop.name}) to close it`} value={typed} onChangeText={setTyped} autoCapitalize="none" />
          {close.error ? <Notice tone="danger">{errorMessage(close.error)}</Notice> : null}
          <Button title="Close the shop" variant="danger" compact disabled={typed.trim().toLowerCase() !== shop.name.trim().toLowerCase()} busy={close.isPending} onPress={() => close.mutate({ shopName: typed })} />
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: space.md } });
