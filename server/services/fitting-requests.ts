/**
 * A shop's public request page (/request/<slug>): anyone sees the shop's name; a signed-in
 * player of that shop asks for a remote fitting, which opens one at "requested" for the staff.
 */
import { randomBytes } from 'node:crypto';
import { HttpError, notFound } from '../errors';
import { Fitting, Player, Shop, ShopRequestLink } from '../models';
import type { Fitting as FittingAnswer, RequestPage } from '../schemas';
import { type Actor, requireStaff } from './actor';
import { noticeStep, recordStep } from './fitting-course';
import { getFitting } from './fittings';
import type { Mailer } from './mailer';

/** A slug from the shop's name and a random tail: "birch-lane-fitting-3f9a1c". */
export function slugFor(name: string): string {
  const words = name.toLowerCase().normalize('NFKD').replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 60).replace(/-+$/, '');
  return `${words || 'shop'}-${randomBytes(3).toString('hex')}`;
}

/** GET /api/shop/request-link (staff): the shop's public link, made on first use. */
export async function shopRequestLink(actor: Actor): Promise<RequestPage> {
  requireStaff(actor);
  const shop = (await Shop.findByPk(actor.shopId))!;
  const [link] = await ShopRequestLink.findOrCreate({ where: { shopId: shop.id }, defaults: { shopId: shop.id, slug: slugFor(shop.name) } });
  return { shopName: shop.name, slug: link.slug };
}

async function shopOf(slug: string): Promise<Shop> {
  const link = await ShopRequestLink.findOne({ where: { slug } });
  const shop = link ? await Shop.findByPk(link.shopId) : null;
  if (!shop) throw notFound('That request page');
  return shop;
}

/** GET /api/requests/:slug (anyone): the shop's name. */
export async function requestPage(slug: string): Promise<RequestPage> {
  const shop = await shopOf(slug);
  return { shopName: shop.name, slug };
}

/**
 * POST /api/requests/:slug (a signed-in player of that shop): opens a remote fitting at
 * "requested" and tells the shop. Staff 403; a player of another shop 404 (the page is the shop's own).
 */
export async function requestFitting(actor: Actor, slug: string, note: string | null, today: string, mailer: Mailer, appUrl: string): Promise<FittingAnswer> {
  const shop = await shopOf(slug);
  if (shop.id !== actor.shopId) throw notFound('That request page');
  if (actor.role !== 'player') throw new HttpError(403, 'FORBIDDEN', 'Only a player asks for a fitting here; staff open one from the fittings list.');
  const player = actor.playerId ? await Player.findOne({ where: { id: actor.playerId, shopId: shop.id } }) : null;
  if (!player) throw notFound('Your player profile');
  const fitting = await Fitting.sequelize!.transaction(async (transaction) => {
    const f = await Fitting.create(
      { shopId: shop.id, playerId: player.id, fitterId: null, date: today, venue: 'indoor', temperatureC: null, altitudeM: null, humidityPct: null, groundFirmness: null, ball: null, notes: note, remote: true, courseStep: 'requested' },
      { transaction },
    );
    await recordStep({ fitting: f, step: 'requested', direction: 'forward', byUserId: actor.id, transaction });
    return f;
  });
  fitting.player = player;
  await noticeStep(mailer, appUrl, fitting, 'requested', 'forward');
  return getFitting(actor, fitting.id);
}
