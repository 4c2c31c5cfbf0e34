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
  shop: z.object({ id: z.string(), name: z.string() }),
  /** The player profile of a player user. */
  playerId: z.string().nullable(),
  units: unitsPreferenceSchema,
});
export type Me = z.infer<typeof meSchema>;

export const signInResponseSchema = z.object({ user: meSchema });

export const updateMeBodySchema = z.object({ units: unitsPreferenceSchema });

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
