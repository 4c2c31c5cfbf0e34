import { fittingBodySchema, type Fitting, type FittingBody } from '@/server/schemas';
import { fieldErrorsFromZod, numberText, parseNumberFields, type FieldErrors } from '../forms';
import { todayIsoDate } from '../format';

/** The fitting form's inputs, all text. Temperature °C, altitude m, humidity %. */
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
export function fittingFormText(fitting?: Fitting, defaults: { playerId?: string; today?: string } = {}): FittingFormText {
  return {
    playerId: fitting?.playerId ?? defaults.playerId ?? '',
    date: fitting?.date.slice(0, 10) ?? defaults.today ?? todayIsoDate(),
    venue: fitting?.venue ?? 'indoor',
    temperatureC: numberText(fitting?.temperatureC),
    altitudeM: numberText(fitting?.altitudeM),
    humidityPct: numberText(fitting?.humidityPct),
    groundFirmness: fitting?.groundFirmness ?? '',
    ball: fitting?.ball ?? '',
    notes: fitting?.notes ?? '',
    remote: fitting?.remote ?? false,
  };
}

export type FittingFormResult = { ok: true; body: FittingBody } | { ok: false; errors: FieldErrors };

/** Parses the numbers, then checks everything with the shared schema the server uses. */
export function parseFittingForm(text: FittingFormText): FittingFormResult {
  const numbers = parseNumberFields({
    temperatureC: text.temperatureC,
    altitudeM: text.altitudeM,
    humidityPct: text.humidityPct,
  });
  const parsed = fittingBodySchema.safeParse({
    playerId: text.playerId,
    date: text.date.trim(),
    venue: text.venue,
    ...numbers.values,
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
