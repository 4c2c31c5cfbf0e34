import { StyleSheet, View } from 'react-native';
import type { Fitting, FittingBody } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { ChoiceField } from '../ui/choice-field';
import { DateField } from '../ui/date-field';
import { FormRow } from '../ui/form-row';
import { Notice } from '../ui/notice';
import { SwitchField } from '../ui/switch-field';
import { TextField } from '../ui/text-field';
import { colors, radius, space } from '../theme';
import { UNIT_SYMBOL } from '@/analysis/units';
import { useMe } from '../session/session-provider';
import { fittingFormText, parseFittingForm, type ConditionUnits, type FittingFormText } from './fitting-form-values';
import { PlayerPicker } from './player-picker';
import { useTextForm } from '../use-text-form';

type FittingFormProps = {
  fitting?: Fitting;
  /** Preselected player of a new fitting (from a player's page). */
  playerId?: string;
  submitTitle: string;
  busy: boolean;
  error: unknown;
  onSubmit: (body: FittingBody) => void;
  onCancel: () => void;
};

const FIRMNESS = [
  { value: '', label: 'Not stated' },
  { value: 'soft', label: 'Soft' },
  { value: 'normal', label: 'Normal' },
  { value: 'firm', label: 'Firm' },
] as const;

const VENUES = [
  { value: 'indoor', label: 'Indoor bay' },
  { value: 'outdoor', label: 'Outdoor range' },
] as const;

/** A fitting's player, date, venue and conditions; checked with the shared schema before sending. */
export function FittingForm({ fitting, playerId, submitTitle, busy, error, onSubmit, onCancel }: FittingFormProps) {
  const me = useMe();
  const units: ConditionUnits = { temperature: me.temperatureUnit, altitude: me.altitudeUnit };
  const { text, set, errors, shown, submit } = useTextForm(() => fittingFormText(fitting, { playerId }, units), (t) => parseFittingForm(t, units), onSubmit, error);

  return (
    <View style={styles.form}>
      {error ? <Notice tone="danger">{errorMessage(error)}</Notice> : null}
      {Object.keys(errors).length > 0 ? <Notice tone="danger">Some fields need a look; see the notes under them.</Notice> : null}
      {fitting ? (
        <View style={styles.fixed}>
          <AppText variant="label">Player</AppText>
          <AppText variant="bodyStrong">{fitting.playerName}</AppText>
        </View>
      ) : (
        <PlayerPicker playerId={text.playerId} onChange={set('playerId')} error={shown.playerId} />
      )}
      <FormRow basisPx={240}>
        <DateField label="Date" value={text.date} onChange={set('date')} error={shown.date} />
        <ChoiceField label="Venue" value={text.venue} options={VENUES} onChange={set('venue')} />
      </FormRow>
      <TextField label="Ball" value={text.ball} onChangeText={set('ball')} error={shown.ball} placeholder="The ball model hit in the bay" />
      <View style={styles.group} accessibilityRole={'group' as never} accessibilityLabel="Conditions">
        <View style={styles.groupHead}>
          <AppText variant="bodyStrong">Conditions</AppText>
          <AppText variant="caption" tone="muted">
            Optional. Where the shots were hit; used to carry them over to the player's own course.
          </AppText>
        </View>
        <FormRow basisPx={96}>
          <TextField
            label="Temperature"
            suffix={UNIT_SYMBOL[units.temperature]}
            value={text.temperatureC}
            onChangeText={set('temperatureC')}
            error={shown.temperatureC}
            inputMode="decimal"
          />
          <TextField label="Altitude" suffix={UNIT_SYMBOL[units.altitude]} value={text.altitudeM} onChangeText={set('altitudeM')} error={shown.altitudeM} inputMode="decimal" />
          <TextField
            label="Humidity"
            suffix="%"
            value={text.humidityPct}
            onChangeText={set('humidityPct')}
            error={shown.humidityPct}
            inputMode="decimal"
          />
        </FormRow>
        <ChoiceField label="Ground" value={text.groundFirmness} options={FIRMNESS} onChange={set('groundFirmness')} />
      </View>
      <TextField label="Notes" value={text.notes} onChangeText={set('notes')} error={shown.notes} multiline numberOfLines={4} />
      <SwitchField
        label="Remote fitting"
        hint="The player may upload their own bay files."
        value={text.remote}
        onChange={set('remote')}
      />
      <View style={styles.actions}>
        <Button title={submitTitle} onPress={submit} busy={busy} />
        <Button title="Cancel" variant="quiet" onPress={onCancel} disabled={busy} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  fixed: { gap: space.xs },
  group: { gap: space.md, padding: space.md, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  groupHead: { gap: 2 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
