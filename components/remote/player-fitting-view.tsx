import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import type { Fitting } from '@/server/schemas';
import { usePlainWordsQuery } from '../queries/fitting-course';
import { useFittingSpecSheetQuery } from '../queries/spec-sheets';
import { useMe } from '../session/session-provider';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Section } from '../ui/section';
import { CourseSection } from './course-section';
import { PlainChoiceCard } from './plain-choice-card';
import { PlayerShots } from './player-shots';

type PlayerFittingViewProps = { fitting: Fitting };

/**
 * A fitting as the player sees it on a phone: where it stands, the chosen builds in plain
 * words, their ovals and odds, their spec sheet, bag and ladder. No statistics unless opened.
 */
export function PlayerFittingView({ fitting }: PlayerFittingViewProps) {
  const me = useMe();
  const router = useRouter();
  const words = usePlainWordsQuery(fitting.id);
  const sheet = useFittingSpecSheetQuery(fitting.id);
  const sheetId = sheet.data?.id ?? null;
  return (
    <View style={styles.view}>
      <CourseSection fitting={fitting} staff={false} />
      {words.data && words.data.choices.length > 0 ? (
        <Section title="Your builds">
          {words.data.choices.map((c) => (
            <PlainChoiceCard key={`${c.club}|${c.buildLabel}`} choice={c} />
          ))}
        </Section>
      ) : (
        <AppText tone="muted">Your fitter has not chosen builds yet: they appear here in plain words.</AppText>
      )}
      <View style={styles.row}>
        {sheetId ? (
          <Button
            title={sheet.data?.state === 'accepted' ? 'Your spec sheet (accepted)' : 'Read and accept your spec sheet'}
            onPress={() => router.push({ pathname: '/spec-sheets/[id]', params: { id: sheetId } })}
          />
        ) : null}
        {me.playerId ? <Button variant="secondary" compact title="Your bag and ladder" onPress={() => router.push({ pathname: '/players/[id]/bag', params: { id: me.playerId! } })} /> : null}
        {fitting.remote ? <Button variant="secondary" compact title="Send a launch-monitor file" onPress={() => router.push({ pathname: '/fittings/[id]/import', params: { id: fitting.id } })} /> : null}
      </View>
      {fitting.shotCount > 0 ? <PlayerShots fitting={fitting} units={me.units} hand={words.data?.handedness} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  view: { gap: space.xl },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
