import { useRouter } from 'expo-router';
import { useState } from 'react';
import { PlayerList } from '@/components/players/player-list';
import { useDebouncedValue } from '@/components/use-debounced-value';
import { Button } from '@/components/ui/button';
import { FormRow } from '@/components/ui/form-row';
import { Screen } from '@/components/ui/screen';
import { TextField } from '@/components/ui/text-field';

export default function PlayersScreen() {
  const router = useRouter();
  const [search, setSearch] = useState('');
  const settled = useDebouncedValue(search);
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
      </FormRow>
      <Button title="New player" variant="secondary" compact onPress={() => router.push('/players/new')} />
      <PlayerList search={settled} emptyAction={newPlayer} />
    </Screen>
  );
}
