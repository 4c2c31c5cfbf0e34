import { useRouter } from 'expo-router';
import type { ReactNode } from 'react';
import type { FittingFilters } from '@/server/schemas';
import { useFittingsQuery } from '../queries/fittings';
import { EmptyState } from '../ui/empty-state';
import { ErrorState } from '../ui/error-state';
import { LoadingState } from '../ui/loading-state';
import { ResponsiveGrid } from '../ui/responsive-grid';
import { FittingRow } from './fitting-row';

type FittingListProps = {
  filters: FittingFilters;
  emptyTitle: string;
  emptyMessage: string;
  emptyAction?: ReactNode;
  showPlayer?: boolean;
};

/** Fittings in the order the server sends them (newest first unless sorted), with loading, error and empty states. */
export function FittingList({ filters, emptyTitle, emptyMessage, emptyAction, showPlayer = true }: FittingListProps) {
  const router = useRouter();
  const query = useFittingsQuery(filters);
  if (query.isPending) return <LoadingState label="Loading fittings…" />;
  if (query.isError) return <ErrorState error={query.error} onRetry={() => void query.refetch()} />;
  if (query.data.length === 0) return <EmptyState title={emptyTitle} message={emptyMessage} action={emptyAction} />;
  return (
    <ResponsiveGrid>
      {query.data.map((f) => (
        <FittingRow
          key={f.id}
          fitting={f}
          showPlayer={showPlayer}
          onPress={() => router.push({ pathname: '/fittings/[id]', params: { id: f.id } })}
        />
      ))}
    </ResponsiveGrid>
  );
}
