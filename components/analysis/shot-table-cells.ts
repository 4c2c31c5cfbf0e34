/**
 * The shot table's cells in words: every field in the user's units, sided fields with L/R,
 * derived values marked, strays and decisions in plain words. Pure.
 */
import { SIDE_FIELDS, type ShotField } from '@/analysis/fields';
import { STRAY_KIND_WORDS } from '@/analysis/strays';
import type { UnitSystem } from '@/analysis/units';
import type { TableShot } from '@/server/schemas';
import { fieldNumber, formatLettered, MISSING } from '../format-field';

/** The mark after a derived value (computed, not read from the file). */
export const DERIVED_MARK = '†';

/**
 * One field of one shot as the table shows it: "151.2", "4.1 L", "1.45†", "–". O(1).
 * @example shotCellText(shot, 'offline', 'imperial') // => '4.1 L'
 */
export function shotCellText(shot: Pick<TableShot, 'values' | 'derived'>, field: ShotField, units: UnitSystem): string {
  const v = shot.values[field];
  if (v === undefined) return MISSING;
  const text = SIDE_FIELDS.has(field) ? formatLettered(v, field, units) : fieldNumber(v, field, units);
  return shot.derived.includes(field) ? `${text}${DERIVED_MARK}` : text;
}

/**
 * The stray and decision of a shot in words: "Mishit · left out", "For review · in", "Kept by
 * the fitter", "". O(1).
 */
export function shotStatusText(shot: Pick<TableShot, 'stray' | 'decision' | 'inFigures'>): string {
  const decided = shot.decision === 'keep' ? 'kept by the fitter' : shot.decision === 'drop' ? 'dropped by the fitter' : null;
  if (shot.stray) return `${STRAY_KIND_WORDS[shot.stray.kind]} · ${decided ?? (shot.inFigures ? 'in' : 'left out')}`;
  return decided ? decided[0].toUpperCase() + decided.slice(1) : 'In';
}
