import { HttpError } from '../errors';
import { Player, Shop, User } from '../models';
import type { Me, SignInBody, UpdateMeBody } from '../schemas';
import type { Actor } from './actor';
import { verifyAgainstDummy, verifyPassword } from './passwords';
import { endAllSessions, isSessionOpen } from './sessions';

const badCredentials = () =>
  new HttpError(401, 'BAD_CREDENTIALS', 'That e-mail and password do not match an account.');

/** Checks an e-mail and password; the same answer and about the same time for every failure. */
export async function signIn(body: SignInBody): Promise<User> {
  const user = await User.findOne({ where: { email: body.email } });
  if (!user) {
    await verifyAgainstDummy(body.password);
    throw badCredentials();
  }
  const ok = await verifyPassword(body.password, user.passwordHash);
  if (!ok || !user.active) throw badCredentials();
  // told only to whoever knows the password
  if (!user.emailVerifiedAt) {
    throw new HttpError(403, 'EMAIL_NOT_VERIFIED', 'Confirm your e-mail address first: open the link we sent you. No message? Send the link again.');
  }
  if (user.role !== 'owner') {
    const shop = await Shop.findByPk(user.shopId, { attributes: ['closedAt'] });
    if (shop?.closedAt) throw new HttpError(403, 'SHOP_CLOSED', 'This shop has closed on Ovalyard. Ask the shop about your data.');
  }
  return user;
}

/** Loads the actor of a verified token; null when the user is gone, inactive or signed out (everywhere or in this session). */
export async function loadActor(userId: string, tokenVersion: number, sessionId: string): Promise<Actor | null> {
  const user = await User.findByPk(userId, { include: [{ model: Shop, as: 'shop', attributes: ['closedAt'] }] });
  if (!user || !user.active || user.tokenVersion !== tokenVersion || !user.emailVerifiedAt) return null;
  const shopClosed = Boolean((user as User & { shop?: Shop }).shop?.closedAt);
  if (shopClosed && user.role !== 'owner') return null;
  if (!(await isSessionOpen(sessionId, userId))) return null;
  let playerId: string | null = null;
  if (user.role === 'player') {
    const player = await Player.findOne({ where: { userId: user.id }, attributes: ['id'] });
    playerId = player?.id ?? null;
  }
  return { id: user.id, role: user.role, shopId: user.shopId, playerId, units: user.units, shopClosed };
}

export async function describeMe(actor: Actor): Promise<Me> {
  const user = await User.findByPk(actor.id, { include: [{ model: Shop, as: 'shop' }] });
  if (!user) throw new HttpError(401, 'UNAUTHENTICATED', 'Sign in first.');
  const shop = (user as User & { shop: Shop }).shop;
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    role: user.role,
    shop: { id: shop.id, name: shop.name, closedAt: shop.closedAt ? shop.closedAt.toISOString() : null },
    playerId: actor.playerId,
    units: user.units,
    ...resolvedUnits(user),
  };
}

/** A user's unit per quantity: their own choice, else what `units` says. */
export function resolvedUnits(user: Pick<User, 'units' | 'lengthUnit' | 'altitudeUnit' | 'temperatureUnit'>): Pick<Me, 'lengthUnit' | 'altitudeUnit' | 'temperatureUnit'> {
  const metric = user.units === 'metric';
  return {
    lengthUnit: user.lengthUnit ?? (metric ? 'cm' : 'in'),
    altitudeUnit: user.altitudeUnit ?? (metric ? 'm' : 'ft'),
    temperatureUnit: user.temperatureUnit ?? (metric ? 'c' : 'f'),
  };
}

/** Sets the user's units; `units` alone makes every quantity follow it again. */
export async function updateUnits(actor: Actor, body: UpdateMeBody): Promise<void> {
  const changes: Partial<Pick<User, 'units' | 'lengthUnit' | 'altitudeUnit' | 'temperatureUnit'>> = {};
  if (body.units) Object.assign(changes, { units: body.units, lengthUnit: null, altitudeUnit: null, temperatureUnit: null });
  if (body.lengthUnit !== undefined) changes.lengthUnit = body.lengthUnit;
  if (body.altitudeUnit !== undefined) changes.altitudeUnit = body.altitudeUnit;
  if (body.temperatureUnit !== undefined) changes.temperatureUnit = body.temperatureUnit;
  await User.update(changes, { where: { id: actor.id } });
}

/** Ends every session of a user (all devices). */
export async function signOutEverywhere(actor: Actor): Promise<void> {
  const user = await User.findByPk(actor.id);
  if (user) await user.increment('tokenVersion');
  await endAllSessions(actor.id);
}

