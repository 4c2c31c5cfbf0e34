import { StyleSheet, View } from 'react-native';
import { clubInfo } from '@/analysis/clubs';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { ChoiceField } from '../ui/choice-field';
import { Section } from '../ui/section';
import { TextField } from '../ui/text-field';
import { BUILD_MODE_OPTIONS, type BuildChoice } from './build-choice';

type BuildChoiceSectionProps = {
  value: BuildChoice;
  onChange: (next: BuildChoice) => void;
  /** Clubs the preview found, in bag order (for per-club builds). */
  clubs: readonly string[];
  /** Whether a column is read as the build. */
  hasBuildColumn: boolean;
};

/** Which build each shot belongs to: the file's build column, one build for the file, or one per club. */
export function BuildChoiceSection({ value, onChange, clubs, hasBuildColumn }: BuildChoiceSectionProps) {
  const set = (patch: Partial<BuildChoice>) => onChange({ ...value, ...patch });
  return (
    <Section title="Builds">
      <ChoiceField label="Where the build comes from" value={value.mode} options={BUILD_MODE_OPTIONS} onChange={(mode) => set({ mode })} />
      {value.mode === 'column' ? (
        <View style={styles.block}>
          <AppText tone="muted">
            {hasBuildColumn
              ? 'Each shot takes the build its row names.'
              : 'No column is read as the build. Set a column to “Build” above, or choose another way.'}
          </AppText>
          <TextField
            label="Build for rows without one"
            value={value.fallback}
            onChangeText={(fallback) => set({ fallback })}
            placeholder="e.g. Own club"
            maxLength={80}
          />
        </View>
      ) : null}
      {value.mode === 'file' ? (
        <TextField
          label="Build of every shot"
          value={value.fileBuild}
          onChangeText={(fileBuild) => set({ fileBuild })}
          placeholder="e.g. Head A, 10.5° neutral"
          maxLength={80}
          error={value.fileBuild.trim() ? undefined : 'Name the build.'}
        />
      ) : null}
      {value.mode === 'club' ? (
        <View style={styles.block}>
          {clubs.length === 0 ? <AppText tone="muted">The preview has found no clubs yet.</AppText> : null}
          {clubs.map((club) => (
            <TextField
              key={club}
              label={`Build for ${clubInfo(club)?.label ?? club}`}
              value={value.byClub[club] ?? ''}
              onChangeText={(text) => set({ byClub: { ...value.byClub, [club]: text } })}
              placeholder="Leave blank for none"
              maxLength={80}
            />
          ))}
        </View>
      ) : null}
    </Section>
  );
}

const styles = StyleSheet.create({ block: { gap: space.sm } });
