import { z } from 'zod';
import { roleSchema } from './common';

export const signInBodySchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email({ message: 'Enter an e-mail address.' })),
  password: z.string().min(1, 'Enter your password.').max(200),
});
export type SignInBody = z.infer<typeof signInBodySchema>;

export const unitsPreferenceSchema = z.enum(['imperial', 'metric']);
export type UnitsPreference = z.infer<typeof unitsPreferenceSchema>;

export const meSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  /** closedAt: the shop is closed (its owner sees the reopen and export page). */
  shop: z.object({ id: z.string(), name: z.string(), closedAt: z.string().nullable().default(null) }),
  /** The player profile of a player user. */
  playerId: z.string().nullable(),
  units: unitsPreferenceSchema,
  /** Per quantity, resolved (the user's own choice, else following `units`). */
  lengthUnit: z.enum(['in', 'cm']).default('in'),
  altitudeUnit: z.enum(['ft', 'm']).default('ft'),
  temperatureUnit: z.enum(['f', 'c']).default('f'),
});
export type Me = z.infer<typeof meSchema>;

export const signInResponseSchema = z.object({ user: meSchema });

/**
 * The user's units: `units` sets every quantity (per-quantity choices follow it again unless sent
 * too); a per-quantity choice alone changes only that one (null: follow `units`).
 */
export const updateMeBodySchema = z
  .object({
    units: unitsPreferenceSchema.optional(),
    lengthUnit: z.enum(['in', 'cm']).nullable().optional(),
    altitudeUnit: z.enum(['ft', 'm']).nullable().optional(),
    temperatureUnit: z.enum(['f', 'c']).nullable().optional(),
  })
  .refine((b) => Object.values(b).some((v) => v !== undefined), { message: 'Choose a unit.' });
export type UpdateMeBody = z.infer<typeof updateMeBodySchema>;

export const forgotBodySchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email({ message: 'Enter an e-mail address.' })),
});
export const resetBodySchema = z.object({
  token: z.string().min(20, 'This link is incomplete.').max(200),
  password: z.string().min(10, 'A password needs at least 10 characters.').max(200),
});

/** GET /api/demo: whether the invented demo is loaded (nothing else). */
export const demoStatusSchema = z.object({ demo: z.boolean() });
export type DemoStatus = z.infer<typeof demoStatusSchema>;
