import { useRouter } from 'expo-router';
import type { Fitting } from '@/server/schemas';
import { Button } from '../ui/button';
import { EmptyState } from '../ui/empty-state';
import { BaySafetyNote } from './bay-safety-note';

type FittingStartProps = { fitting: Fitting; canImport: boolean };

/** A fitting with no shots yet: where the session starts, with the bay's caution. */
export function FittingStart({ fitting, canImport }: FittingStartProps) {
  const router = useRouter();
  return (
    <>
      <BaySafetyNote />
      <EmptyState
        title="No bay file imported yet"
        message="Import the launch monitor’s export of this session: its shots, groups and ovals appear here."
      />
      {canImport ? <Button title="Import a bay file" onPress={() => router.push({ pathname: '/fittings/[id]/import', params: { id: fitting.id } })} /> : null}
    </>
  );
}
