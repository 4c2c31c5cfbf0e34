import type { Fitting } from '@/server/schemas';
import { formatDate, formatVenue, plural } from '../format';
import { Card } from '../ui/card';
import { DetailList } from '../ui/detail-list';

type FittingDetailsProps = { fitting: Fitting };

const withUnit = (n: number | null, unit: string) => (n === null ? null : `${n} ${unit}`);

/** Who, when, where and in which conditions. Conditions are kept in °C, m and %. */
export function FittingDetails({ fitting }: FittingDetailsProps) {
  return (
    <Card>
      <DetailList
        items={[
          { label: 'Player', value: fitting.playerName },
          { label: 'Fitter', value: fitting.fitterName },
          { label: 'Date', value: formatDate(fitting.date) },
          { label: 'Venue', value: formatVenue(fitting.venue) + (fitting.remote ? ' · remote' : '') },
          { label: 'Temperature', value: withUnit(fitting.temperatureC, '°C') },
          { label: 'Altitude', value: withUnit(fitting.altitudeM, 'm') },
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
