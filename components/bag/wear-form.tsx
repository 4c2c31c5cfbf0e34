import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { BagClub } from '@/server/schemas';
import { ApiError, errorMessage } from '../api-client';
import { parseOptionalNumber } from '../forms';
import { useUpdateWearMutation } from '../queries/bags';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { FormRow } from '../ui/form-row';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';

type WearFormProps = { club: BagClub; limits: { rounds: number; practiceSessions: number } };

const count = (text: string): number | null => {
  const n = parseOptionalNumber(text);
  return n !== null && Number.isInteger(n) && n >= 0 && n <= 10_000 ? n : null;
};

/** A wedge's rounds and practice sessions since it went in: the player or the fitter keeps them. */
export function WearForm({ club, limits }: WearFormProps) {
  const save = useUpdateWearMutation();
  const [rounds, setRounds] = useState(String(club.roundsSince));
  const [sessions, setSessions] = useState(String(club.practiceSessionsSince));
  const [invalid, setInvalid] = useState(false);
  const submit = () => {
    const r = count(rounds);
    const s = count(sessions);
    setInvalid(r === null || s === null);
    if (r === null || s === null) return;
    save.mutate({ id: club.id, change: { roundsSince: r, practiceSessionsSince: s, version: club.version } });
  };
  const conflict = save.error instanceof ApiError && save.error.code === 'VERSION_CONFLICT';
  return (
    <View style={styles.form}>
      <AppText tone="muted">{`Grooves wear with use. The shop reminds you after ${limits.rounds} rounds or ${limits.practiceSessions} practice sessions.`}</AppText>
      <FormRow>
        <TextField label="Rounds" value={rounds} onChangeText={setRounds} inputMode="numeric" error={invalid && count(rounds) === null ? 'A whole number, 0 or more.' : undefined} />
        <TextField label="Practice sessions" value={sessions} onChangeText={setSessions} inputMode="numeric" error={invalid && count(sessions) === null ? 'A whole number, 0 or more.' : undefined} />
      </FormRow>
      {save.error ? <Notice tone={conflict ? 'caution' : 'danger'}>{conflict ? 'Someone changed this wedge since you opened it. Check the counts and save again.' : errorMessage(save.error)}</Notice> : null}
      {save.isSuccess ? <Notice tone="success">Saved.</Notice> : null}
      <Button title="Save the counts" variant="secondary" compact onPress={submit} busy={save.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({ form: { gap: space.md } });
