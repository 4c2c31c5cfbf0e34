import { View } from 'react-native';
import type { Fitting } from '@/server/schemas';
import { LadderChart } from '../charts';
import { formatField } from '../format-field';
import { useWidth } from '../analysis/use-width';
import { useFittingAnalysisQuery } from '../queries/analysis';
import { useMe } from '../session/session-provider';
import { AppText } from '../ui/app-text';
import { Card } from '../ui/card';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import type { FittingPageState } from './use-fitting-page-state';

type LadderViewProps = { fitting: Fitting; state: FittingPageState };

/** The clubs hit in this fitting as a ladder: median carries and the gaps between neighbours. */
export function LadderView({ fitting, state }: LadderViewProps) {
  const me = useMe();
  const [width, onLayout] = useWidth();
  const query = useFittingAnalysisQuery(fitting.id, { level: 0.95, includeStrays: state.includeStrays, compare: null, to: state.to, odds: state.odds });
  if (query.isPending) return <LoadingState label="Working out the ladder…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  const ladder = query.data.analysis.ladder;
  return (
    <Card>
      <View onLayout={onLayout}>
        {width > 0 && ladder.length > 0 ? <LadderChart rungs={ladder} units={me.units} widthPx={width} /> : <AppText tone="muted">No carries to ladder.</AppText>}
      </View>
      <AppText variant="caption" tone="muted">
        {`Median carry of the kept shots per club. Gaps of about ${formatField(9.144, 'carry', me.units)} to ${formatField(13.716, 'carry', me.units)} between irons are usual (common practice); tight and wide gaps are marked only between clubs that sit next to each other in a bag (“clubs skipped”: a club between was not hit).`}
      </AppText>
    </Card>
  );
}
