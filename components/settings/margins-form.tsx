import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { FIELD_LABELS } from '@/analysis/fields';
import type { UnitSystem } from '@/analysis/units';
import type { ShopMarginsView } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { unitText } from '../format-field';
import { useSaveShopMarginsMutation } from '../queries/shop-margins';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { Section } from '../ui/section';
import { TextField } from '../ui/text-field';
import { MARGIN_GROUPS, marginBody, marginText, marginTexts, type MarginTexts } from './margin-form-values';

type MarginsFormProps = { view: ShopMarginsView; units: UnitSystem };

/**
 * The shop's margins (the smallest difference that matters, per field) and its on-target odds
 * targets, in the owner's units; empty boxes keep the defaults. Read-only for fitters.
 */
export function MarginsForm({ view, units }: MarginsFormProps) {
  const save = useSaveShopMarginsMutation();
  const [texts, setTexts] = useState<MarginTexts>(() => marginTexts(view, units));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState(false);
  const set = (key: keyof MarginTexts) => (t: string) => {
    setSaved(false);
    setTexts((old) => ({ ...old, [key]: t }));
  };
  const submit = () => {
    const { body, errors: found } = marginBody(texts, view, units);
    setErrors(found);
    if (body) save.mutate(body, { onSuccess: (next) => { setTexts(marginTexts(next, units)); setSaved(true); } });
  };
  const distance = unitText('carry', units);
  return (
    <View style={styles.form}>
      {saved ? <Notice tone="success">Saved: every head-to-head in the shop now reads by these margins.</Notice> : null}
      {save.error ? <Notice tone="danger">{errorMessage(save.error)}</Notice> : null}
      {MARGIN_GROUPS.map((group) => (
        <Section key={group.title} title={group.title}>
          <View style={styles.grid}>
            {group.fields.map((f) => (
              <View key={f} style={styles.cell}>
                <TextField
                  label={FIELD_LABELS[f]}
                  suffix={unitText(f, units) || undefined}
                  value={texts[f]}
                  onChangeText={set(f)}
                  inputMode="decimal"
                  editable={view.canEdit}
                  hint={`Default ${marginText(f, view.defaults[f], units)}`}
                  error={errors[f]}
                />
              </View>
            ))}
          </View>
        </Section>
      ))}
      <Section title="On-target odds">
        <View style={styles.grid}>
          <View style={styles.cell}>
            <TextField label="Fairway width" suffix={distance} value={texts.fairwayWidthM} onChangeText={set('fairwayWidthM')} inputMode="decimal" editable={view.canEdit} hint={`Default ${marginText('carry', view.defaultFairwayWidthM, units)}`} error={errors.fairwayWidthM} />
          </View>
          <View style={styles.cell}>
            <TextField label="Green radius" suffix={distance} value={texts.greenRadiusM} onChangeText={set('greenRadiusM')} inputMode="decimal" editable={view.canEdit} hint={`Default ${marginText('carry', view.defaultGreenRadiusM, units)}`} error={errors.greenRadiusM} />
          </View>
        </View>
      </Section>
      {view.canEdit ? <Button title="Save the margins" onPress={submit} busy={save.isPending} /> : <AppText tone="muted">Only the shop owner changes the margins.</AppText>}
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.xl },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 150 },
});
