/**
 * A recipe: a saved column mapping for one dialect of bay file. JSON, validated by
 * `recipeSchema`, applied instead of or on top of the automatic suggestion.
 */
import { z } from 'zod';
import { SHOT_FIELDS, SIDE_FIELDS, type ShotField } from '@/analysis/fields';
import { fieldDimension, findUnit } from '@/analysis/units';
import { MAX_COLUMNS, MAX_HEADER_CHARS } from './import-limits';

/**
 * How a left/right value is written. '+' is right in Ovalyard.
 * - suffix-LR: "12.3 L", "12.3R", "4.2 right"
 * - prefix-LR: "L 12.3", "R4.5", "left 4.2"
 * - signed-right-positive: "-12.3" is left, "12.3" is right
 * - signed-left-positive: "12.3" is left, "-12.3" is right
 */
export type SideNotation = 'suffix-LR' | 'prefix-LR' | 'signed-right-positive' | 'signed-left-positive';

export const SIDE_NOTATIONS = [
  'suffix-LR',
  'prefix-LR',
  'signed-right-positive',
  'signed-left-positive',
] as const satisfies readonly SideNotation[];

/** What a column holds: a canonical shot field, the club, (part of) the build, or nothing we keep. */
export type ColumnTarget = ShotField | 'club' | 'build' | 'ignore';

/** Fields a file may write for the player's hand: the left/right fields and face to path. */
export const HANDED_FIELDS: ReadonlySet<ShotField> = new Set<ShotField>([...SIDE_FIELDS, 'faceToPath']);

/** Whether a column target may be written for the player's hand. */
export function isHandedTarget(target: ColumnTarget): target is ShotField {
  return target !== 'club' && target !== 'build' && target !== 'ignore' && HANDED_FIELDS.has(target);
}

export const COLUMN_TARGETS = [...SHOT_FIELDS, 'club', 'build', 'ignore'] as const;

export interface RecipeColumn {
  field: ColumnTarget;
  /** Unit of the column's numbers (any alias units.ts knows); for shot fields only. */
  unit?: string;
  /** Side notation; for left/right fields only. */
  side?: SideNotation;
  /**
   * Signed values written for the player's hand rather than the target line: + is right for a
   * right-handed player and left for a left-handed one, so a left-hander's values are turned
   * round on import (stored shots keep + = right for both hands). For the left/right fields and
   * face to path, with a signed notation only (L and R letters are the same for both hands).
   */
  handed?: boolean;
}

export type Recipe = {
  delimiter?: ',' | ';' | '\t';
  decimal?: '.' | ',';
  /** 0-based line index of the header row. */
  headerRow?: number;
  /** Keyed by header as the file writes it (duplicates disambiguated: "Carry", "Carry (2)"). */
  columns: Record<string, RecipeColumn>;
};

const columnSchema = z
  .object({
    field: z.enum(COLUMN_TARGETS),
    unit: z.string().min(1).max(40).optional(),
    side: z.enum(SIDE_NOTATIONS).optional(),
    handed: z.boolean().optional(),
  })
  .strict()
  .superRefine((column, ctx) => {
    if (column.unit === undefined) return;
    const info = findUnit(column.unit);
    if (!info) {
      ctx.addIssue({ code: 'custom', path: ['unit'], message: `Unknown unit "${column.unit}"`, params: { importCode: 'UNKNOWN_UNIT' } });
      return;
    }
    if (column.field === 'club' || column.field === 'build' || column.field === 'ignore') return;
    const dimension = fieldDimension(column.field);
    if (info.dimension !== dimension) {
      ctx.addIssue({
        code: 'custom',
        path: ['unit'],
        message: `Unit "${column.unit}" is a ${info.dimension} unit; ${column.field} needs a ${dimension} unit`,
        params: { importCode: 'UNIT_MISMATCH' },
      });
    }
  })
  .superRefine((column, ctx) => {
    if (column.side === undefined) return;
    const isSideField =
      column.field !== 'club' && column.field !== 'build' && column.field !== 'ignore' && SIDE_FIELDS.has(column.field);
    if (!isSideField) {
      ctx.addIssue({ code: 'custom', path: ['side'], message: `${column.field} has no left/right side` });
    }
  })
  .superRefine((column, ctx) => {
    if (column.handed !== true) return;
    if (!isHandedTarget(column.field)) {
      ctx.addIssue({ code: 'custom', path: ['handed'], message: `${column.field} is the same for both hands` });
    } else if (column.side === 'suffix-LR' || column.side === 'prefix-LR') {
      ctx.addIssue({ code: 'custom', path: ['handed'], message: 'L and R letters are the same for both hands; only signed values can be written for the player\'s hand' });
    }
  });

/**
 * Zod schema of a recipe's JSON. Checks the shape, that every unit is known and fits its field's
 * dimension, and that a side notation is given only for a left/right field.
 * @example recipeSchema.parse({ delimiter: ';', columns: { 'Carry (m)': { field: 'carry', unit: 'm' } } })
 */
export const recipeSchema: z.ZodType<Recipe> = z
  .object({
    delimiter: z.enum([',', ';', '\t']).optional(),
    decimal: z.enum(['.', ',']).optional(),
    headerRow: z.number().int().min(0).max(10_000).optional(),
    columns: z
      .record(z.string().max(MAX_HEADER_CHARS), columnSchema)
      .refine((columns) => Object.keys(columns).length <= MAX_COLUMNS, { message: `A recipe maps at most ${MAX_COLUMNS} columns` }),
  })
  .strict();
