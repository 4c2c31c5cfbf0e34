import { useLocalSearchParams } from 'expo-router';
import { SpecSheetPage } from '@/components/bag/spec-sheet-page';
import { useFittingSpecSheetQuery } from '@/components/queries/spec-sheets';

/** /fittings/:id/spec-sheet — the fitting's sheet: the draft (staff) or the sent one. */
export default function FittingSpecSheetScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <SpecSheetPage query={useFittingSpecSheetQuery(id)} loadingLabel="Writing up the spec sheet…" />;
}
