import { DataTypes, type ModelAttributeColumnOptions } from 'sequelize';
import type { PrintableSpec } from '@/analysis/bag';

/** The spec columns a build and a bag club share (server/schemas/build-spec.ts), fresh objects each call. */
export function specAttributes(): Record<keyof SpecAttributes, ModelAttributeColumnOptions> {
  const text = (n: number) => ({ type: DataTypes.STRING(n), allowNull: true });
  // A fresh object per attribute: Sequelize writes the attribute's name into it.
  const num = () => ({ type: DataTypes.DOUBLE, allowNull: true });
  return {
    head: text(120),
    loftDeg: num(),
    hoselSetting: text(60),
    hoselLoftChangeDeg: num(),
    hoselLieChangeDeg: num(),
    hoselFaceChangeDeg: num(),
    lieDeg: num(),
    lengthIn: num(),
    shaft: text(120),
    shaftWeightG: num(),
    shaftFlex: text(20),
    torqueDeg: num(),
    grip: text(120),
    gripSize: text(40),
    swingWeight: text(10),
    totalWeightG: num(),
    balancePointIn: num(),
    addedMassG: num(),
    addedMassWhere: text(60),
    notes: { type: DataTypes.TEXT, allowNull: true },
  };
}

/** The spec attributes as model fields (declare these in each model class): the printable spec of analysis/bag. */
export type SpecAttributes = PrintableSpec;

export const SPEC_ATTRIBUTE_KEYS: readonly (keyof SpecAttributes)[] = [
  'head', 'loftDeg', 'hoselSetting', 'hoselLoftChangeDeg', 'hoselLieChangeDeg', 'hoselFaceChangeDeg', 'lieDeg', 'lengthIn',
  'shaft', 'shaftWeightG', 'shaftFlex', 'torqueDeg', 'grip', 'gripSize', 'swingWeight', 'totalWeightG', 'balancePointIn',
  'addedMassG', 'addedMassWhere', 'notes',
];

/** The spec of a model row as a plain object (null where unset). */
export function specOf(row: SpecAttributes): SpecAttributes {
  const out = {} as Record<keyof SpecAttributes, unknown>;
  for (const k of SPEC_ATTRIBUTE_KEYS) out[k] = row[k] ?? null;
  return out as SpecAttributes;
}
