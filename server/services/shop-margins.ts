/**
 * A shop's decision settings: its own head-to-head margins and on-target odds targets. Staff
 * read them (they drive every verdict); only the owner changes them.
 */
import type { ShotField } from '../../analysis/fields';
import { DEFAULT_MARGINS, resolveMargins } from '../../analysis/head-to-head';
import { DEFAULT_FAIRWAY_WIDTH_M, DEFAULT_GREEN_RADIUS_M } from '../../analysis/odds';
import { ShopMargins } from '../models';
import { storedMarginsSchema, type ShopMarginsBody, type ShopMarginsView } from '../schemas';
import { type Actor, requireOwner, requireStaff } from './actor';
import { bumpShopFittingRevisions } from './fitting-revision';

/** The settings a shop's analysis uses (defaults where the owner set nothing). */
export interface ShopDecisionSettings {
  margins: Record<ShotField, number>;
  custom: Partial<Record<ShotField, number>>;
  fairwayWidthM: number;
  greenRadiusM: number;
  updatedAt: Date | null;
}

export async function shopDecisionSettings(shopId: string): Promise<ShopDecisionSettings> {
  const row = await ShopMargins.findByPk(shopId);
  let custom: Partial<Record<ShotField, number>> = {};
  if (row) {
    try {
      const parsed = storedMarginsSchema.safeParse(JSON.parse(row.margins));
      if (parsed.success) custom = parsed.data;
    } catch {
      custom = {};
    }
  }
  return {
    margins: resolveMargins(custom),
    custom,
    fairwayWidthM: row?.fairwayWidthM ?? DEFAULT_FAIRWAY_WIDTH_M,
    greenRadiusM: row?.greenRadiusM ?? DEFAULT_GREEN_RADIUS_M,
    updatedAt: row?.updatedAt ?? null,
  };
}

function view(actor: Actor, s: ShopDecisionSettings): ShopMarginsView {
  return {
    margins: s.margins,
    custom: s.custom,
    defaults: { ...DEFAULT_MARGINS },
    fairwayWidthM: s.fairwayWidthM,
    greenRadiusM: s.greenRadiusM,
    defaultFairwayWidthM: DEFAULT_FAIRWAY_WIDTH_M,
    defaultGreenRadiusM: DEFAULT_GREEN_RADIUS_M,
    canEdit: actor.role === 'owner',
    updatedAt: s.updatedAt ? s.updatedAt.toISOString() : null,
  };
}

export async function getShopMargins(actor: Actor): Promise<ShopMarginsView> {
  requireStaff(actor);
  return view(actor, await shopDecisionSettings(actor.shopId));
}

/** The owner sets the shop's margins: exactly the fields sent (the rest back to the defaults). */
export async function setShopMargins(actor: Actor, body: ShopMarginsBody & { margins: Partial<Record<ShotField, number>> }): Promise<ShopMarginsView> {
  requireOwner(actor);
  await ShopMargins.sequelize!.transaction(async (transaction) => {
    await ShopMargins.upsert(
      {
        shopId: actor.shopId,
        margins: JSON.stringify(body.margins),
        fairwayWidthM: body.fairwayWidthM ?? null,
        greenRadiusM: body.greenRadiusM ?? null,
        updatedBy: actor.id,
      },
      { transaction },
    );
    // Every answer of the shop's analyses reads the margins: kept answers are stale now.
    await bumpShopFittingRevisions(actor.shopId, transaction);
  });
  return view(actor, await shopDecisionSettings(actor.shopId));
}
