/**
 * Invitations by e-mail: the owner invites fitters, staff invite a player to their profile. The
 * link (7 days, one use) opens the invitation page, where the person sets their own password;
 * no password is ever handed over.
 *
 * An address that already has an account anywhere is not told apart from a fresh one: the
 * invitation is made and listed the same way, and that address gets a "you already have an
 * account" message instead of a link (accounts are never linked across shops). Expired, used,
 * revoked and unknown links all answer INVITATION_INVALID.
 */
import { Op } from 'sequelize';
import type { z } from 'zod';
import { HttpError, notFound } from '../errors';
import { Invitation, Player, Shop, User } from '../models';
import type { Invitation as InvitationView, InvitationPreview, fitterInvitationBodySchema } from '../schemas';
import { type Actor, requireOwner, requireStaff } from './actor';
import { appLink, newLinkToken, sha256Hex } from './link-tokens';
import type { Mailer } from './mailer';
import { assertStrongPassword } from './password-strength';
import { hashPassword } from './passwords';
import { findVisiblePlayer } from './players';

export const INVITATION_TTL_MS = 7 * 24 * 60 * 60 * 1000;

export const invitationInvalid = () =>
  new HttpError(400, 'INVITATION_INVALID', 'This invitation link no longer works. Ask the shop that invited you to send a new one.');

const toView = (inv: Invitation, now: Date): InvitationView => ({
  id: inv.id,
  role: inv.role,
  name: inv.name,
  email: inv.email,
  playerId: inv.playerId ?? null,
  sentAt: inv.sentAt.toISOString(),
  expiresAt: inv.expiresAt.toISOString(),
  status: inv.expiresAt > now ? 'open' : 'expired',
});

/** The shop's units for a new person. */
async function shopOf(shopId: string): Promise<Shop> {
  const shop = await Shop.findByPk(shopId);
  if (!shop) throw notFound('That shop');
  return shop;
}

/**
 * Mails the link, or, to an address with an account, the "already have an account" message.
 * The same work either way (one lookup, one message).
 */
async function deliver(inv: Invitation, token: string, shopName: string, appUrl: string, mailer: Mailer): Promise<void> {
  const existing = await User.findOne({ where: { email: inv.email }, attributes: ['id'] });
  if (existing) {
    await mailer.send({
      to: inv.email,
      subject: `${shopName} invited you to Ovalyard`,
      text: [
        'Hello,',
        '',
        `${shopName} invited this address to Ovalyard, but it has an Ovalyard account already, and an address belongs to one account only.`,
        'Nothing was changed. If you want to use Ovalyard with this shop too, reply to the shop with another address to invite.',
        `To sign in to the account you have: ${appLink(appUrl, '/sign-in')}`,
      ].join('\n'),
    });
    return;
  }
  const what = inv.role === 'fitter' ? 'as a fitter' : 'to see your fittings, ovals, bag and spec sheets';
  await mailer.send({
    to: inv.email,
    subject: `${shopName} invited you to Ovalyard`,
    text: [
      `Hello ${inv.name},`,
      '',
      `${shopName} invited you to Ovalyard ${what}.`,
      `Open this link within 7 days to choose your password: ${appLink(appUrl, `/invite/${token}`)}`,
      '',
      'If you did not expect this, ignore the message: nothing happens without the link.',
    ].join('\n'),
  });
}

/** Any open invitation of the same person in this shop is revoked by a new one. */
async function revokeOpen(shopId: string, where: { email?: string; playerId?: string }, now: Date): Promise<void> {
  await Invitation.update({ revokedAt: now }, { where: { shopId, usedAt: null, revokedAt: null, ...where } });
}

async function refuseOwnShopAccount(shopId: string, email: string): Promise<void> {
  // the shop's own people are the shop's to know about; other shops' are never told
  if (await User.findOne({ where: { email, shopId }, attributes: ['id'] })) {
    throw new HttpError(409, 'EMAIL_TAKEN', 'Someone in your shop already signs in with that address.');
  }
}

async function create(actor: Actor, fields: { role: 'fitter' | 'player'; email: string; name: string; playerId: string | null }, appUrl: string, mailer: Mailer, now: Date): Promise<InvitationView> {
  const shop = await shopOf(actor.shopId);
  const { token, tokenHash } = newLinkToken();
  const inv = await Invitation.create({
    shopId: actor.shopId,
    ...fields,
    invitedBy: actor.id,
    tokenHash,
    expiresAt: new Date(now.getTime() + INVITATION_TTL_MS),
    sentAt: now,
    usedAt: null,
    revokedAt: null,
  });
  await deliver(inv, token, shop.name, appUrl, mailer);
  return toView(inv, now);
}

/** The owner invites a fitter. @throws 403 for anyone else, 409 EMAIL_TAKEN for one of the shop's own addresses */
export async function inviteFitter(actor: Actor, body: z.output<typeof fitterInvitationBodySchema>, appUrl: string, mailer: Mailer, now = new Date()): Promise<InvitationView> {
  requireOwner(actor);
  await refuseOwnShopAccount(actor.shopId, body.email);
  await revokeOpen(actor.shopId, { email: body.email }, now);
  return create(actor, { role: 'fitter', email: body.email, name: body.name, playerId: null }, appUrl, mailer, now);
}

/**
 * Staff invite a player to their own profile (its address unless another is given).
 * @throws 404 for another shop's player, 409 HAS_ACCOUNT, 400 NO_EMAIL
 */
