import type { Fitting } from '@/server/schemas';
import { EmptyState } from '../ui/empty-state';

type FittingAnalysisAreaProps = { fitting: Fitting };

/**
 * The slot for a fitting's shots and analysis (bay file import, groups, ovals, head-to-head).
 * For now it says that nothing has been imported; the import and analysis come in later work.
 */
export function FittingAnalysisArea({ fitting }: FittingAnalysisAreaProps) {
  if (fitting.shotCount === 0) {
    return (
      <EmptyState
        title="No bay file imported yet"
        message="Once a bay file of this fitting is imported, its shots, groups and ovals appear here."
      />
    );
  }
  return (
    <EmptyState
      title={`${fitting.shotCount} shots recorded`}
      message="The analysis of these shots will appear here."
    />
  );
}
