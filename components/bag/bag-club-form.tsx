import { StyleSheet, View } from 'react-native';
import { clubInfo } from '@/analysis/clubs';
import type { UnitSystem } from '@/analysis/units';
import type { BagClub } from '@/server/schemas';
import { ApiError, errorMessage } from '../api-client';
import { SpecFields } from '../builds/spec-fields';
import { WorkshopCaution } from '../builds/workshop-caution';
import { WorkshopEffectsNote } from '../builds/workshop-effects-note';
import { space } from '../theme';
import { Button } from '../ui/button';
import { ChoiceField } from '../ui/choice-field';
import { FormRow } from '../ui/form-row';
import { Notice } from '../ui/notice';
import { SelectField } from '../ui/select-field';
import { TextField } from '../ui/text-field';
import { useTextForm } from '../use-text-form';
import { bagClubFormText, CLUB_OPTIONS, parseBagClubForm, type BagClubFormBody } from './bag-club-form-values';
import { STATUS_OPTIONS } from './bag-words';

type BagClubFormProps = {
  club?: BagClub;
  units: UnitSystem;
  busy: boolean;
  error: unknown;
  onSubmit: (body: BagClubFormBody) => void;
  onCancel: () => void;
  /** After a 409: reload the club and start again. */
  onReload?: () => void;
};

/** A bag club: which club, its status and build spec, an entered carry, the date it went in, wedge wear. */
export function BagClubForm({ club, units, busy, error, onSubmit, onCancel, onReload }: BagClubFormProps) {
  const { text, set, errors, shown, submit } = useTextForm(() => bagClubFormText(club, units), (t) => parseBagClubForm(t, units), onSubmit, error);
  const conflict = error instanceof ApiError && error.code === 'VERSION_CONFLICT';
  const wedge = clubInfo(text.club)?.kind === 'wedge';
  const number = { inputMode: 'decimal' as const };
  return (
    <View style={styles.form}>
      {conflict ? (
        <Notice tone="caution" title="Changed by someone else">
          {errorMessage(error)}
          {onReload ? <Button title="Reload the club" variant="secondary" compact onPress={onReload} /> : null}
        </Notice>
      ) : error ? (
        <Notice tone="danger">{errorMessage(error)}</Notice>
      ) : null}
      {Object.keys(errors).length > 0 ? <Notice tone="danger">Some fields need a look; see the notes under them.</Notice> : null}
      <FormRow>
        <SelectField label="Club" value={text.club} options={CLUB_OPTIONS} onChange={set('club')} />
        <TextField label="In the bag since" value={text.inBagSince} onChangeText={set('inBagSince')} placeholder="YYYY-MM-DD" error={shown.inBagSince} />
      </FormRow>
      <ChoiceField label="Status" value={text.status} options={STATUS_OPTIONS} onChange={set('status')} />
      <SpecFields club={text.club} text={text} set={set} errors={shown} />
      <WorkshopEffectsNote saved={{ addedMassG: club?.addedMassG ?? null, lengthIn: club?.lengthIn ?? null, swingWeight: club?.swingWeight ?? null }} text={text} />
      <TextField
        label="Carry, entered"
        suffix={units === 'imperial' ? 'yd' : 'm'}
        value={text.carryEntered}
        onChangeText={set('carryEntered')}
        error={shown.carryEntered}
        hint="Used when no fitting has hit this club"
        {...number}
      />
      {wedge ? (
        <FormRow>
          <TextField label="Rounds since it went in" value={text.roundsSince} onChangeText={set('roundsSince')} error={shown.roundsSince} inputMode="numeric" />
          <TextField label="Practice sessions since" value={text.practiceSessionsSince} onChangeText={set('practiceSessionsSince')} error={shown.practiceSessionsSince} inputMode="numeric" />
        </FormRow>
      ) : null}
      <WorkshopCaution />
      <View style={styles.actions}>
        <Button title="Save" onPress={submit} busy={busy} />
        <Button title="Cancel" variant="quiet" onPress={onCancel} disabled={busy} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
