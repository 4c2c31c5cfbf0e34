import { useRouter } from 'expo-router';
import { useState } from 'react';
import { FittingFilterBar, hasFittingFilters, NO_FITTING_FILTERS, type FittingFilterText } from '@/components/fittings/fitting-filter-bar';
import { FittingList } from '@/components/fittings/fitting-list';
import { useDebouncedValue } from '@/components/use-debounced-value';
import { Button } from '@/components/ui/button';
import { Screen } from '@/components/ui/screen';
import { RequestLinkNote } from '@/components/remote/request-link-note';
import { SwitchField } from '@/components/ui/switch-field';

export default function FittingsScreen() {
  const router = useRouter();
  const [filters, setFilters] = useState<FittingFilterText>(NO_FITTING_FILTERS);
  const q = useDebouncedValue(filters.q);
  const [showArchived, setShowArchived] = useState(false);
  const filtered = hasFittingFilters(filters);
  return (
    <Screen>
      <Button title="New fitting" variant="secondary" compact onPress={() => router.push('/fittings/new')} />
      <RequestLinkNote />
      <FittingFilterBar value={filters} onChange={setFilters} />
      <SwitchField label="Show archived fittings" value={showArchived} onChange={setShowArchived} />
      <FittingList
        filters={{ q: q.trim() || undefined, from: filters.from || undefined, to: filters.to || undefined, sort: filters.sort, step: filters.step === 'any' ? undefined : filters.step, archived: showArchived ? 'show' : 'hide' }}
        emptyTitle={filtered ? 'No fitting matches' : 'No fittings yet'}
        emptyMessage={
          filtered
            ? 'No fitting of your shop matches this search, these dates and this step. Clear the filters to see them all.'
            : "A fitting is one appointment: a player, a date and a venue. Start one from here or from a player's page."
        }
        emptyAction={filtered ? undefined : <Button title="New fitting" onPress={() => router.push('/fittings/new')} />}
      />
    </Screen>
  );
}
