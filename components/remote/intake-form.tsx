import { StyleSheet, View } from 'react-native';
import type { Intake, IntakeBody, Player } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { ChoiceField } from '../ui/choice-field';
import { FormRow } from '../ui/form-row';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';
import { useTextForm } from '../use-text-form';
import { intakeFormText, parseIntakeForm, type LengthUnit } from './intake-form-values';

type IntakeFormProps = {
  unit: LengthUnit;
  intake: Intake | null;
  player: Player | null;
  busy: boolean;
  error: unknown;
  onSubmit: (body: IntakeBody) => void;
};

const HANDEDNESS = [
  { value: 'right', label: 'Right-handed' },
  { value: 'left', label: 'Left-handed' },
] as const;

/** The player's intake, phone first; checked with the server's schema before it is sent. */
export function IntakeForm({ unit, intake, player, busy, error, onSubmit }: IntakeFormProps) {
  const { text, set, errors, shown, submit } = useTextForm(() => intakeFormText(unit, intake, player), (t) => parseIntakeForm(t, unit), onSubmit, error);
  return (
    <View style={styles.form}>
      {error ? <Notice tone="danger">{errorMessage(error)}</Notice> : null}
      {Object.keys(errors).length > 0 ? <Notice tone="danger">Some answers need a look; see the notes under them.</Notice> : null}
      <ChoiceField label="You play" value={text.handedness} options={HANDEDNESS} onChange={set('handedness')} />
      <FormRow>
        <TextField label="Height" suffix={unit} value={text.height} onChangeText={set('height')} error={shown.height} inputMode="decimal" />
        <TextField label="Wrist to floor" suffix={unit} value={text.wristToFloor} onChangeText={set('wristToFloor')} error={shown.wristToFloor} inputMode="decimal" />
      </FormRow>
      <Notice tone="info" title="Measuring wrist to floor">
        Stand tall in flat shoes on a hard floor, arms hanging loose and shoulders relaxed. Ask someone to measure from the crease where your wrist meets your hand straight down to the floor. Measure both sides and give the longer.
      </Notice>
      <TextField label="Handicap index (optional)" value={text.handicap} onChangeText={set('handicap')} error={shown.handicap} hint="A plus handicap with “+”, e.g. +1.5; at most 54" inputMode="decimal" />
      <TextField label="Your usual miss" value={text.usualMiss} onChangeText={set('usualMiss')} error={shown.usualMiss} placeholder="e.g. right with the driver" />
      <TextField label="How the ball flies now" value={text.ballFlightNow} onChangeText={set('ballFlightNow')} error={shown.ballFlightNow} placeholder="e.g. high, curving right" />
      <TextField label="How you want it to fly" value={text.ballFlightWanted} onChangeText={set('ballFlightWanted')} error={shown.ballFlightWanted} placeholder="e.g. lower and straighter" />
      <TextField label="What you want from the fitting" value={text.wishes} onChangeText={set('wishes')} error={shown.wishes} multiline numberOfLines={4} />
      <AppText variant="caption" tone="muted">
        Sending updates your profile with these measures; your fitter is told the intake is in.
      </AppText>
      {Object.keys(errors).length > 0 ? <Notice tone="danger">{`Not sent yet: ${Object.values(errors).join(' ')}`}</Notice> : null}
      <Button title={intake ? 'Send the changes' : 'Send the intake'} onPress={submit} busy={busy} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.lg } });
