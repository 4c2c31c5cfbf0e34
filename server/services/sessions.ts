/**
 * Server-side sessions: every sign-in makes one; its id travels in the token and is checked on
 * every request, so signing out ends that token on the server too, not only in the browser.
 */
import { Op, type Transaction } from 'sequelize';
import { Session } from '../models';

/** Starts a session of a user lasting `ttlMs`. */
export async function startSession(userId: string, ttlMs: number, now = new Date()): Promise<Session> {
  return Session.create({ userId, expiresAt: new Date(now.getTime() + ttlMs), endedAt: null });
}

/** Whether a session of this user is still open. */
export async function isSessionOpen(sessionId: string, userId: string, now = new Date()): Promise<boolean> {
  const session = await Session.findByPk(sessionId, { attributes: ['userId', 'expiresAt', 'endedAt'] });
  return !!session && session.userId === userId && session.endedAt === null && session.expiresAt > now;
}

/** Ends one session (sign-out). */
export async function endSession(sessionId: string, now = new Date()): Promise<void> {
  await Session.update({ endedAt: now }, { where: { id: sessionId, endedAt: null } });
}

/** Ends every session of a user (sign out everywhere, a new password, a deactivated fitter). */
export async function endAllSessions(userId: string, now = new Date(), transaction?: Transaction): Promise<void> {
  await Session.update({ endedAt: now }, { where: { userId, endedAt: null }, transaction });
}

/** Removes sessions that ended or expired more than a day ago (housekeeping at sign-in). */
export async function pruneSessions(userId: string, now = new Date()): Promise<void> {
  const dayAgo = new Date(now.getTime() - 86_400_000);
  await Session.destroy({ where: { userId, [Op.or]: [{ expiresAt: { [Op.lt]: dayAgo } }, { endedAt: { [Op.lt]: dayAgo } }] } });
}
