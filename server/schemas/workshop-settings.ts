import { z } from 'zod';

const band = z.number().min(0).max(300).nullable();

/** The shop's workshop settings: wedge-wear counts and the static-fit table. */
export const workshopSettingsBodySchema = z.object({
  wedgeWearRounds: z.number().int('Rounds is a whole number.').min(1, 'Rounds must be at least 1.').max(1000, 'Rounds must be at most 1,000.'),
  wedgeWearPracticeSessions: z.number().int('Sessions is a whole number.').min(1, 'Sessions must be at least 1.').max(1000, 'Sessions must be at most 1,000.'),
  staticFitTable: z
    .array(
      z.object({
        heightFromCm: band,
        heightToCm: band,
        wristFromCm: band,
        wristToCm: band,
        lengthChangeIn: z.number().min(-3, 'A length change must be within ±3 in.').max(3, 'A length change must be within ±3 in.'),
      }),
    )
    .min(1, 'Keep at least one row.')
    .max(200, 'At most 200 rows.'),
});
export type WorkshopSettingsBody = z.input<typeof workshopSettingsBodySchema>;
export type WorkshopSettings = z.output<typeof workshopSettingsBodySchema> & { isDefault: boolean; updatedAt: string | null };
