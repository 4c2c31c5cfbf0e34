import { useState } from 'react';
import { Pressable, StyleSheet, useWindowDimensions, View } from 'react-native';
import { COURSE_STEP_WORDS, COURSE_STEPS, type Course } from '@/server/schemas';
import { formatDateTime } from '../format';
import { colors, radius, space } from '../theme';
import { AppText } from '../ui/app-text';

type CourseStepsProps = { course: Course };

/** Below this width the steps fold into one line and a bar, with every step a tap away. */
const FOLD_BELOW_PX = 700;

/**
 * The seven steps of a fitting, each done one with its date; a step back shows with its reason.
 * On a phone the list folds into a bar of seven and the current step with its date.
 */
export function CourseSteps({ course }: CourseStepsProps) {
  const { width } = useWindowDimensions();
  const [open, setOpen] = useState(false);
  const current = COURSE_STEPS.indexOf(course.step);
  // The latest forward entry of each step dates it.
  const dated = new Map<string, string>();
  for (const e of course.entries) if (e.direction === 'forward' || e.step === course.step) dated.set(e.step, e.at);
  const backs = course.entries.filter((e) => e.direction === 'back');
  if (width < FOLD_BELOW_PX && !open) {
    const at = dated.get(course.step);
    return (
      <View style={styles.list} accessibilityLabel={`Course of the fitting: ${COURSE_STEP_WORDS[course.step]}`}>
        <View style={styles.bar} accessibilityElementsHidden importantForAccessibility="no-hide-descendants">
          {COURSE_STEPS.map((step, i) => (
            <View key={step} style={[styles.segment, i <= current && dated.has(step) && styles.done, i === current && styles.current]} />
          ))}
        </View>
        <View style={styles.row}>
          <AppText variant="bodyStrong" style={styles.word}>
            {`${COURSE_STEP_WORDS[course.step]} · step ${current + 1} of ${COURSE_STEPS.length}`}
          </AppText>
          <AppText variant="caption" tone="muted">
            {at ? formatDateTime(at) : ''}
          </AppText>
        </View>
        {backs.length > 0 ? (
          <AppText variant="caption" tone="muted">{`Went back ${backs.length === 1 ? 'once' : `${backs.length} times`}: see every step.`}</AppText>
        ) : null}
        <Pressable accessibilityRole="button" onPress={() => setOpen(true)} style={styles.toggle} hitSlop={8}>
          <AppText tone="accent" variant="caption">
            Every step, with dates
          </AppText>
        </Pressable>
      </View>
    );
  }
  return (
    <View style={styles.list} accessibilityLabel={`Course of the fitting: ${COURSE_STEP_WORDS[course.step]}`}>
      {COURSE_STEPS.map((step, i) => {
        const done = i <= current;
        const at = done ? dated.get(step) : undefined;
        // passed over without a date: a fitting in the bay starts "in progress", a fitter may start without the intake
        const skipped = done && !at && i < current;
        return (
          <View key={step} style={styles.row}>
            <View style={[styles.dot, done && !skipped && styles.done, i === current && styles.current]} />
            <AppText variant={i === current ? 'bodyStrong' : 'body'} tone={done && !skipped ? 'default' : 'muted'} style={styles.word}>
              {COURSE_STEP_WORDS[step]}
            </AppText>
            <AppText variant="caption" tone="muted">
              {at ? formatDateTime(at) : skipped ? 'skipped' : ''}
            </AppText>
          </View>
        );
      })}
      {backs.map((e) => (
        <AppText key={e.id} variant="caption" tone="muted">
          {`Back to “${COURSE_STEP_WORDS[e.step]}” on ${formatDateTime(e.at)}${e.byName ? ` by ${e.byName}` : ''}: ${e.reason ?? ''}`}
        </AppText>
      ))}
      {open && width < FOLD_BELOW_PX ? (
        <Pressable accessibilityRole="button" onPress={() => setOpen(false)} style={styles.toggle} hitSlop={8}>
          <AppText tone="accent" variant="caption">
            Fold the steps
          </AppText>
        </Pressable>
      ) : null}
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
  bar: { flexDirection: 'row', gap: 4 },
  segment: { flex: 1, height: 8, borderRadius: radius.pill, backgroundColor: colors.border },
  toggle: { minHeight: 44, justifyContent: 'center', alignSelf: 'flex-start' },
});
