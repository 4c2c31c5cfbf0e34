import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { clubInfo } from '@/analysis/clubs';
import { celsiusTo, metresTo, toCelsius, toMetres, UNIT_SYMBOL, type AltitudeUnit, type TemperatureUnit, type UnitSystem } from '@/analysis/units';
import { shown } from '../fittings/fitting-form-values';
import { formatField } from '../format-field';
import { parseOptionalNumber } from '../forms';
import type { AnalysisParams } from '../queries/analysis';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { ChoiceField } from '../ui/choice-field';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';
import type { CourseChange } from './course-changes';

type CourseConditionsProps = {
  value: AnalysisParams['to'];
  onChange: (to: AnalysisParams['to']) => void;
  /** What changed for the chosen club, shown right under the buttons. */
  changes: readonly CourseChange[];
  busy: boolean;
  units: UnitSystem;
  /** The user's units for altitude and temperature (the request stays in metres and °C). */
  altitudeUnit: AltitudeUnit;
  temperatureUnit: TemperatureUnit;
};

const FIRMNESS = [
  { value: 'soft', label: 'Soft' },
  { value: 'normal', label: 'Normal' },
  { value: 'firm', label: 'Firm' },
] as const;

const signed = (m: number, units: UnitSystem) => `${m >= 0 ? '+' : '−'}${formatField(Math.abs(m), 'carry', units)}`;

/**
 * The player's course (altitude, temperature, humidity, ground): the figures carried over by the
 * ball-flight model, and what that changed, where the fitter is looking. The strays stay the
 * measured ones.
 */
export function CourseConditions({ value, onChange, changes, busy, units, altitudeUnit, temperatureUnit }: CourseConditionsProps) {
  const [altitude, setAltitude] = useState(shown(value?.altitudeM, (m) => metresTo(m, altitudeUnit)));
  const [temperature, setTemperature] = useState(shown(value?.temperatureC, (c) => celsiusTo(c, temperatureUnit)));
  const [humidity, setHumidity] = useState(value?.humidityPct?.toString() ?? '');
  const [firmness, setFirmness] = useState<'soft' | 'normal' | 'firm'>(value?.firmness ?? 'normal');
  const [error, setError] = useState<string | null>(null);
  const apply = () => {
    const a = parseOptionalNumber(altitude);
    const t = parseOptionalNumber(temperature);
    const h = parseOptionalNumber(humidity);
    if ([a, t, h].some((x) => x !== null && Number.isNaN(x))) return setError('Enter numbers (or leave a box empty).');
    const to = { altitudeM: a === null ? undefined : toMetres(a, altitudeUnit), temperatureC: t === null ? undefined : toCelsius(t, temperatureUnit), humidityPct: h ?? undefined, firmness } as NonNullable<AnalysisParams['to']>;
    if (to.altitudeM !== undefined && (to.altitudeM < -430 || to.altitudeM > 4500)) return setError(altitudeUnit === 'ft' ? 'Altitude between −1,410 and 14,760 ft.' : 'Altitude between −430 and 4,500 m.');
    if (to.temperatureC !== undefined && (to.temperatureC < -20 || to.temperatureC > 50)) return setError(temperatureUnit === 'f' ? 'Temperature between −4 and 122 °F.' : 'Temperature between −20 and 50 °C.');
    if (to.humidityPct !== undefined && (to.humidityPct < 0 || to.humidityPct > 100)) return setError('Humidity 0 to 100 %.');
    setError(null);
    onChange(Object.values(to).some((x) => x !== undefined) ? to : null);
  };
  return (
    <View style={styles.box}>
      <AppText variant="caption" tone="muted">
        The ball-flight model flies each shot’s launch in the bay’s air and in the course’s air and adjusts carry, apex and flight time by the difference; total also follows the course’s ground (the roll model’s firmness settings are our assumption). The strays stay those of the measured shots.
      </AppText>
      <View style={styles.row}>
        <View style={styles.cell}><TextField label="Altitude" suffix={UNIT_SYMBOL[altitudeUnit]} value={altitude} onChangeText={setAltitude} inputMode="decimal" /></View>
        <View style={styles.cell}><TextField label="Temperature" suffix={UNIT_SYMBOL[temperatureUnit]} value={temperature} onChangeText={setTemperature} inputMode="decimal" /></View>
        <View style={styles.cell}><TextField label="Humidity" suffix="%" value={humidity} onChangeText={setHumidity} inputMode="decimal" /></View>
      </View>
      <ChoiceField label="Ground" value={firmness} options={FIRMNESS} onChange={setFirmness} />
      {error ? <AppText tone="danger">{error}</AppText> : null}
      <View style={styles.row}>
        <Button compact title="Show at the course" busy={busy} onPress={apply} />
        {value ? <Button compact variant="quiet" title="Back to measured" onPress={() => onChange(null)} /> : null}
      </View>
      {value && !busy && changes.length > 0 ? (
        <Notice tone="info" title="What changed at the course">
          {changes.map((c) => (
            <AppText key={c.build ?? ''}>
              {`${c.build ?? clubInfo(c.club)?.label ?? c.club}: carry ${formatField(c.measuredCarryM, 'carry', units)} → ${formatField(c.courseCarryM, 'carry', units)} (${signed(c.changeM, units)})`}
            </AppText>
          ))}
        </Notice>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  row: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  cell: { flexGrow: 1, flexBasis: 100 },
});
