import { CLUB_CODES } from '@/analysis/clubs';
import { fromCanonical, toCanonical, type UnitSystem } from '@/analysis/units';
import { bagClubBodySchema, type BagClub, type BagStatus } from '@/server/schemas';
import { buildFormText, parseSpecText, type BuildFormText, type BuildSpecBody } from '../builds/build-form-values';
import { fieldErrorsFromZod, parseNumberFields } from '../forms';
import type { Parsed } from '../use-text-form';
import { clubName } from './bag-words';

/** The bag-club form: the spec inputs plus club, status, entered carry (display units), date in and wear counts. */
export type BagClubFormText = BuildFormText & {
  club: string;
  status: BagStatus;
  carryEntered: string;
  inBagSince: string;
  roundsSince: string;
  practiceSessionsSince: string;
};

export type BagClubFormBody = BuildSpecBody & {
  club: string;
  status: BagStatus;
  carryEnteredM: number | null;
  inBagSince: string | null;
  roundsSince: number;
  practiceSessionsSince: number;
};

export const CLUB_OPTIONS = CLUB_CODES.map((code) => ({ value: code, label: clubName(code) }));

const unitOf = (units: UnitSystem) => (units === 'imperial' ? 'yd' : 'm');

/** The form filled from a club (or blank for a new one). */
export function bagClubFormText(club: Partial<BagClub> | undefined, units: UnitSystem): BagClubFormText {
  const carry = club?.carryEnteredM;
  return {
    ...buildFormText(club),
    club: club?.club ?? '7I',
    status: club?.status ?? 'in-bag',
    carryEntered: carry == null ? '' : String(Math.round(fromCanonical(carry, unitOf(units), 'carry') * 10) / 10),
    inBagSince: club?.inBagSince ?? '',
    roundsSince: String(club?.roundsSince ?? 0),
    practiceSessionsSince: String(club?.practiceSessionsSince ?? 0),
  };
}

/** Parses the whole form with the shared schemas (the spec's physical ranges, the bag's fields). */
export function parseBagClubForm(text: BagClubFormText, units: UnitSystem): Parsed<BagClubFormBody> {
  const spec = parseSpecText(text);
  const numbers = parseNumberFields({ carryEntered: text.carryEntered, roundsSince: text.roundsSince, practiceSessionsSince: text.practiceSessionsSince });
  const carry = numbers.values.carryEntered;
  const candidate = {
    club: text.club,
    status: text.status,
    carryEnteredM: carry === null ? null : toCanonical(carry, unitOf(units), 'carry'),
    inBagSince: text.inBagSince.trim() === '' ? null : text.inBagSince.trim(),
    roundsSince: numbers.values.roundsSince ?? 0,
    practiceSessionsSince: numbers.values.practiceSessionsSince ?? 0,
  };
  const parsed = bagClubBodySchema.pick({ club: true, status: true, carryEnteredM: true, inBagSince: true, roundsSince: true, practiceSessionsSince: true }).safeParse(candidate);
  const errors = { ...(spec.ok ? {} : spec.errors), ...(parsed.success ? {} : fieldErrorsFromZod(parsed.error)), ...numbers.errors };
  if (errors.carryEnteredM) errors.carryEntered = errors.carryEnteredM;
  if (!spec.ok || !parsed.success || Object.keys(errors).length > 0) return { ok: false, errors };
  return { ok: true, body: { ...spec.body, ...parsed.data, carryEnteredM: parsed.data.carryEnteredM ?? null, inBagSince: parsed.data.inBagSince ?? null } };
}
