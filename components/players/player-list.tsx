import type { PlayerSort } from '@/server/schemas';
import { useRouter } from 'expo-router';
import type { ReactNode } from 'react';
import { usePlayersQuery } from '../queries/players';
import { EmptyState } from '../ui/empty-state';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { ResponsiveGrid } from '../ui/responsive-grid';
import { PlayerRow } from './player-row';

type PlayerListProps = { search: string; emptyAction?: ReactNode; sort?: PlayerSort; showArchived?: boolean };

/** The shop's players matching a search, with loading, error and empty states. */
export function PlayerList({ search, emptyAction, sort = 'name-asc', showArchived = false }: PlayerListProps) {
  const router = useRouter();
  const query = usePlayersQuery({ q: search.trim() || undefined, sort, archived: showArchived ? 'show' : 'hide' });
  if (query.isPending) return <LoadingState label="Loading players…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  if (query.data.length === 0) {
    return search.trim() ? (
      <EmptyState title="No player matches" message={`Nobody in your shop matches “${search.trim()}”. Check the spelling or add them.`} />
    ) : (
      <EmptyState title="No players yet" message="Add the first player you are fitting; their fittings will collect here." action={emptyAction} />
    );
  }
  return (
    <ResponsiveGrid>
      {query.data.map((p) => (
        <PlayerRow key={p.id} player={p} onPress={() => router.push({ pathname: '/players/[id]', params: { id: p.id } })} />
      ))}
    </ResponsiveGrid>
  );
}
