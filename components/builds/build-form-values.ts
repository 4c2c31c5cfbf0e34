import { buildSpecBodySchema } from '@/server/schemas';
import { fieldErrorsFromZod, numberText, parseNumberFields, parseOptionalNumber } from '../forms';
import type { Parsed } from '../use-text-form';
import type { BuildSpec } from './build-summary';

/** Spec inputs that hold numbers: loft, lie, hosel changes and torque in °, length and balance point in inches, masses in grams. */
export const SPEC_NUMBER_KEYS = [
  'loftDeg', 'hoselLoftChangeDeg', 'hoselLieChangeDeg', 'hoselFaceChangeDeg', 'lieDeg', 'lengthIn', 'shaftWeightG', 'torqueDeg',
  'totalWeightG', 'balancePointIn', 'addedMassG',
] as const;
/** Spec inputs that hold text. */
export const SPEC_TEXT_KEYS = ['head', 'hoselSetting', 'shaft', 'shaftFlex', 'grip', 'gripSize', 'swingWeight', 'addedMassWhere', 'notes'] as const;

type SpecKey = (typeof SPEC_NUMBER_KEYS)[number] | (typeof SPEC_TEXT_KEYS)[number];

/** The spec form's inputs, all text. */
export type BuildFormText = Record<SpecKey, string>;

/** The form filled from a build or bag club (blank where a spec is not set). */
export function buildFormText(build?: Partial<BuildSpec>): BuildFormText {
  const text = {} as BuildFormText;
  for (const k of SPEC_TEXT_KEYS) text[k] = (build?.[k] as string | null | undefined) ?? '';
  for (const k of SPEC_NUMBER_KEYS) text[k] = numberText(build?.[k] as number | null | undefined);
  return text;
}

/** Every spec, null where blank: the form sends them all, so a cleared field clears on the server. */
export type BuildSpecBody = { [K in keyof BuildSpec]-?: Exclude<BuildSpec[K], undefined> };

export type BuildFormResult = Parsed<BuildSpecBody>;

/** A number as typed, parsed (decimal comma accepted); null when blank or not a number. For live notes. */
export function typedNumber(value: string): number | null {
  const n = parseOptionalNumber(value);
  return n === null || Number.isNaN(n) ? null : n;
}

/** The length as typed; null when blank or not a number. */
export const typedLengthIn = (text: BuildFormText): number | null => typedNumber(text.lengthIn);

/** The spec part of a form parsed: numbers (blank → null, "10,5" → 10.5), blank texts → null, checked by the shared schema. */
export function parseSpecText(text: BuildFormText): BuildFormResult {
  const numbers = parseNumberFields(Object.fromEntries(SPEC_NUMBER_KEYS.map((k) => [k, text[k]])) as Record<(typeof SPEC_NUMBER_KEYS)[number], string>);
  const texts = Object.fromEntries(SPEC_TEXT_KEYS.map((k) => [k, text[k].trim() === '' ? null : text[k]]));
  const parsed = buildSpecBodySchema.safeParse({ ...texts, ...numbers.values });
  if (!parsed.success || Object.keys(numbers.errors).length > 0) {
    return { ok: false, errors: { ...(parsed.success ? {} : fieldErrorsFromZod(parsed.error)), ...numbers.errors } };
  }
  const body = {} as Record<string, unknown>;
  for (const k of [...SPEC_TEXT_KEYS, ...SPEC_NUMBER_KEYS]) body[k] = parsed.data[k] ?? null;
  return { ok: true, body: body as BuildSpecBody };
}

/**
 * Parses the numbers (blank → null, "10,5" → 10.5), turns blank texts into null, then checks
 * everything with the shared schema the server uses.
 */
export const parseBuildForm = parseSpecText;
