import { useTeamQuery } from '../queries/team';
import { EmptyState } from '../ui/empty-state';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { ResponsiveGrid } from '../ui/responsive-grid';
import { TeamMemberRow } from './team-member-row';

type TeamListProps = { selfId: string };

/** The shop's owner and fitters, with loading, error and empty states. */
export function TeamList({ selfId }: TeamListProps) {
  const query = useTeamQuery();
  if (query.isPending) return <LoadingState label="Loading the team…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  if (query.data.length === 0) return <EmptyState title="No team yet" message="Add the fitters who work in your shop." />;
  return (
    <ResponsiveGrid>
      {query.data.map((m) => (
        <TeamMemberRow key={m.id} member={m} isSelf={m.id === selfId} />
      ))}
    </ResponsiveGrid>
  );
}
