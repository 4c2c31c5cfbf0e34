import { z } from 'zod';
import { SHOT_FIELDS, type ShotField } from '../../analysis/fields';
import { DEFAULT_MARGINS } from '../../analysis/head-to-head/margins';

/** A margin may be set between a hundredth and twenty times its default (canonical units). */
const marginOf = (field: ShotField) =>
  z
    .number()
    .positive('A margin must be more than 0.')
    .min(DEFAULT_MARGINS[field] / 100, 'That margin is too small to mean anything.')
    .max(DEFAULT_MARGINS[field] * 20, 'That margin is too large to tell builds apart.');

/** PUT /api/shop/margins: the shop's own margins (fields left out keep the defaults) and odds targets. */
export const shopMarginsBodySchema = z
  .object({
    margins: z
      .object(Object.fromEntries(SHOT_FIELDS.map((f) => [f, marginOf(f).optional()])) as Record<ShotField, z.ZodOptional<z.ZodNumber>>)
      .strict()
      .default({}),
    /** Fairway width for the on-target odds, m (null: the default). */
    fairwayWidthM: z.number().min(5).max(100).nullish(),
    /** Green radius, m (null: the default). */
    greenRadiusM: z.number().min(1).max(50).nullish(),
  })
  .strict();
export type ShopMarginsBody = z.input<typeof shopMarginsBodySchema>;

/** GET /api/shop/margins: what the shop uses, its own choices and the defaults. */
export interface ShopMarginsView {
  /** The margins in use per field (the shop's, else the default), canonical units. */
  margins: Record<ShotField, number>;
  /** The fields the owner set. */
  custom: Partial<Record<ShotField, number>>;
  defaults: Record<ShotField, number>;
  fairwayWidthM: number;
  greenRadiusM: number;
  defaultFairwayWidthM: number;
  defaultGreenRadiusM: number;
  /** Whether the owner may change them (the signed-in user is the owner). */
  canEdit: boolean;
  updatedAt: string | null;
}

/** The margins the shop stored (JSON), read back safely: anything unreadable counts as not set. */
export const storedMarginsSchema = shopMarginsBodySchema.shape.margins;
