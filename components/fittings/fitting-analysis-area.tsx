import type { Fitting } from '@/server/schemas';
import { AnalysisPanel } from '../analysis/analysis-panel';
import { EmptyState } from '../ui/empty-state';

type FittingAnalysisAreaProps = { fitting: Fitting };

/** The fitting's shots and analysis, once a bay file is in. */
export function FittingAnalysisArea({ fitting }: FittingAnalysisAreaProps) {
  if (fitting.shotCount === 0) {
    return (
      <EmptyState
        title="No bay file imported yet"
        message="Import the launch monitor’s export of this session: its shots, groups and ovals appear here."
      />
    );
  }
  return <AnalysisPanel fitting={fitting} />;
}
