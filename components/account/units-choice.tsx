import type { UnitsPreference } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { useUpdateUnitsMutation } from '../queries/me';
import { AppText } from '../ui/app-text';
import { ChoiceField } from '../ui/choice-field';

type UnitsChoiceProps = { units: UnitsPreference };

const OPTIONS = [
  { value: 'imperial', label: 'Yards · mph' },
  { value: 'metric', label: 'Metres · km/h' },
] as const;

/** Distances and speeds in yards/mph or metres/km/h; saved to the account at once. */
export function UnitsChoice({ units }: UnitsChoiceProps) {
  const update = useUpdateUnitsMutation();
  const shown = update.isPending && update.variables ? update.variables : units;
  return (
    <>
      <ChoiceField label="Units for distances and speeds" value={shown} options={OPTIONS} onChange={(u) => u !== units && update.mutate(u)} />
      {update.error ? (
        <AppText variant="caption" tone="danger" accessibilityRole="alert">
          {errorMessage(update.error)}
        </AppText>
      ) : update.isSuccess ? (
        <AppText variant="caption" tone="muted">
          Saved.
        </AppText>
      ) : null}
    </>
  );
}
