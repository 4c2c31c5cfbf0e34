import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import type { Fitting } from '@/server/schemas';
import { isStaff } from '../session/permissions';
import { useMe } from '../session/session-provider';
import { space } from '../theme';
import { Button } from '../ui/button';
import { Section } from '../ui/section';
import { FittingBayFiles } from './fitting-bay-files';
import { FittingDetails } from './fitting-details';
import { FittingRecordActions } from './fitting-record-actions';

type SessionViewProps = { fitting: Fitting };

/** The session itself: its bay files (import, re-map, delete) and its details and conditions. */
export function SessionView({ fitting }: SessionViewProps) {
  const router = useRouter();
  const me = useMe();
  return (
    <View style={styles.view}>
      <FittingBayFiles fitting={fitting} />
      <Section
        title="Details and conditions"
        action={isStaff(me.role) ? <Button title="Edit" variant="secondary" compact onPress={() => router.push({ pathname: '/fittings/[id]/edit', params: { id: fitting.id } })} /> : null}
      >
        <FittingDetails fitting={fitting} />
      </Section>
      {isStaff(me.role) ? <FittingRecordActions fitting={fitting} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({ view: { gap: space.xl } });
