/**
 * A reading plan per mapped column: its unit's factor to canonical, a compiled cell reader
 * (number format, side notation) and the field's limits, so each cell costs one call.
 */
import type { ShotField } from '@/analysis/fields';
import type { Hand } from '@/analysis/plain-words/handed-words';
import { fieldDimension, findUnit, type UnitInfo } from '@/analysis/units';
import { ImportError } from './import-error';
import { isShotField, type MergedColumn } from './merge-recipe';
import type { DecimalMark, NumberReader } from './number-format';
import { SHOT_LIMITS } from './shot-limits';
import { SLOT } from './shot-slots';
import { compileSideReader } from './side-notation';

export interface ColumnPlan {
  header: string;
  index: number;
  field: ShotField;
  unit: UnitInfo;
  read: NumberReader;
  /** The unit's factor to canonical. */
  factor: number;
  /** Slot index of the field. */
  slot: number;
  /** −1 when the column's signs are turned round (written for a left-handed player's hand), else 1. */
  sign: 1 | -1;
  /** Whether the column holds plain numbers (no side notation), read inline. */
  plain: boolean;
  min: number;
  max: number;
}

/**
 * Plans for the columns mapped to shot fields. A column written for the player's hand (`handed`)
 * of a left-handed player's file reads with its sign turned round. O(columns).
 * @throws ImportError UNKNOWN_UNIT (no or an unknown unit), UNIT_MISMATCH (a unit of another dimension)
 * @example compilePlans([{ header: 'Carry', index: 1, field: 'carry', unit: 'yd', side: null, handed: false }], reader, '.')[0].factor // => 0.9144
 */
export function compilePlans(merged: readonly MergedColumn[], readNumber: NumberReader, decimal: DecimalMark, hand: Hand = 'right'): ColumnPlan[] {
  const plans: ColumnPlan[] = [];
  for (const m of merged) {
    if (!isShotField(m.field)) continue;
    if (m.unit === null) throw new ImportError('UNKNOWN_UNIT', `${m.header}: no unit is given for ${m.field}.`, m.header);
    const unit = findUnit(m.unit);
    if (!unit) throw new ImportError('UNKNOWN_UNIT', `${m.header}: the unit "${m.unit}" is not known.`, m.header);
    const dimension = fieldDimension(m.field);
    if (unit.dimension !== dimension) {
      throw new ImportError('UNIT_MISMATCH', `${m.header}: "${m.unit}" is a ${unit.dimension} unit; ${m.field} needs a ${dimension} unit.`, m.header);
    }
    const read = m.side !== null ? compileSideReader(m.side, readNumber, decimal) : readNumber;
    const { min, max } = SHOT_LIMITS[m.field];
    plans.push({ header: m.header, index: m.index, field: m.field, unit, read, factor: unit.factor, sign: m.handed && hand === 'left' ? -1 : 1, slot: SLOT[m.field], plain: m.side === null, min, max });
  }
  return plans;
}
