import { z } from 'zod';
import { archivedFilterSchema, optionalText } from './common';

export const handednessSchema = z.enum(['right', 'left']);

const nullableNumber = (min: number, max: number) => z.number().min(min).max(max).nullish().transform((v) => v ?? null);

const playerFields = {
  name: z.string().trim().min(1, 'Enter the player’s name.').max(120),
  email: z
    .string()
    .trim()
    .toLowerCase()
    .max(200)
    .nullish()
    .transform((v) => (v ? v : null))
    .pipe(z.email({ message: 'That e-mail address does not look right.' }).nullable()),
  handedness: handednessSchema,
  heightCm: nullableNumber(100, 230),
  wristToFloorCm: nullableNumber(50, 120),
  handicap: nullableNumber(-10, 54),
  usualMiss: optionalText(200),
  goals: optionalText(2000),
};

/** A player's profile, as a fitter enters it. */
export const playerBodySchema = z.object({ ...playerFields, handedness: handednessSchema.default('right') });
export type PlayerBody = z.input<typeof playerBodySchema>;
/** A change to a profile: only the keys sent change (no defaults here, on purpose). */
export const playerUpdateSchema = z.object(playerFields).partial();

export const playerSchema = z.object({
  id: z.string(),
  shopId: z.string(),
  name: z.string(),
  email: z.string().nullable(),
  handedness: handednessSchema,
  heightCm: z.number().nullable(),
  wristToFloorCm: z.number().nullable(),
  handicap: z.number().nullable(),
  usualMiss: z.string().nullable(),
  goals: z.string().nullable(),
  hasAccount: z.boolean(),
  /** Hidden from lists unless asked for. */
  archived: z.boolean().default(false),
  fittingCount: z.number().optional(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Player = z.infer<typeof playerSchema>;

export const playerSortSchema = z.enum(['name-asc', 'name-desc', 'newest', 'oldest'], { message: 'Sort is name-asc, name-desc, newest or oldest.' });
export type PlayerSort = z.infer<typeof playerSortSchema>;

/** GET /api/players query: a search in name and e-mail, the archived filter and the order. */
export const playerListQuerySchema = z.object({
  q: z.string().trim().max(100, 'Search with at most 100 characters.').optional(),
  archived: archivedFilterSchema.default('hide'),
  sort: playerSortSchema.default('name-asc'),
});
export type PlayerListQuery = z.output<typeof playerListQuerySchema>;
export type PlayerFilters = z.input<typeof playerListQuerySchema>;