export async function invitePlayer(actor: Actor, playerId: string, email: string | undefined, appUrl: string, mailer: Mailer, now = new Date()): Promise<InvitationView> {
  requireStaff(actor);
  const player = await findVisiblePlayer(actor, playerId);
  if (player.userId) throw new HttpError(409, 'HAS_ACCOUNT', 'This player already has a sign-in.');
  const address = email ?? player.email;
  if (!address) throw new HttpError(400, 'VALIDATION_FAILED', 'Enter the player’s e-mail address.', [{ path: ['email'], message: 'Enter the player’s e-mail address.' }]);
  await refuseOwnShopAccount(actor.shopId, address);
  await revokeOpen(actor.shopId, { playerId: player.id }, now);
  return create(actor, { role: 'player', email: address, name: player.name, playerId: player.id }, appUrl, mailer, now);
}

const openWhere = { usedAt: null, revokedAt: null };

/** The owner's open fitter invitations. */
export async function listFitterInvitations(actor: Actor, now = new Date()): Promise<InvitationView[]> {
  requireOwner(actor);
  const rows = await Invitation.findAll({ where: { shopId: actor.shopId, role: 'fitter', ...openWhere }, order: [['sentAt', 'DESC']], limit: 200 });
  return rows.map((r) => toView(r, now));
}

/** A player's open invitations (staff). */
export async function listPlayerInvitations(actor: Actor, playerId: string, now = new Date()): Promise<InvitationView[]> {
  requireStaff(actor);
  const player = await findVisiblePlayer(actor, playerId);
  const rows = await Invitation.findAll({ where: { shopId: actor.shopId, playerId: player.id, ...openWhere }, order: [['sentAt', 'DESC']], limit: 50 });
  return rows.map((r) => toView(r, now));
}

/** An open invitation the actor may manage: the owner any, a fitter only players'; another shop's 404. */
async function findManageable(actor: Actor, id: string): Promise<Invitation> {
  requireStaff(actor);
  const inv = await Invitation.findOne({ where: { id, shopId: actor.shopId, ...openWhere } });
  if (!inv) throw notFound('That invitation');
  if (inv.role === 'fitter') requireOwner(actor);
  return inv;
}

/** Sends a fresh link (the old one stops working) with a fresh expiry. */
export async function resendInvitation(actor: Actor, id: string, appUrl: string, mailer: Mailer, now = new Date()): Promise<InvitationView> {
  const inv = await findManageable(actor, id);
  const shop = await shopOf(actor.shopId);
  const { token, tokenHash } = newLinkToken();
  await inv.update({ tokenHash, sentAt: now, expiresAt: new Date(now.getTime() + INVITATION_TTL_MS) });
  await deliver(inv, token, shop.name, appUrl, mailer);
  return toView(inv, now);
}

export async function revokeInvitation(actor: Actor, id: string, now = new Date()): Promise<void> {
  const inv = await findManageable(actor, id);
  await inv.update({ revokedAt: now });
}

async function findUsable(token: string, now: Date): Promise<{ inv: Invitation; shop: Shop }> {
  const inv = await Invitation.findOne({ where: { tokenHash: sha256Hex(token), ...openWhere, expiresAt: { [Op.gt]: now } } });
  const shop = inv ? await Shop.findByPk(inv.shopId) : null;
  if (!inv || !shop || shop.closedAt) throw invitationInvalid();
  return { inv, shop };
}

/** What the invitation page shows: who is invited, by which shop. */
export async function previewInvitation(token: string, now = new Date()): Promise<InvitationPreview> {
  const { inv, shop } = await findUsable(token, now);
  return { name: inv.name, email: inv.email, shopName: shop.name, role: inv.role };
}

/**
 * Sets the password of a valid link: makes the fitter's or the player's sign-in (linked to the
 * profile) with the shop's default units, and uses the link up.
 * @throws 400 INVITATION_INVALID, 400 WEAK_PASSWORD
 */
export async function acceptInvitation(token: string, password: string, now = new Date()): Promise<User> {
  const { inv, shop } = await findUsable(token, now);
  assertStrongPassword(password, [inv.email, inv.name]);
  const passwordHash = await hashPassword(password);
  try {
    return await User.sequelize!.transaction(async (transaction) => {
      const [used] = await Invitation.update({ usedAt: now }, { where: { id: inv.id, ...openWhere }, transaction });
      if (used !== 1) throw invitationInvalid();
      const player = inv.playerId ? await Player.findOne({ where: { id: inv.playerId, shopId: inv.shopId }, transaction, lock: transaction.LOCK.UPDATE }) : null;
      if (inv.role === 'player' && (!player || player.userId)) throw invitationInvalid();
      const user = await User.create(
        {
          shopId: inv.shopId,
          email: inv.email,
          name: inv.name,
          role: inv.role,
          passwordHash,
          emailVerifiedAt: now, // the link came to this address
          units: shop.defaultUnits,
          lengthUnit: shop.defaultLengthUnit,
          altitudeUnit: shop.defaultAltitudeUnit,
          temperatureUnit: shop.defaultTemperatureUnit,
        },
        { transaction },
      );
      if (player) {
        player.userId = user.id;
        if (!player.email) player.email = inv.email;
        await player.save({ transaction });
      }
      return user;
    });
  } catch (err) {
    // the address got an account since the invitation was sent
    if ((err as { name?: string }).name === 'SequelizeUniqueConstraintError') throw invitationInvalid();
    throw err;
  }
}
