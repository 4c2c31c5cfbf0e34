import { playerBodySchema, type Player, type PlayerBody } from '@/server/schemas';
import { cmTo, toCm, type LengthUnit } from '@/analysis/units';
import { fieldErrorsFromZod, numberText, parseNumberFields, type FieldErrors } from '../forms';

/** A stored height shown in a unit, to a tenth. */
const lengthText = (cm: number | null | undefined, unit: LengthUnit): string => (cm == null ? '' : numberText(Math.round(cmTo(cm, unit) * 10) / 10));
const cmOf = (value: number | null | undefined, unit: LengthUnit) => (value == null ? value : toCm(value, unit));

/** The player form's inputs, all text. Heights in the form's length unit (stored in cm). */
export type PlayerFormText = {
  name: string;
  email: string;
  handedness: 'right' | 'left';
  heightCm: string;
  wristToFloorCm: string;
  handicap: string;
  usualMiss: string;
  goals: string;
};

/** The form for a new player (blank) or filled from a profile. */
export function playerFormText(player?: Player, lengthUnit: LengthUnit = 'cm'): PlayerFormText {
  return {
    name: player?.name ?? '',
    email: player?.email ?? '',
    handedness: player?.handedness ?? 'right',
    heightCm: lengthText(player?.heightCm, lengthUnit),
    wristToFloorCm: lengthText(player?.wristToFloorCm, lengthUnit),
    handicap: handicapText(player?.handicap ?? null),
    usualMiss: player?.usualMiss ?? '',
    goals: player?.goals ?? '',
  };
}

/** A stored handicap as typed: a plus handicap (stored negative) shows with its "+". */
export function handicapText(handicap: number | null): string {
  if (handicap === null) return '';
  return handicap < 0 ? `+${Math.abs(handicap)}` : String(handicap);
}

/**
 * Handicap text → stored number. Golfers write a better-than-scratch index with a plus sign
 * ("+1.5"), stored as −1.5; a typed minus means the same (common practice, no source).
 */
export function parseHandicapText(text: string): string {
  const t = text.trim();
  return t.startsWith('+') ? `-${t.slice(1)}` : t;
}

export type PlayerFormResult = { ok: true; body: PlayerBody } | { ok: false; errors: FieldErrors };

/** Parses the numbers, then checks everything with the shared schema the server uses. */
export function parsePlayerForm(text: PlayerFormText, lengthUnit: LengthUnit = 'cm'): PlayerFormResult {
  const numbers = parseNumberFields({
    heightCm: text.heightCm,
    wristToFloorCm: text.wristToFloorCm,
    handicap: parseHandicapText(text.handicap),
  });
  const body = {
    name: text.name,
    email: text.email,
    handedness: text.handedness,
    ...numbers.values,
    heightCm: cmOf(numbers.values.heightCm as number | null | undefined, lengthUnit),
    wristToFloorCm: cmOf(numbers.values.wristToFloorCm as number | null | undefined, lengthUnit),
    usualMiss: text.usualMiss,
    goals: text.goals,
  };
  const parsed = playerBodySchema.safeParse(body);
  if (!parsed.success || Object.keys(numbers.errors).length > 0) {
    return { ok: false, errors: { ...(parsed.success ? {} : fieldErrorsFromZod(parsed.error)), ...numbers.errors } };
  }
  return { ok: true, body: parsed.data };
}
