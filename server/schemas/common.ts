import { z } from 'zod';

export const idSchema = z.uuid();

/** Which archived records a list shows: none (default), all with the rest, or only them. */
export const archivedFilterSchema = z.enum(['hide', 'show', 'only'], { message: 'Archived is hide, show or only.' });
export type ArchivedFilter = z.infer<typeof archivedFilterSchema>;
export const idParamsSchema = z.object({ id: idSchema });

export const roleSchema = z.enum(['owner', 'fitter', 'player']);
export type Role = z.infer<typeof roleSchema>;

/** The one wire format of every error answer. */
export const errorBodySchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.array(z.unknown()).optional(),
  }),
});
export type ErrorBody = z.infer<typeof errorBodySchema>;

/** Trimmed text; an empty string becomes null. */
export const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max)
    .nullish()
    .transform((v) => (v ? v : null));
