import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { parseOptionalNumber } from '../forms';
import { space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { ChoiceField } from '../ui/choice-field';
import { TextField } from '../ui/text-field';
import type { AnalysisParams } from '../queries/analysis';

type CourseConditionsProps = { value: AnalysisParams['to']; onChange: (to: AnalysisParams['to']) => void };

const FIRMNESS = [
  { value: 'soft', label: 'Soft' },
  { value: 'normal', label: 'Normal' },
  { value: 'firm', label: 'Firm' },
] as const;

/** The player's course (altitude, temperature, humidity, ground): the figures carried over by the ball-flight model. */
export function CourseConditions({ value, onChange }: CourseConditionsProps) {
  const [altitude, setAltitude] = useState(value?.altitudeM?.toString() ?? '');
  const [temperature, setTemperature] = useState(value?.temperatureC?.toString() ?? '');
  const [humidity, setHumidity] = useState(value?.humidityPct?.toString() ?? '');
  const [firmness, setFirmness] = useState<'soft' | 'normal' | 'firm'>(value?.firmness ?? 'normal');
  const [error, setError] = useState<string | null>(null);
  const apply = () => {
    const a = parseOptionalNumber(altitude);
    const t = parseOptionalNumber(temperature);
    const h = parseOptionalNumber(humidity);
    if ([a, t, h].some((x) => x !== null && Number.isNaN(x))) return setError('Enter numbers (or leave a box empty).');
    const to = { altitudeM: a ?? undefined, temperatureC: t ?? undefined, humidityPct: h ?? undefined, firmness } as NonNullable<AnalysisParams['to']>;
    if (to.altitudeM !== undefined && (to.altitudeM < -430 || to.altitudeM > 4500)) return setError('Altitude between −430 and 4,500 m.');
    if (to.temperatureC !== undefined && (to.temperatureC < -20 || to.temperatureC > 50)) return setError('Temperature between −20 and 50 °C.');
    if (to.humidityPct !== undefined && (to.humidityPct < 0 || to.humidityPct > 100)) return setError('Humidity 0 to 100 %.');
    setError(null);
    onChange(Object.values(to).some((x) => x !== undefined) ? to : null);
  };
  return (
    <View style={styles.box}>
      <AppText variant="caption" tone="muted">
        The ball-flight model flies each shot’s launch in the bay’s air and in the course’s air and adjusts carry, apex and flight time by the difference; total also follows the course’s ground (the roll model’s firmness settings are our assumption).
      </AppText>
      <View style={styles.row}>
        <View style={styles.cell}><TextField label="Altitude" suffix="m" value={altitude} onChangeText={setAltitude} inputMode="decimal" /></View>
        <View style={styles.cell}><TextField label="Temperature" suffix="°C" value={temperature} onChangeText={setTemperature} inputMode="decimal" /></View>
        <View style={styles.cell}><TextField label="Humidity" suffix="%" value={humidity} onChangeText={setHumidity} inputMode="decimal" /></View>
      </View>
      <ChoiceField label="Ground" value={firmness} options={FIRMNESS} onChange={setFirmness} />
      {error ? <AppText tone="danger">{error}</AppText> : null}
      <View style={styles.row}>
        <Button compact title="Show at the course" onPress={apply} />
        {value ? <Button compact variant="quiet" title="Back to measured" onPress={() => onChange(null)} /> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  row: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  cell: { flexGrow: 1, flexBasis: 100 },
});
