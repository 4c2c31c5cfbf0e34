import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import type { Fitting } from '@/server/schemas';
import { plural } from '../format';
import { useCourseQuery } from '../queries/fitting-course';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { CourseActions } from './course-actions';
import { waitingFor } from './course-moves';
import { CourseSteps } from './course-steps';

type CourseSectionProps = { fitting: Fitting; staff: boolean };

/** Where the fitting stands, for both sides: the steps with dates, what comes next, the intake and messages. */
export function CourseSection({ fitting, staff }: CourseSectionProps) {
  const router = useRouter();
  const query = useCourseQuery(fitting.id);
  if (query.isPending) return <LoadingState label="Loading the course…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  const course = query.data;
  const messages = fitting.unreadMessages > 0 ? `Messages (${plural(fitting.unreadMessages, 'unread')})` : 'Messages';
  return (
    <Card>
      <View style={styles.box}>
        <CourseSteps course={course} />
        <AppText tone="muted">{waitingFor(course.step, staff)}</AppText>
        {staff ? <CourseActions fittingId={fitting.id} course={course} /> : null}
        <View style={styles.row}>
          {fitting.remote ? (
            <Button compact variant="secondary" title={staff ? 'Intake' : 'Your intake'} onPress={() => router.push({ pathname: '/fittings/[id]/intake', params: { id: fitting.id } })} />
          ) : null}
          <Button compact variant="secondary" title={messages} accessibilityLabel={messages} onPress={() => router.push({ pathname: '/fittings/[id]/messages', params: { id: fitting.id } })} />
        </View>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
