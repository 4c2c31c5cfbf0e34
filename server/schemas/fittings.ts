import { z } from 'zod';
import { archivedFilterSchema } from './common';
import { optionalText } from './common';
import { courseStepSchema } from './fitting-course';

export const venueSchema = z.enum(['indoor', 'outdoor']);
/** Ground firmness of a fitting (ball-flight model: roll and total). */
export const groundFirmnessSchema = z.enum(['soft', 'normal', 'firm'], { message: 'Ground firmness is soft, normal or firm.' });

const nullableNumber = (min: number, max: number, message?: string) =>
  z.number().min(min, message).max(max, message).nullish().transform((v) => v ?? null);

const fittingFields = {
  /** The fitter running it; defaults to the signed-in fitter. */
  fitterId: z.uuid().nullish(),
  date: z.iso.date({ message: 'Enter a date as YYYY-MM-DD.' }),
  venue: venueSchema,
  temperatureC: nullableNumber(-20, 50, 'Temperature must be between −20 and 50 °C.'),
  altitudeM: nullableNumber(-430, 4500, 'Altitude must be between −430 and 4,500 m.'),
  humidityPct: nullableNumber(0, 100, 'Humidity is a percentage, 0 to 100.'),
  groundFirmness: groundFirmnessSchema.nullish().transform((v) => v ?? null),
  ball: optionalText(120),
  notes: optionalText(4000),
  /** A remote fitting: the player may upload their own bay files. */
  remote: z.boolean(),
};

export const fittingBodySchema = z.object({
  ...fittingFields,
  playerId: z.uuid({ message: 'Choose a player.' }),
  venue: venueSchema.default('indoor'),
  remote: z.boolean().default(false),
});
export type FittingBody = z.input<typeof fittingBodySchema>;
/** A change to a fitting: only the keys sent change (no defaults here, on purpose). */
export const fittingUpdateSchema = z.object(fittingFields).partial();

export const fittingSchema = z.object({
  id: z.string(),
  shopId: z.string(),
  playerId: z.string(),
  playerName: z.string(),
  fitterId: z.string().nullable(),
  fitterName: z.string().nullable(),
  date: z.string(),
  venue: venueSchema,
  temperatureC: z.number().nullable(),
  altitudeM: z.number().nullable(),
  humidityPct: z.number().nullable(),
  groundFirmness: groundFirmnessSchema.nullable(),
  ball: z.string().nullable(),
  notes: z.string().nullable(),
  remote: z.boolean(),
  /** Hidden from lists unless asked for. */
  archived: z.boolean().default(false),
  shotCount: z.number(),
  /** Where the fitting stands (its course). */
  courseStep: courseStepSchema,
  /** Messages on it the signed-in person has not read. */
  unreadMessages: z.number(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Fitting = z.infer<typeof fittingSchema>;

/** How a list of fittings is ordered: by date (newest first by default) or by player name. */
export const fittingSortSchema = z.enum(['date-desc', 'date-asc', 'player-asc', 'player-desc'], {
  message: 'Sort is date-desc, date-asc, player-asc or player-desc.',
});
export type FittingSort = z.infer<typeof fittingSortSchema>;

/** GET /api/fittings query: one player, a player-name search, a date range (inclusive) and the order. */
export const fittingListQuerySchema = z
  .object({
    playerId: z.uuid().optional(),
    /** Part of the player's name (case-insensitive). */
    q: z.string().trim().max(100, 'Search with at most 100 characters.').optional(),
    from: z.iso.date({ message: 'From is a date as YYYY-MM-DD.' }).optional(),
    to: z.iso.date({ message: 'To is a date as YYYY-MM-DD.' }).optional(),
    sort: fittingSortSchema.default('date-desc'),
    /** Only fittings at this step of their course. */
    step: courseStepSchema.optional(),
    /** Archived fittings: hidden (default), shown with the rest, or only them. */
    archived: archivedFilterSchema.default('hide'),
  })
  .refine((f) => !f.from || !f.to || f.from <= f.to, { path: ['to'], message: 'To is on or after From.' });
/** What a list asks for (sort optional: newest first). */
export type FittingFilters = z.input<typeof fittingListQuerySchema>;
export type FittingListQuery = z.output<typeof fittingListQuerySchema>;
