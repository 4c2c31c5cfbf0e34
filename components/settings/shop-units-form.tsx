import { StyleSheet, View } from 'react-native';
import type { ShopInfo } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { useUpdateShopMutation } from '../queries/shop';
import { AppText } from '../ui/app-text';
import { SegmentedControl } from '../ui/segmented-control';
import { space } from '../theme';

type ShopUnitsFormProps = { shop: ShopInfo };

/** The units new people of the shop start with (each can change their own on their account page). */
export function ShopUnitsForm({ shop }: ShopUnitsFormProps) {
  const update = useUpdateShopMutation();
  const metric = shop.defaultUnits === 'metric';
  return (
    <View style={styles.box}>
      <AppText tone="muted">What new people of the shop start with; everyone can change their own.</AppText>
      <AppText variant="bodyStrong">Distances and speeds</AppText>
      <SegmentedControl
        label="Distances and speeds"
        value={shop.defaultUnits}
        options={[{ value: 'imperial', label: 'yd, mph' }, { value: 'metric', label: 'm, km/h' }]}
        onChange={(v) => update.mutate({ defaultUnits: v as ShopInfo['defaultUnits'] })}
      />
      <AppText variant="bodyStrong">Lengths and heights</AppText>
      <SegmentedControl
        label="Lengths and heights"
        value={shop.defaultLengthUnit ?? (metric ? 'cm' : 'in')}
        options={[{ value: 'in', label: 'in' }, { value: 'cm', label: 'cm' }]}
        onChange={(v) => update.mutate({ defaultLengthUnit: v as 'in' | 'cm' })}
      />
      <AppText variant="bodyStrong">Altitude</AppText>
      <SegmentedControl
        label="Altitude"
        value={shop.defaultAltitudeUnit ?? (metric ? 'm' : 'ft')}
        options={[{ value: 'ft', label: 'ft' }, { value: 'm', label: 'm' }]}
        onChange={(v) => update.mutate({ defaultAltitudeUnit: v as 'ft' | 'm' })}
      />
      <AppText variant="bodyStrong">Temperature</AppText>
      <SegmentedControl
        label="Temperature"
        value={shop.defaultTemperatureUnit ?? (metric ? 'c' : 'f')}
        options={[{ value: 'f', label: '°F' }, { value: 'c', label: '°C' }]}
        onChange={(v) => update.mutate({ defaultTemperatureUnit: v as 'f' | 'c' })}
      />
      {update.error ? <AppText tone="danger">{errorMessage(update.error)}</AppText> : null}
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: space.md } });
