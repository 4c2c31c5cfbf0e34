/**
 * Password resets by e-mail: a one-hour, one-use link. Only the SHA-256 of the token is stored;
 * the answer to a request is the same whether or not the account exists.
 */
import { createHash, randomBytes } from 'node:crypto';
import { Op } from 'sequelize';
import { HttpError } from '../errors';
import { PasswordReset, User } from '../models';
import type { Mailer } from './mailer';
import { assertStrongPassword } from './password-strength';
import { hashPassword } from './passwords';
import { endAllSessions } from './sessions';

export const RESET_LINK_TTL_MS = 60 * 60 * 1000;

const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');

/** Sends a reset link to an active account with this e-mail; silently does nothing otherwise. */
export async function requestPasswordReset(email: string, appUrl: string, mailer: Mailer, now = new Date()): Promise<void> {
  const user = await User.findOne({ where: { email, active: true } });
  if (!user) return;
  const token = randomBytes(32).toString('base64url');
  // created and expiring by one clock reading, so the link lasts exactly RESET_LINK_TTL_MS
  await PasswordReset.create({ userId: user.id, tokenHash: sha256(token), expiresAt: new Date(now.getTime() + RESET_LINK_TTL_MS), usedAt: null, createdAt: now });
  const link = `${appUrl.replace(/\/$/, '')}/reset?token=${token}`;
  await mailer.send({
    to: user.email,
    subject: 'Set a new Ovalyard password',
    text: [
      `Hello ${user.name},`,
      '',
      'Someone (we hope you) asked to set a new password for your Ovalyard sign-in.',
      `Open this link within one hour to choose it: ${link}`,
      '',
      'If you did not ask, ignore this message: your password stays as it is.',
    ].join('\n'),
  });
}

/** Sets the new password of a valid link, uses the link up and ends every session of the user. */
export async function resetPassword(token: string, password: string, now = new Date()): Promise<void> {
  const reset = await PasswordReset.findOne({ where: { tokenHash: sha256(token), usedAt: null, expiresAt: { [Op.gt]: now } } });
  const user = reset ? await User.findByPk(reset.userId) : null;
  if (!reset || !user || !user.active) {
    throw new HttpError(400, 'RESET_LINK_INVALID', 'This link has expired or was already used. Ask for a new one.');
  }
  assertStrongPassword(password, [user.email, user.name]);
  const passwordHash = await hashPassword(password);
  await User.sequelize!.transaction(async (transaction) => {
    const [used] = await PasswordReset.update({ usedAt: now }, { where: { id: reset.id, usedAt: null }, transaction });
    if (used !== 1) throw new HttpError(400, 'RESET_LINK_INVALID', 'This link has expired or was already used. Ask for a new one.');
    await user.update({ passwordHash, tokenVersion: user.tokenVersion + 1 }, { transaction });
    await endAllSessions(user.id, now, transaction);
  });
}
