import { fittingBodySchema, type Fitting, type FittingBody } from '@/server/schemas';
import { fieldErrorsFromZod, numberText, parseNumberFields, type FieldErrors } from '../forms';
import { todayIsoDate } from '../format';
import { celsiusTo, metresTo, toCelsius, toMetres, type AltitudeUnit, type TemperatureUnit } from '@/analysis/units';

/** The units the conditions are typed in (the user's preference); stored as °C and m. */
export type ConditionUnits = { temperature: TemperatureUnit; altitude: AltitudeUnit };
export const METRIC_CONDITIONS: ConditionUnits = { temperature: 'c', altitude: 'm' };

/** A stored value shown in a unit, to a tenth (a round trip of a typed whole number stays whole). */
export const shown = (value: number | null | undefined, convert: (v: number) => number): string =>
  value == null ? '' : numberText(Math.round(convert(value) * 10) / 10);

/** The fitting form's inputs, all text. Temperature and altitude in the form's ConditionUnits, humidity %. */
export type FittingFormText = {
  playerId: string;
  date: string;
  venue: 'indoor' | 'outdoor';
  temperatureC: string;
  altitudeM: string;
  humidityPct: string;
  /** '' when not stated (the model then takes normal ground). */
  groundFirmness: '' | 'soft' | 'normal' | 'firm';
  ball: string;
  notes: string;
  remote: boolean;
};

/** The form for a new fitting (today, indoor) or filled from a fitting. */
export function fittingFormText(fitting?: Fitting, defaults: { playerId?: string; today?: string } = {}, units: ConditionUnits = METRIC_CONDITIONS): FittingFormText {
  return {
    playerId: fitting?.playerId ?? defaults.playerId ?? '',
    date: fitting?.date.slice(0, 10) ?? defaults.today ?? todayIsoDate(),
    venue: fitting?.venue ?? 'indoor',
    temperatureC: shown(fitting?.temperatureC, (c) => celsiusTo(c, units.temperature)),
    altitudeM: shown(fitting?.altitudeM, (m) => metresTo(m, units.altitude)),
    humidityPct: numberText(fitting?.humidityPct),
    groundFirmness: fitting?.groundFirmness ?? '',
    ball: fitting?.ball ?? '',
    notes: fitting?.notes ?? '',
    remote: fitting?.remote ?? false,
  };
}

export type FittingFormResult = { ok: true; body: FittingBody } | { ok: false; errors: FieldErrors };

/** Parses the numbers, then checks everything with the shared schema the server uses. */
export function parseFittingForm(text: FittingFormText, units: ConditionUnits = METRIC_CONDITIONS): FittingFormResult {
  const numbers = parseNumberFields({
    temperatureC: text.temperatureC,
    altitudeM: text.altitudeM,
    humidityPct: text.humidityPct,
  });
  const values = numbers.values as { temperatureC?: number | null; altitudeM?: number | null; humidityPct?: number | null };
  const parsed = fittingBodySchema.safeParse({
    playerId: text.playerId,
    date: text.date.trim(),
    venue: text.venue,
    ...values,
    temperatureC: values.temperatureC == null ? values.temperatureC : toCelsius(values.temperatureC, units.temperature),
    altitudeM: values.altitudeM == null ? values.altitudeM : toMetres(values.altitudeM, units.altitude),
    groundFirmness: text.groundFirmness === '' ? null : text.groundFirmness,
    ball: text.ball,
    notes: text.notes,
    remote: text.remote,
  });
  if (!parsed.success || Object.keys(numbers.errors).length > 0) {
    return { ok: false, errors: { ...(parsed.success ? {} : fieldErrorsFromZod(parsed.error)), ...numbers.errors } };
  }
  // fitterId is left to the server: it defaults to the signed-in fitter.
  const { fitterId: _fitterId, ...body } = parsed.data;
  return { ok: true, body };
}
