import { INCH_M } from '@/analysis/units';
import { intakeBodySchema, type Intake, type IntakeBody, type Player } from '@/server/schemas';
import { fieldErrorsFromZod, parseNumberFields, type FieldErrors } from '../forms';
import { handicapText, parseHandicapText } from '../players/player-form-values';

/** Centimetres in an inch: 2.54 exactly (International Yard and Pound Agreement, 1959). */
const CM_PER_IN = INCH_M * 100;

/** Lengths shown and typed in the user's units: in for imperial, cm for metric. */
export type LengthUnit = 'cm' | 'in';
export const lengthUnitOf = (units: 'imperial' | 'metric'): LengthUnit => (units === 'imperial' ? 'in' : 'cm');

/** A stored length (cm) as typed in `unit`, to a tenth. */
export function lengthText(cm: number | null | undefined, unit: LengthUnit): string {
  if (cm === null || cm === undefined) return '';
  const v = unit === 'in' ? cm / CM_PER_IN : cm;
  return String(Math.round(v * 10) / 10);
}

/** The intake's inputs, all text; lengths in `unit`. */
export type IntakeFormText = {
  handedness: 'right' | 'left';
  height: string;
  wristToFloor: string;
  handicap: string;
  usualMiss: string;
  ballFlightNow: string;
  ballFlightWanted: string;
  wishes: string;
};

/** The form filled from an earlier intake, else from the player's profile. */
export function intakeFormText(unit: LengthUnit, intake: Intake | null, player: Player | null): IntakeFormText {
  const from = intake ?? player;
  return {
    handedness: from?.handedness ?? 'right',
    height: lengthText(from?.heightCm, unit),
    wristToFloor: lengthText(from?.wristToFloorCm, unit),
    handicap: handicapText(from?.handicap ?? null),
    usualMiss: from?.usualMiss ?? '',
    ballFlightNow: intake?.ballFlightNow ?? '',
    ballFlightWanted: intake?.ballFlightWanted ?? '',
    wishes: intake?.wishes ?? (player?.goals ?? ''),
  };
}

export type IntakeFormResult = { ok: true; body: IntakeBody } | { ok: false; errors: FieldErrors };

/** Maps the schema's field names back to the form's. */
const FORM_FIELD: Record<string, string> = { heightCm: 'height', wristToFloorCm: 'wristToFloor' };

/**
 * Parses the numbers (lengths in `unit` → cm), then checks everything with the schema the server
 * uses, so an impossible value is refused field by field before it is sent. O(fields).
 * @example parseIntakeForm({ …, height: '72', wristToFloor: '34' }, 'in') // heightCm 182.88, wristToFloorCm 86.36
 */
export function parseIntakeForm(text: IntakeFormText, unit: LengthUnit): IntakeFormResult {
  const numbers = parseNumberFields({ height: text.height, wristToFloor: text.wristToFloor, handicap: parseHandicapText(text.handicap) });
  const toCm = (v: number | null) => (v === null ? undefined : unit === 'in' ? v * CM_PER_IN : v);
  const body = {
    handedness: text.handedness,
    heightCm: toCm(numbers.values.height),
    wristToFloorCm: toCm(numbers.values.wristToFloor),
    handicap: numbers.values.handicap,
    usualMiss: text.usualMiss,
    ballFlightNow: text.ballFlightNow,
    ballFlightWanted: text.ballFlightWanted,
    wishes: text.wishes,
  };
  const parsed = intakeBodySchema.safeParse(body);
  if (!parsed.success || Object.keys(numbers.errors).length > 0) {
    const schemaErrors = parsed.success ? {} : fieldErrorsFromZod(parsed.error);
    const errors: FieldErrors = {};
    for (const [key, message] of Object.entries(schemaErrors)) errors[FORM_FIELD[key] ?? key] = message;
    return { ok: false, errors: { ...errors, ...numbers.errors } };
  }
  return { ok: true, body: parsed.data };
}
