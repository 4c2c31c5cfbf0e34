import { buildSpecBodySchema } from '@/server/schemas';
import { fieldErrorsFromZod, numberText, parseNumberFields, parseOptionalNumber } from '../forms';
import type { Parsed } from '../use-text-form';
import type { BuildSpec } from './build-summary';

/** The build form's inputs, all text. Loft, lie and torque in °, length in inches, masses in grams. */
export type BuildFormText = {
  head: string;
  loftDeg: string;
  hoselSetting: string;
  lieDeg: string;
  lengthIn: string;
  shaft: string;
  shaftWeightG: string;
  shaftFlex: string;
  torqueDeg: string;
  grip: string;
  swingWeight: string;
  addedMassG: string;
  addedMassWhere: string;
  notes: string;
};

const NUMBER_KEYS = ['loftDeg', 'lieDeg', 'lengthIn', 'shaftWeightG', 'torqueDeg', 'addedMassG'] as const;
const TEXT_KEYS = ['head', 'hoselSetting', 'shaft', 'shaftFlex', 'grip', 'swingWeight', 'addedMassWhere', 'notes'] as const;

/** The form filled from a build (blank where a spec is not set). */
export function buildFormText(build?: Partial<BuildSpec>): BuildFormText {
  return {
    head: build?.head ?? '',
    loftDeg: numberText(build?.loftDeg),
    hoselSetting: build?.hoselSetting ?? '',
    lieDeg: numberText(build?.lieDeg),
    lengthIn: numberText(build?.lengthIn),
    shaft: build?.shaft ?? '',
    shaftWeightG: numberText(build?.shaftWeightG),
    shaftFlex: build?.shaftFlex ?? '',
    torqueDeg: numberText(build?.torqueDeg),
    grip: build?.grip ?? '',
    swingWeight: build?.swingWeight ?? '',
    addedMassG: numberText(build?.addedMassG),
    addedMassWhere: build?.addedMassWhere ?? '',
    notes: build?.notes ?? '',
  };
}

/** Every spec, null where blank: the form sends them all, so a cleared field clears on the server. */
export type BuildSpecBody = { [K in keyof BuildSpec]-?: Exclude<BuildSpec[K], undefined> };

export type BuildFormResult = Parsed<BuildSpecBody>;

/** The length as typed, parsed (decimal comma accepted); null when blank or not a number. For live notes. */
export function typedLengthIn(text: BuildFormText): number | null {
  const n = parseOptionalNumber(text.lengthIn);
  return n === null || Number.isNaN(n) ? null : n;
}

/**
 * Parses the numbers (blank → null, "10,5" → 10.5), turns blank texts into null, then checks
 * everything with the shared schema the server uses.
 */
export function parseBuildForm(text: BuildFormText): BuildFormResult {
  const numbers = parseNumberFields(Object.fromEntries(NUMBER_KEYS.map((k) => [k, text[k]])) as Record<(typeof NUMBER_KEYS)[number], string>);
  const texts = Object.fromEntries(TEXT_KEYS.map((k) => [k, text[k].trim() === '' ? null : text[k]]));
  const parsed = buildSpecBodySchema.safeParse({ ...texts, ...numbers.values });
  if (!parsed.success || Object.keys(numbers.errors).length > 0) {
    return { ok: false, errors: { ...(parsed.success ? {} : fieldErrorsFromZod(parsed.error)), ...numbers.errors } };
  }
  const body = {} as Record<string, unknown>;
  for (const k of [...TEXT_KEYS, ...NUMBER_KEYS]) body[k] = parsed.data[k] ?? null;
  return { ok: true, body: body as BuildSpecBody };
}
