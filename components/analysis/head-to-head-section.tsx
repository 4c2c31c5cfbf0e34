import { StyleSheet, View } from 'react-native';
import type { ShotField } from '@/analysis/fields';
import type { HeadToHead } from '@/analysis/head-to-head';
import type { UnitSystem } from '@/analysis/units';
import { DifferenceBars, FIELD_LABELS } from '../charts';
import { colors, space } from '../theme';
import { AppText } from '../ui/app-text';
import { Card } from '../ui/card';
import { ChipRow } from './chip-row';
import { fieldNumber, unitText } from '../format-field';
import { useWidth } from './use-width';

const FIELDS: ShotField[] = ['carry', 'offline', 'ballSpeed', 'smashFactor', 'launchAngle', 'spinRate', 'spinAxis'];

type HeadToHeadSectionProps = {
  builds: readonly string[];
  a: string;
  b: string;
  onChange: (a: string, b: string) => void;
  headToHead: HeadToHead | undefined;
  loading: boolean;
  units: UnitSystem;
};

/** Two builds of one club side by side: differences with 95% intervals, spread, oval areas, shots still needed. */
export function HeadToHeadSection({ builds, a, b, onChange, headToHead, loading, units }: HeadToHeadSectionProps) {
  const [width, onLayout] = useWidth();
  const options = builds.map((x) => ({ value: x, label: x }));
  const fields = FIELDS.filter((f) => headToHead?.fields[f]);
  return (
    <Card>
      <AppText variant="label">Build A</AppText>
      <ChipRow label="Build A" value={a} options={options} onChange={(v) => onChange(v, v === b ? a : b)} />
      <AppText variant="label">Build B</AppText>
      <ChipRow label="Build B" value={b} options={options} onChange={(v) => onChange(v === a ? b : a, v)} />
      {!headToHead ? (
        <AppText tone="muted">{loading ? 'Comparing…' : 'Choose two builds.'}</AppText>
      ) : (
        <>
          <View onLayout={onLayout}>
            {width > 0 ? <DifferenceBars headToHead={headToHead} fields={fields} labelA={a} labelB={b} units={units} widthPx={width} /> : null}
          </View>
          <View accessibilityLabel="Head-to-head table">
            <View style={[styles.row, styles.head]}>
              <AppText variant="label" style={styles.field}>A − B</AppText>
              <AppText variant="label" style={styles.num}>Difference</AppText>
              <AppText variant="label" style={styles.num}>p</AppText>
              <AppText variant="label" style={styles.more}>Settled?</AppText>
            </View>
            {fields.map((f) => {
              const d = headToHead.fields[f]!;
              const clear = d.p < 0.05;
              const more = d.shotsNeeded;
              const u = f === 'smashFactor' ? '' : ` ${unitText(f, units)}`;
              return (
                <View key={f} style={styles.row}>
                  <AppText style={styles.field}>{FIELD_LABELS[f] ?? f}</AppText>
                  <View style={styles.num}>
                    <AppText style={styles.right}>{`${fieldNumber(d.diff, f, units)}${u}`}</AppText>
                    <AppText variant="caption" tone="muted" style={styles.right}>{`${fieldNumber(d.ci95[0], f, units)} to ${fieldNumber(d.ci95[1], f, units)}`}</AppText>
                  </View>
                  <AppText style={styles.num}>{d.p < 0.001 ? '< 0.001' : d.p.toFixed(3)}</AppText>
                  <AppText variant="caption" style={[styles.more, { color: clear ? colors.success : colors.textMuted }]}>
                    {clear ? 'Clear difference' : more == null ? 'No difference seen' : more > 100 ? 'Too small to matter here' : `About ${more} more shots each`}
                  </AppText>
                </View>
              );
            })}
          </View>
          <AppText variant="caption" tone="muted">
            {headToHead.ovalAreaRatio == null
              ? 'Oval areas: not enough shots for both ovals.'
              : `Oval area of A is ${headToHead.ovalAreaRatio.toFixed(2)}× that of B (${headToHead.ovalAreaRatio < 1 ? 'A is tighter' : 'B is tighter'}).`}{' '}
            Differences use Welch’s t test; “more shots” assumes 80% power at the 5% level.
          </AppText>
        </>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', paddingVertical: space.xs, borderBottomWidth: 1, borderBottomColor: colors.border, gap: space.sm },
  head: { borderBottomColor: colors.ink },
  field: { flex: 1.2 },
  num: { flex: 1.2 },
  more: { flex: 1.3 },
  right: { textAlign: 'left' },
});
