import type { Fitting } from '@/server/schemas';
import { formatAir, formatDate, formatVenue, plural } from '../format';
import { Card } from '../ui/card';
import { DetailList } from '../ui/detail-list';
import { useMe } from '../session/session-provider';

type FittingDetailsProps = { fitting: Fitting };

const withUnit = (n: number | null, unit: string) => (n === null ? null : `${Math.round(n * 10) / 10} ${unit}`);

/** Who, when, where and in which conditions (kept in °C, m and %; shown in the user's units). */
export function FittingDetails({ fitting }: FittingDetailsProps) {
  const me = useMe();
  return (
    <Card>
      <DetailList
        items={[
          { label: 'Player', value: fitting.playerName },
          { label: 'Fitter', value: fitting.fitterName },
          { label: 'Date', value: formatDate(fitting.date) },
          { label: 'Venue', value: formatVenue(fitting.venue) + (fitting.remote ? ' · remote' : '') },
          { label: 'Temperature', value: fitting.temperatureC === null ? null : formatAir(fitting.temperatureC, 'temperature', me) },
          { label: 'Altitude', value: fitting.altitudeM === null ? null : formatAir(fitting.altitudeM, 'altitude', me) },
          { label: 'Humidity', value: withUnit(fitting.humidityPct, '%') },
          { label: 'Ground', value: fitting.groundFirmness ? `${fitting.groundFirmness[0].toUpperCase()}${fitting.groundFirmness.slice(1)}` : null },
          { label: 'Ball', value: fitting.ball },
          { label: 'Shots', value: plural(fitting.shotCount, 'shot') },
          { label: 'Notes', value: fitting.notes },
        ]}
      />
    </Card>
  );
}
