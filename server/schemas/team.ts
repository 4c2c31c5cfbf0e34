import { z } from 'zod';

// Fitters join by invitation (server/services/invitations.ts): nobody sets a password for another.
export const teamMemberUpdateSchema = z.object({
  name: z.string().trim().min(1).max(120).optional(),
  active: z.boolean().optional(),
});

export const teamMemberSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  role: z.enum(['owner', 'fitter']),
  active: z.boolean(),
});
export type TeamMember = z.infer<typeof teamMemberSchema>;

/** Gives a player profile a sign-in of its own. */
export const playerAccountBodySchema = z.object({
  email: z.string().trim().toLowerCase().pipe(z.email({ message: 'Enter an e-mail address.' })),
  password: z.string().min(10, 'A password needs at least 10 characters.').max(200),
});
