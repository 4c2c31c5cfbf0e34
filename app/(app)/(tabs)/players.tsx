import { useRouter } from 'expo-router';
import { useState } from 'react';
import { PlayerList } from '@/components/players/player-list';
import { useDebouncedValue } from '@/components/use-debounced-value';
import { Button } from '@/components/ui/button';
import { FormRow } from '@/components/ui/form-row';
import { Screen } from '@/components/ui/screen';
import { SelectField } from '@/components/ui/select-field';
import { SwitchField } from '@/components/ui/switch-field';
import { TextField } from '@/components/ui/text-field';
import type { PlayerSort } from '@/server/schemas';

const PLAYER_SORTS: readonly { value: PlayerSort; label: string }[] = [
  { value: 'name-asc', label: 'Name A–Z' },
  { value: 'name-desc', label: 'Name Z–A' },
  { value: 'newest', label: 'Newest first' },
  { value: 'oldest', label: 'Oldest first' },
];

export default function PlayersScreen() {
  const router = useRouter();
  const [search, setSearch] = useState('');
  const settled = useDebouncedValue(search);
  const [sort, setSort] = useState<PlayerSort>('name-asc');
  const [showArchived, setShowArchived] = useState(false);
  const newPlayer = <Button title="New player" onPress={() => router.push('/players/new')} />;
  return (
    <Screen>
      <FormRow>
        <TextField
          label="Search players"
          value={search}
          onChangeText={setSearch}
          placeholder="Name or e-mail"
          autoCapitalize="none"
          autoCorrect={false}
          inputMode="search"
        />
        <SelectField label="Order" value={sort} options={PLAYER_SORTS} onChange={(v) => setSort(v as PlayerSort)} />
      </FormRow>
      <SwitchField label="Show archived players" value={showArchived} onChange={setShowArchived} />
      <Button title="New player" variant="secondary" compact onPress={() => router.push('/players/new')} />
      <PlayerList search={settled} sort={sort} showArchived={showArchived} emptyAction={newPlayer} />
    </Screen>
  );
}
