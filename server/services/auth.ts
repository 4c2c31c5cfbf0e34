import { HttpError } from '../errors';
import { Player, Shop, User } from '../models';
import type { Me, SignInBody, UnitsPreference } from '../schemas';
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
  return user;
}

/** Loads the actor of a verified token; null when the user is gone, inactive or signed out (everywhere or in this session). */
export async function loadActor(userId: string, tokenVersion: number, sessionId: string): Promise<Actor | null> {
  const user = await User.findByPk(userId);
  if (!user || !user.active || user.tokenVersion !== tokenVersion) return null;
  if (!(await isSessionOpen(sessionId, userId))) return null;
  let playerId: string | null = null;
  if (user.role === 'player') {
    const player = await Player.findOne({ where: { userId: user.id }, attributes: ['id'] });
    playerId = player?.id ?? null;
  }
  return { id: user.id, role: user.role, shopId: user.shopId, playerId, units: user.units };
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
    shop: { id: shop.id, name: shop.name },
    playerId: actor.playerId,
    units: user.units,
  };
}

export async function updateUnits(actor: Actor, units: UnitsPreference): Promise<void> {
  await User.update({ units }, { where: { id: actor.id } });
}

/** Ends every session of a user (all devices). */
export async function signOutEverywhere(actor: Actor): Promise<void> {
  const user = await User.findByPk(actor.id);
  if (user) await user.increment('tokenVersion');
  await endAllSessions(actor.id);
}

