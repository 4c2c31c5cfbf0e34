import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import type { Build } from '@/server/schemas';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { buildName, buildSummary } from './build-summary';
import { lengthConformanceNotes } from './conformance';
import { LengthNotes } from './length-notes';

type BuildRowProps = {
  build: Build;
  clubLabel: string;
  /** Staff may change the specs; a player reads them. */
  canEdit: boolean;
};

/** One build: its name, its specs on one line (or "No specs yet"), length notes, and (staff) Edit. */
export function BuildRow({ build, clubLabel, canEdit }: BuildRowProps) {
  const router = useRouter();
  const summary = buildSummary(build);
  const name = buildName(build.label);
  return (
    <View style={styles.row}>
      <View style={styles.text}>
        <AppText variant="bodyStrong">{name}</AppText>
        <AppText tone="muted" style={!summary && styles.none}>
          {summary ?? 'No specs yet'}
        </AppText>
        {build.notes ? (
          <AppText variant="caption" tone="muted" numberOfLines={2}>
            {build.notes}
          </AppText>
        ) : null}
        <LengthNotes notes={lengthConformanceNotes(build.club, build.lengthIn)} compact />
      </View>
      {canEdit ? (
        <Button
          title="Edit"
          accessibilityLabel={`Edit the specs of ${clubLabel}, ${name}`}
          variant="secondary"
          compact
          onPress={() => router.push({ pathname: '/builds/[id]/edit', params: { id: build.id } })}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'flex-start', gap: space.md, paddingVertical: space.xs },
  text: { flex: 1, minWidth: 0, gap: 2 },
  none: { fontStyle: 'italic' },
});
