/**
 * The preview table's columns and cells: club, build and the key fields of each converted shot,
 * in the user's units; left/right fields with their side letter, so a mirrored file shows.
 */
import { SIDE_FIELDS, type Shot, type ShotField } from '@/analysis/fields';
import { displayUnits, findUnit, type UnitSystem } from '@/analysis/units';
import { fieldNumber, formatLettered } from '../format-field';
import { TARGET_LABELS } from './recipe-edit';

/**
 * Fields the preview shows when the shots have them, in this order: where the ball went (carry,
 * offline, total), its left/right start and curve (launch direction, spin axis), then speeds,
 * launch and spin. The left/right fields come early, so a mirrored file is caught before the
 * import, on a phone too.
 */
export const PREVIEW_FIELDS: readonly ShotField[] = [
  'carry',
  'offline',
  'total',
  'launchDirection',
  'spinAxis',
  'ballSpeed',
  'clubSpeed',
  'launchAngle',
  'spinRate',
];

export type PreviewColumn = { field: ShotField; title: string; unit: string };

/** The preview fields that at least one shot has, with their title and display unit. O(shots × fields). */
export function previewColumns(shots: readonly Shot[], system: UnitSystem): PreviewColumn[] {
  const units = displayUnits(system);
  return PREVIEW_FIELDS.filter((f) => shots.some((s) => s.values[f] !== undefined)).map((field) => ({
    field,
    title: TARGET_LABELS[field],
    unit: findUnit(units[field])?.label ?? units[field],
  }));
}

/**
 * One shot value in the user's unit, or "–" when the shot lacks it. A left/right value is written
 * with its side: offline −4.1 m (left) → "4.1 L" (+ is right in Ovalyard).
 * @example formatShotValue({ …, values: { carry: 0.9144 * 150 } }, 'carry', 'imperial') // => '150.0'
 */
export function formatShotValue(shot: Shot, field: ShotField, system: UnitSystem): string {
  const v = shot.values[field];
  return SIDE_FIELDS.has(field) ? formatLettered(v, field, system) : fieldNumber(v, field, system);
}
