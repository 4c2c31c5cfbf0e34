import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { formatHandicap } from '../format';
import { usePlayerQuery, usePlayersQuery } from '../queries/players';
import { useDebouncedValue } from '../use-debounced-value';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { TextField } from '../ui/text-field';
import { colors, layout, radius, space } from '../theme';

type PlayerPickerProps = { playerId: string; onChange: (playerId: string) => void; error?: string };

/** Choose the fitting's player: search the shop's players, pick one; "Change" to pick again. */
export function PlayerPicker({ playerId, onChange, error }: PlayerPickerProps) {
  const [search, setSearch] = useState('');
  const settled = useDebouncedValue(search);
  const chosen = usePlayerQuery(playerId);
  const list = usePlayersQuery({ q: settled.trim() || undefined });

  if (playerId) {
    return (
      <View style={styles.field}>
        <AppText variant="label">Player</AppText>
        <View style={styles.chosen}>
          <AppText variant="bodyStrong" style={styles.grow}>
            {chosen.data?.name ?? (chosen.isError ? 'Player not found' : 'Loading…')}
          </AppText>
          <Button title="Change" variant="quiet" compact accessibilityLabel="Change player" onPress={() => onChange('')} />
        </View>
      </View>
    );
  }

  return (
    <View style={styles.field}>
      <TextField label="Player" value={search} onChangeText={setSearch} placeholder="Search by name" error={error} autoCorrect={false} />
      {list.isPending ? <LoadingState label="Loading players…" /> : null}
      {list.isError ? <ErrorState error={list.error} onRetry={() => void list.refetch()} /> : null}
      {list.data && list.data.length === 0 ? (
        <AppText tone="muted">No player matches. Add them under Players first.</AppText>
      ) : null}
      {list.data && list.data.length > 0 ? (
        <View style={styles.options} accessibilityRole="list">
          {list.data.slice(0, 8).map((p) => (
            <Pressable
              key={p.id}
              accessibilityRole="button"
              accessibilityLabel={`Choose ${p.name}`}
              onPress={() => onChange(p.id)}
              style={({ pressed }) => [styles.option, pressed && styles.pressed]}
            >
              <AppText style={styles.grow}>{p.name}</AppText>
              <AppText variant="caption" tone="muted">
                {formatHandicap(p.handicap)}
              </AppText>
            </Pressable>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  chosen: {
    flexDirection: 'row',
    alignItems: 'center',
    minHeight: layout.minTouchPx,
    paddingLeft: space.md,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.border,
    backgroundColor: colors.surface,
  },
  grow: { flex: 1 },
  options: { borderRadius: radius.md, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface, overflow: 'hidden' },
  option: {
    flexDirection: 'row',
    alignItems: 'center',
    minHeight: layout.minTouchPx,
    paddingHorizontal: space.md,
    borderBottomWidth: StyleSheet.hairlineWidth,
    borderBottomColor: colors.border,
  },
  pressed: { backgroundColor: colors.surfaceSunk },
});
