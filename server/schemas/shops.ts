import { z } from 'zod';

const email = () => z.string().trim().toLowerCase().max(200).pipe(z.email({ message: 'Enter an e-mail address.' }));
const newPassword = () => z.string().min(10, 'A password needs at least 10 characters.').max(200);
const linkToken = () => z.string().min(20, 'This link is incomplete.').max(200);

/** A new shop and its owner (the public sign-up page). */
export const signUpBodySchema = z.object({
  shopName: z.string().trim().min(1, 'Enter the shop’s name.').max(160),
  name: z.string().trim().min(1, 'Enter your name.').max(120),
  email: email(),
  password: newPassword(),
});
export type SignUpBody = z.infer<typeof signUpBodySchema>;

export const verifyBodySchema = z.object({ token: linkToken() });
export const resendVerificationBodySchema = z.object({ email: email() });

/** An e-mailed invitation link, read or accepted. */
export const invitationTokenBodySchema = z.object({ token: linkToken() });
export const acceptInvitationBodySchema = z.object({ token: linkToken(), password: newPassword() });

/** What the invitation page shows before the password is set. */
export const invitationPreviewSchema = z.object({
  name: z.string(),
  email: z.string(),
  shopName: z.string(),
  role: z.enum(['fitter', 'player']),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

/** The owner invites a fitter. */
export const fitterInvitationBodySchema = z.object({
  name: z.string().trim().min(1, 'Enter a name.').max(120),
  email: email(),
});
/** Staff invite a player to their profile (the profile's address when none is given). */
export const playerInvitationBodySchema = z.object({
  email: email().optional(),
});

export const invitationSchema = z.object({
  id: z.string(),
  role: z.enum(['fitter', 'player']),
  name: z.string(),
  email: z.string(),
  playerId: z.string().nullable(),
  sentAt: z.string(),
  expiresAt: z.string(),
  /** open: waiting; expired: the link no longer works (send it again). */
  status: z.enum(['open', 'expired']),
});
export type Invitation = z.infer<typeof invitationSchema>;

export const lengthUnitSchema = z.enum(['in', 'cm']);
export const altitudeUnitSchema = z.enum(['ft', 'm']);
export const temperatureUnitSchema = z.enum(['f', 'c']);
export type LengthUnit = z.infer<typeof lengthUnitSchema>;
export type AltitudeUnit = z.infer<typeof altitudeUnitSchema>;
export type TemperatureUnit = z.infer<typeof temperatureUnitSchema>;

/** The shop as its staff see it: name, whether it is closed, the units new people start with. */
export const shopSchema = z.object({
  id: z.string(),
  name: z.string(),
  closedAt: z.string().nullable(),
  purgeAfter: z.string().nullable(),
  graceDays: z.number(),
  defaultUnits: z.enum(['imperial', 'metric']),
  defaultLengthUnit: lengthUnitSchema.nullable(),
  defaultAltitudeUnit: altitudeUnitSchema.nullable(),
  defaultTemperatureUnit: temperatureUnitSchema.nullable(),
});
export type ShopInfo = z.infer<typeof shopSchema>;

/** The owner's shop-wide default units (null: follow defaultUnits). */
export const shopUpdateSchema = z.object({
  defaultUnits: z.enum(['imperial', 'metric']).optional(),
  defaultLengthUnit: lengthUnitSchema.nullable().optional(),
  defaultAltitudeUnit: altitudeUnitSchema.nullable().optional(),
  defaultTemperatureUnit: temperatureUnitSchema.nullable().optional(),
});

/** Closing asks for the shop's name, typed (asked once, in the page). */
export const closeShopBodySchema = z.object({ shopName: z.string().trim().min(1, 'Type the shop’s name.').max(160) });

/** Archive or bring back a player or a fitting. */
export const archiveBodySchema = z.object({ archived: z.boolean() });
