import { useLocalSearchParams } from 'expo-router';
import { SpecSheetPage } from '@/components/bag/spec-sheet-page';
import { useSpecSheetQuery } from '@/components/queries/spec-sheets';

/** /spec-sheets/:id — a sent sheet, as the e-mail links it: the player reads and accepts it here. */
export default function SpecSheetScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <SpecSheetPage query={useSpecSheetQuery(id)} loadingLabel="Loading the spec sheet…" />;
}
