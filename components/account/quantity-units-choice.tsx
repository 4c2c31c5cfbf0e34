import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { Me, UpdateMeBody } from '@/server/schemas';
import { api, errorMessage } from '../api-client';
import { meKeys } from '../queries/me';
import { AppText } from '../ui/app-text';
import { ChoiceField } from '../ui/choice-field';

type QuantityUnitsChoiceProps = { me: Me };

const LENGTH = [
  { value: 'in', label: 'Inches' },
  { value: 'cm', label: 'Centimetres' },
] as const;
const ALTITUDE = [
  { value: 'ft', label: 'Feet' },
  { value: 'm', label: 'Metres' },
] as const;
const TEMPERATURE = [
  { value: 'f', label: '°F' },
  { value: 'c', label: '°C' },
] as const;

/** Lengths and heights, altitude and temperature, each on its own (they follow the units above until changed). */
export function QuantityUnitsChoice({ me }: QuantityUnitsChoiceProps) {
  const queryClient = useQueryClient();
  const update = useMutation({
    mutationFn: (body: UpdateMeBody) => api.patch<Me>('/me', body),
    onSuccess: (next) => queryClient.setQueryData(meKeys.all, next),
  });
  return (
    <>
      <ChoiceField label="Heights and club lengths" value={me.lengthUnit} options={LENGTH} onChange={(v) => update.mutate({ lengthUnit: v })} />
      <ChoiceField label="Altitude" value={me.altitudeUnit} options={ALTITUDE} onChange={(v) => update.mutate({ altitudeUnit: v })} />
      <ChoiceField label="Temperature" value={me.temperatureUnit} options={TEMPERATURE} onChange={(v) => update.mutate({ temperatureUnit: v })} />
      {update.error ? (
        <AppText variant="caption" tone="danger" accessibilityRole="alert">
          {errorMessage(update.error)}
        </AppText>
      ) : null}
    </>
  );
}
