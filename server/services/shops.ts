/**
 * The shop's own page: its name, its default units for new people, closing and reopening.
 * A closed shop's people cannot sign in; its owner can, to reopen it or take the export, until
 * the grace period ends and `purgeClosedShops` deletes the shop with everything in it (every
 * table's rows of a shop go with it: ON DELETE CASCADE from shops, migrations 0001–0009).
 */
import { Op } from 'sequelize';
import type { z } from 'zod';
import { HttpError, notFound } from '../errors';
import { Shop, User } from '../models';
import type { ShopInfo, shopUpdateSchema } from '../schemas';
import { type Actor, requireOwner, requireStaff } from './actor';
import { endAllSessions } from './sessions';

/** Days a closed shop can still be reopened before its data is deleted. */
export const SHOP_GRACE_DAYS = 30;
const DAY_MS = 24 * 60 * 60 * 1000;

const toInfo = (shop: Shop): ShopInfo => ({
  id: shop.id,
  name: shop.name,
  closedAt: shop.closedAt ? shop.closedAt.toISOString() : null,
  purgeAfter: shop.purgeAfter ? shop.purgeAfter.toISOString() : null,
  graceDays: SHOP_GRACE_DAYS,
  defaultUnits: shop.defaultUnits,
  defaultLengthUnit: shop.defaultLengthUnit ?? null,
  defaultAltitudeUnit: shop.defaultAltitudeUnit ?? null,
  defaultTemperatureUnit: shop.defaultTemperatureUnit ?? null,
});

async function ownShop(actor: Actor): Promise<Shop> {
  const shop = await Shop.findByPk(actor.shopId);
  if (!shop) throw notFound('That shop');
  return shop;
}

export async function getShop(actor: Actor): Promise<ShopInfo> {
  requireStaff(actor);
  return toInfo(await ownShop(actor));
}

/** The owner sets the units new people start with. */
export async function updateShop(actor: Actor, body: z.output<typeof shopUpdateSchema>): Promise<ShopInfo> {
  requireOwner(actor);
  const shop = await ownShop(actor);
  for (const key of ['defaultUnits', 'defaultLengthUnit', 'defaultAltitudeUnit', 'defaultTemperatureUnit'] as const) {
    if (body[key] !== undefined) shop.set(key, body[key] as never);
  }
  await shop.save();
  return toInfo(shop);
}

/**
 * Closes the shop when the typed name matches: everyone but the owner is signed out and can no
 * longer sign in; the data is kept SHOP_GRACE_DAYS, then deleted.
 * @throws 400 SHOP_NAME_MISMATCH, 409 SHOP_CLOSED when closed already
 */
export async function closeShop(actor: Actor, typedName: string, now = new Date()): Promise<ShopInfo> {
  requireOwner(actor);
  const shop = await ownShop(actor);
  if (shop.closedAt) throw new HttpError(409, 'SHOP_CLOSED', 'The shop is closed already.');
  if (typedName.trim().toLowerCase() !== shop.name.trim().toLowerCase()) {
    throw new HttpError(400, 'SHOP_NAME_MISMATCH', 'Type the shop’s name exactly as it is written above.', [{ path: ['shopName'], message: 'That is not the shop’s name.' }]);
  }
  await Shop.sequelize!.transaction(async (transaction) => {
    await shop.update({ closedAt: now, purgeAfter: new Date(now.getTime() + SHOP_GRACE_DAYS * DAY_MS) }, { transaction });
    const others = await User.findAll({ where: { shopId: shop.id, role: { [Op.ne]: 'owner' } }, attributes: ['id', 'tokenVersion'], transaction });
    for (const user of others) {
      await user.update({ tokenVersion: user.tokenVersion + 1 }, { transaction });
      await endAllSessions(user.id, now, transaction);
    }
  });
  return toInfo(shop);
}

export async function reopenShop(actor: Actor): Promise<ShopInfo> {
  requireOwner(actor);
  const shop = await ownShop(actor);
  if (!shop.closedAt) throw new HttpError(409, 'SHOP_OPEN', 'The shop is open.');
  await shop.update({ closedAt: null, purgeAfter: null });
  return toInfo(shop);
}

/**
 * Deletes every closed shop whose grace period has ended, one at a time; returns how many.
 * Run at server start, every hour after, and by `scripts/purge-closed-shops.ts`.
 */
export async function purgeClosedShops(now = new Date()): Promise<number> {
  const due = await Shop.findAll({ where: { closedAt: { [Op.ne]: null }, purgeAfter: { [Op.lte]: now } }, attributes: ['id'], limit: 100 });
  for (const shop of due) await Shop.destroy({ where: { id: shop.id, purgeAfter: { [Op.lte]: now } } });
  return due.length;
}
