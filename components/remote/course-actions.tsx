import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { COURSE_STEP_WORDS, type Course, type CourseStep } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { useMoveCourseMutation } from '../queries/fitting-course';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { SelectField } from '../ui/select-field';
import { TextField } from '../ui/text-field';
import { earlierSteps, nextStaffStep } from './course-moves';

type CourseActionsProps = { fittingId: string; course: Course };

/** The staff's moves: on one step, or back to an earlier one with the reason (the player is told). */
export function CourseActions({ fittingId, course }: CourseActionsProps) {
  const move = useMoveCourseMutation(fittingId);
  const next = nextStaffStep(course.step);
  const earlier = earlierSteps(course.step);
  const [back, setBack] = useState(false);
  const [to, setTo] = useState<CourseStep | null>(null);
  const [reason, setReason] = useState('');
  const target = to && earlier.includes(to) ? to : (earlier.at(-1) ?? null);
  return (
    <View style={styles.box}>
      <View style={styles.row}>
        {next ? <Button compact title={`Mark “${COURSE_STEP_WORDS[next]}”`} busy={move.isPending} onPress={() => move.mutate({ to: next })} /> : null}
        {earlier.length > 0 && !back ? <Button compact variant="quiet" title="Send back a step…" onPress={() => setBack(true)} /> : null}
      </View>
      {back && target ? (
        <View style={styles.box}>
          <SelectField label="Back to" value={target} options={earlier.map((s) => ({ value: s, label: COURSE_STEP_WORDS[s] }))} onChange={setTo} />
          <TextField label="Why (the player reads this)" value={reason} onChangeText={setReason} maxLength={500} />
          <View style={styles.row}>
            <Button
              compact
              variant="secondary"
              title="Send back"
              busy={move.isPending}
              onPress={() => move.mutate({ to: target, reason }, { onSuccess: () => { setBack(false); setReason(''); } })}
            />
            <Button compact variant="quiet" title="Cancel" onPress={() => setBack(false)} />
          </View>
        </View>
      ) : null}
      {move.error ? <AppText tone="danger">{errorMessage(move.error)}</AppText> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
