import { StyleSheet, View } from 'react-native';
import type { Player, PlayerBody } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { Button } from '../ui/button';
import { ChoiceField } from '../ui/choice-field';
import { FormRow } from '../ui/form-row';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';
import { space } from '../theme';
import { useMe } from '../session/session-provider';
import { parsePlayerForm, playerFormText, type PlayerFormText } from './player-form-values';
import { useTextForm } from '../use-text-form';

type PlayerFormProps = {
  player?: Player;
  submitTitle: string;
  busy: boolean;
  /** The failed save, if any (its field errors show inline). */
  error: unknown;
  onSubmit: (body: PlayerBody) => void;
  onCancel: () => void;
};

const HANDEDNESS = [
  { value: 'right', label: 'Right-handed' },
  { value: 'left', label: 'Left-handed' },
] as const;

/** A player's profile: checked with the shared schema before it is sent. Lengths in cm. */
export function PlayerForm({ player, submitTitle, busy, error, onSubmit, onCancel }: PlayerFormProps) {
  const unit = useMe().lengthUnit;
  const { text, set, errors, shown, submit } = useTextForm(() => playerFormText(player, unit), (t) => parsePlayerForm(t, unit), onSubmit, error);

  return (
    <View style={styles.form}>
      {error ? <Notice tone="danger">{errorMessage(error)}</Notice> : null}
      {Object.keys(errors).length > 0 ? <Notice tone="danger">Some fields need a look; see the notes under them.</Notice> : null}
      <TextField label="Name" value={text.name} onChangeText={set('name')} error={shown.name} autoComplete="name" />
      <TextField
        label="E-mail (optional)"
        value={text.email}
        onChangeText={set('email')}
        error={shown.email}
        autoCapitalize="none"
        inputMode="email"
        keyboardType="email-address"
      />
      <ChoiceField label="Plays" value={text.handedness} options={HANDEDNESS} onChange={set('handedness')} />
      <FormRow>
        <TextField label="Height" suffix={unit} value={text.heightCm} onChangeText={set('heightCm')} error={shown.heightCm} inputMode="decimal" />
        <TextField
          label="Wrist to floor"
          suffix={unit}
          value={text.wristToFloorCm}
          onChangeText={set('wristToFloorCm')}
          error={shown.wristToFloorCm}
          inputMode="decimal"
        />
        <TextField
          label="Handicap index"
          value={text.handicap}
          onChangeText={set('handicap')}
          error={shown.handicap}
          hint="A plus handicap with “+”, e.g. +1.5"
          inputMode="decimal"
        />
      </FormRow>
      <TextField label="Usual miss" value={text.usualMiss} onChangeText={set('usualMiss')} error={shown.usualMiss} />
      <TextField label="Goals" value={text.goals} onChangeText={set('goals')} error={shown.goals} multiline numberOfLines={4} />
      <View style={styles.actions}>
        <Button title={submitTitle} onPress={submit} busy={busy} />
        <Button title="Cancel" variant="quiet" onPress={onCancel} disabled={busy} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
