/**
 * Shot fields in the user's units, for every screen (analysis, import preview).
 */
import type { ShotField } from '@/analysis/fields';
import { displayUnits, fromCanonical, type UnitSystem } from '@/analysis/units';

/** Decimals shown per field (common practice, no source: what a fitter reads off a monitor). */
const DIGITS: Partial<Record<ShotField, number>> = {
  spinRate: 0,
  backSpin: 0,
  sideSpin: 0,
  smashFactor: 2,
  flightTime: 1,
};

const UNIT_TEXT: Record<string, string> = { deg: '°', rpm: ' rpm', ratio: '', s: ' s', yd: ' yd', m: ' m', ft: ' ft', mph: ' mph', 'km/h': ' km/h', 'm/s': ' m/s' };

/** What a missing value shows. */
export const MISSING = '–';

/** The display unit of a field in a unit system, as written after a number ("yd", "°"). */
export function unitText(field: ShotField, system: UnitSystem): string {
  return (UNIT_TEXT[displayUnits(system)[field]] ?? ` ${displayUnits(system)[field]}`).trim();
}

/** A canonical value in the user's units, without the unit. */
export function fieldNumber(value: number | null | undefined, field: ShotField, system: UnitSystem, digits = DIGITS[field] ?? 1): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  const shown = field === 'smashFactor' ? value : fromCanonical(value, displayUnits(system)[field], field);
  return shown.toFixed(digits).replace(/^-(0\.?0*)$/, '$1');
}

/** A canonical value in the user's units, with the unit ("151.2 yd", "14.3°", "6,480 rpm"). */
export function formatField(value: number | null | undefined, field: ShotField, system: UnitSystem): string {
  const n = fieldNumber(value, field, system);
  if (n === MISSING) return n;
  const text = UNIT_TEXT[displayUnits(system)[field]] ?? ` ${displayUnits(system)[field]}`;
  const grouped = (DIGITS[field] ?? 1) === 0 && Math.abs(Number(n)) >= 10000 ? Number(n).toLocaleString('en') : n;
  return `${grouped}${text}`;
}

/** A left/right value with its side letter, as bay files write it: "4.1 L", "2.0 R", "0.0". */
export function formatLettered(value: number | null | undefined, field: ShotField, system: UnitSystem): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  const n = fieldNumber(Math.abs(value), field, system);
  return Number(n) === 0 ? n : `${n} ${value < 0 ? 'L' : 'R'}`;
}

/** A left/right value in words: "4.2 yd right", "on line". */
export function formatSide(value: number | null | undefined, field: ShotField, system: UnitSystem): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return MISSING;
  const n = fieldNumber(Math.abs(value), field, system);
  if (Number(n) === 0) return field === 'offline' ? 'on line' : formatField(0, field, system);
  return `${formatField(Math.abs(value), field, system)} ${value < 0 ? 'left' : 'right'}`;
}
