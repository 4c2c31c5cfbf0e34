import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { clubInfo } from '@/analysis/clubs';
import type { GroupAnalysis } from '@/analysis/session';
import { displayUnits, fromCanonical, toCanonical, type UnitSystem } from '@/analysis/units';
import { formatField } from '../format-field';
import { parseOptionalNumber } from '../forms';
import type { AnalysisParams } from '../queries/analysis';
import { colors, space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { TextField } from '../ui/text-field';

type OddsSectionProps = {
  club: string;
  /** The club's groups (one per build). */
  groups: readonly GroupAnalysis[];
  units: UnitSystem;
  odds: NonNullable<AnalysisParams['odds']> | null;
  onChange: (odds: NonNullable<AnalysisParams['odds']> | null) => void;
};

const percent = (p: number | null) => (p === null ? '–' : `${Math.round(100 * p)}%`);

/**
 * The chance that the next shot with each build finds a fairway of a given width and a green of
 * a given radius at a target carry (the next-shot distribution: honest for few shots), with the
 * targets editable in the user's units.
 */
export function OddsSection({ club, groups, units, odds, onChange }: OddsSectionProps) {
  const unit = displayUnits(units).carry;
  const first = groups[0]?.odds;
  const show = (m: number | null | undefined) => (m == null ? '' : fromCanonical(m, unit, 'carry').toFixed(0));
  const [fairway, setFairway] = useState(show(first?.fairway.widthM));
  const [green, setGreen] = useState(show(first?.green.radiusM));
  const [target, setTarget] = useState(show(first?.green.carryM));
  const [error, setError] = useState<string | null>(null);
  if (!first) return null;
  const apply = () => {
    const w = parseOptionalNumber(fairway);
    const r = parseOptionalNumber(green);
    const c = parseOptionalNumber(target);
    if ([w, r, c].some((x) => x !== null && !(x > 0))) return setError('Enter positive numbers (or leave a box empty).');
    const m = (x: number | null) => (x === null ? undefined : toCanonical(x, unit, 'carry'));
    const next = { fairwayWidthM: m(w), greenRadiusM: m(r), target: c === null ? undefined : { club, carryM: m(c)! } };
    if ((next.fairwayWidthM ?? 30) < 5 || (next.fairwayWidthM ?? 30) > 100) return setError(`Fairway between ${formatField(5, 'carry', units)} and ${formatField(100, 'carry', units)}.`);
    if ((next.greenRadiusM ?? 10) < 1 || (next.greenRadiusM ?? 10) > 50) return setError(`Green radius between ${formatField(1, 'carry', units)} and ${formatField(50, 'carry', units)}.`);
    setError(null);
    onChange(next);
  };
  const name = clubInfo(club)?.label ?? club;
  const whole = (m: number | null) => (m === null ? '–' : `${Math.round(fromCanonical(m, unit, 'carry'))} ${unit}`);
  return (
    <Card>
      <AppText variant="caption" tone="muted">
        {`The chance the next shot finishes in a fairway ${whole(first.fairway.widthM)} wide on the target line, and on a green of ${whole(first.green.radiusM)} radius at ${whole(first.green.carryM)}${odds?.target ? '' : ` (the ${name.toLowerCase()}’s median carry)`}. From each build’s kept shots, allowing for how few they are.`}
      </AppText>
      <View style={styles.builds}>
        {groups.map((g) => (
          <View key={g.build ?? ''} style={styles.build} accessibilityLabel={`${g.build ?? name}: fairway ${percent(g.odds.fairway.p)}, green ${percent(g.odds.green.p)}`}>
            <AppText variant="bodyStrong" numberOfLines={2}>{g.build ?? name}</AppText>
            <View style={styles.figures}>
              <View style={styles.figure}>
                <AppText variant="title">{percent(g.odds.fairway.p)}</AppText>
                <AppText variant="caption" tone="muted">fairway</AppText>
              </View>
              <View style={styles.figure}>
                <AppText variant="title">{percent(g.odds.green.p)}</AppText>
                <AppText variant="caption" tone="muted">green</AppText>
              </View>
            </View>
          </View>
        ))}
      </View>
      <View style={styles.inputs}>
        <View style={styles.cell}><TextField label="Fairway width" suffix={unit} value={fairway} onChangeText={setFairway} inputMode="decimal" /></View>
        <View style={styles.cell}><TextField label="Green radius" suffix={unit} value={green} onChangeText={setGreen} inputMode="decimal" /></View>
        <View style={styles.cell}><TextField label="Target carry" suffix={unit} value={target} onChangeText={setTarget} inputMode="decimal" /></View>
      </View>
      {error ? <AppText tone="danger">{error}</AppText> : null}
      <View style={styles.inputs}>
        <Button compact variant="secondary" title="Work out the odds" onPress={apply} />
        {odds ? <Button compact variant="quiet" title="Shop’s targets" onPress={() => onChange(null)} /> : null}
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  builds: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  build: { flexGrow: 1, flexBasis: 150, gap: space.xs, borderTopWidth: 3, borderTopColor: colors.border, paddingTop: space.sm },
  figures: { flexDirection: 'row', gap: space.lg },
  figure: { alignItems: 'flex-start' },
  inputs: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'flex-end' },
  cell: { flexGrow: 1, flexBasis: 100 },
});
