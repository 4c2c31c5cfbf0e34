import { StyleSheet, View } from 'react-native';
import { COURSE_STEP_WORDS, COURSE_STEPS, type Course } from '@/server/schemas';
import { formatDateTime } from '../format';
import { colors, radius, space } from '../theme';
import { AppText } from '../ui/app-text';

type CourseStepsProps = { course: Course };

/** The seven steps of a fitting, each done one with its date; a step back shows with its reason. */
export function CourseSteps({ course }: CourseStepsProps) {
  const current = COURSE_STEPS.indexOf(course.step);
  // The latest forward entry of each step dates it.
  const dated = new Map<string, string>();
  for (const e of course.entries) if (e.direction === 'forward' || e.step === course.step) dated.set(e.step, e.at);
  const backs = course.entries.filter((e) => e.direction === 'back');
  return (
    <View style={styles.list} accessibilityLabel={`Course of the fitting: ${COURSE_STEP_WORDS[course.step]}`}>
      {COURSE_STEPS.map((step, i) => {
        const done = i <= current;
        const at = done ? dated.get(step) : undefined;
        return (
          <View key={step} style={styles.row}>
            <View style={[styles.dot, done && styles.done, i === current && styles.current]} />
            <AppText variant={i === current ? 'bodyStrong' : 'body'} tone={done ? 'default' : 'muted'} style={styles.word}>
              {COURSE_STEP_WORDS[step]}
            </AppText>
            <AppText variant="caption" tone="muted">
              {at ? formatDateTime(at) : done ? 'done' : ''}
            </AppText>
          </View>
        );
      })}
      {backs.map((e) => (
        <AppText key={e.id} variant="caption" tone="muted">
          {`Back to “${COURSE_STEP_WORDS[e.step]}” on ${formatDateTime(e.at)}${e.byName ? ` by ${e.byName}` : ''}: ${e.reason ?? ''}`}
        </AppText>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: 28 },
  dot: { width: 12, height: 12, borderRadius: radius.pill, borderWidth: 2, borderColor: colors.border, backgroundColor: colors.surface },
  done: { backgroundColor: colors.success, borderColor: colors.success },
  current: { backgroundColor: colors.accent, borderColor: colors.accent },
  word: { flex: 1 },
});
