import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { defaultStaticFitTable, type StaticFitRow } from '@/analysis/workshop';
import type { WorkshopSettings } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { parseOptionalNumber } from '../forms';
import { useSaveWorkshopSettingsMutation } from '../queries/workshop-settings';
import { colors, space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { FormRow } from '../ui/form-row';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';

type WorkshopSettingsFormProps = { settings: WorkshopSettings; canEdit: boolean };

const band = (from: number | null, to: number | null) => (from === null ? `under ${to}` : to === null ? `${from} and over` : `${from}–${to}`);

/** The shop's wedge-wear counts and static-fit table: the owner edits, fitters read. */
export function WorkshopSettingsForm({ settings, canEdit }: WorkshopSettingsFormProps) {
  const save = useSaveWorkshopSettingsMutation();
  const [rounds, setRounds] = useState(String(settings.wedgeWearRounds));
  const [sessions, setSessions] = useState(String(settings.wedgeWearPracticeSessions));
  const [rows, setRows] = useState<StaticFitRow[]>(settings.staticFitTable);
  const [texts, setTexts] = useState<string[]>(settings.staticFitTable.map((r) => String(r.lengthChangeIn)));
  const [invalid, setInvalid] = useState<string | null>(null);
  const submit = () => {
    const table = rows.map((r, i) => ({ ...r, lengthChangeIn: parseOptionalNumber(texts[i]) ?? Number.NaN }));
    const bad = table.findIndex((r) => !Number.isFinite(r.lengthChangeIn));
    if (bad >= 0) return setInvalid(`Row ${bad + 1}: enter a length change in inches.`);
    setInvalid(null);
    save.mutate({ wedgeWearRounds: Number(rounds), wedgeWearPracticeSessions: Number(sessions), staticFitTable: table });
  };
  const reset = () => {
    const table = defaultStaticFitTable();
    setRows(table);
    setTexts(table.map((r) => String(r.lengthChangeIn)));
  };
  return (
    <View style={styles.form}>
      <AppText variant="heading" accessibilityRole="header">Wedge wear</AppText>
      <AppText tone="muted">A wedge gets a reminder once its rounds or practice sessions since it went in pass these counts.</AppText>
      <FormRow>
        <TextField label="Rounds" value={rounds} onChangeText={setRounds} inputMode="numeric" editable={canEdit} />
        <TextField label="Practice sessions" value={sessions} onChangeText={setSessions} inputMode="numeric" editable={canEdit} />
      </FormRow>
      <AppText variant="heading" accessibilityRole="header">Static-fit table</AppText>
      <AppText tone="muted">
        A starting point for length (and the lie that goes with it, 1° per ½ in) from height and wrist-to-floor. The default is our own plain rule — ¼ in per 10 cm of height and per 5 cm of wrist-to-floor away from 178 cm and 86 cm — never a maker’s chart. Check the lie dynamically.
      </AppText>
      {rows.map((r, i) => (
        <View key={i} style={styles.row}>
          <AppText style={styles.band}>{`Height ${band(r.heightFromCm, r.heightToCm)} cm · wrist-to-floor ${band(r.wristFromCm, r.wristToCm)} cm`}</AppText>
          <View style={styles.value}>
            <TextField
              label={`Length change, row ${i + 1}`}
              suffix="in"
              value={texts[i]}
              editable={canEdit}
              inputMode="decimal"
              onChangeText={(t) => setTexts((all) => all.map((x, j) => (j === i ? t : x)))}
            />
          </View>
        </View>
      ))}
      {invalid ? <Notice tone="danger">{invalid}</Notice> : null}
      {save.error ? <Notice tone="danger">{errorMessage(save.error)}</Notice> : null}
      {save.isSuccess ? <Notice tone="success">Saved.</Notice> : null}
      {canEdit ? (
        <View style={styles.actions}>
          <Button title="Save" onPress={submit} busy={save.isPending} />
          <Button title="Back to the default rule" variant="quiet" onPress={reset} />
        </View>
      ) : (
        <AppText tone="muted">Only the shop’s owner changes these.</AppText>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', gap: space.md, paddingBottom: space.sm, borderBottomWidth: StyleSheet.hairlineWidth, borderBottomColor: colors.border },
  band: { flexGrow: 2, flexBasis: 220, minWidth: 0 },
  value: { flexGrow: 1, flexBasis: 140, minWidth: 0 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
