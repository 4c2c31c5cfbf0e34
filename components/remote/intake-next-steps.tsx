import type { Href } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import type { Fitting } from '@/server/schemas';
import { plural } from '../format';
import { space } from '../theme';
import { Button } from '../ui/button';
import { Section } from '../ui/section';
import { AppText } from '../ui/app-text';

type IntakeNextStepsProps = { fitting: Fitting; playerId: string | null; onOpen: (href: Href) => void };

/** After the answers: the player's bag (the bag editor) and their own launch-monitor files (the import's mapping step). */
export function IntakeNextSteps({ fitting, playerId, onOpen }: IntakeNextStepsProps) {
  return (
    <Section title="Your bag and your files">
      <AppText tone="muted">Add the clubs you carry with what you know of them, then send the files your launch monitor exported: you check how each column is read before anything is kept.</AppText>
      <View style={styles.row}>
        {playerId ? <Button compact variant="secondary" title="Your bag" onPress={() => onOpen({ pathname: '/players/[id]/bag', params: { id: playerId } })} /> : null}
        <Button compact variant="secondary" title="Send a launch-monitor file" onPress={() => onOpen({ pathname: '/fittings/[id]/import', params: { id: fitting.id } })} />
      </View>
      <AppText variant="caption" tone="muted">{`${plural(fitting.shotCount, 'shot')} in this fitting so far.`}</AppText>
    </Section>
  );
}

const styles = StyleSheet.create({ row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md } });
