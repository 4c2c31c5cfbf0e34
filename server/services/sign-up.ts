/**
 * A shop signs itself up: the shop and its owner are made at once, the owner confirms the
 * address by a one-use link (48 hours) before signing in. The answer to a sign-up is the same
 * whether or not the address has an account already (that address gets a "you already have an
 * account" message instead), so the page cannot be used to learn who has one.
 */
import { Op } from 'sequelize';
import { HttpError } from '../errors';
import { EmailVerification, Shop, User } from '../models';
import type { SignUpBody } from '../schemas';
import { appLink, newLinkToken, sha256Hex } from './link-tokens';
import type { Mailer } from './mailer';
import { assertStrongPassword } from './password-strength';
import { hashPassword } from './passwords';

export const VERIFY_LINK_TTL_MS = 48 * 60 * 60 * 1000;

const linkInvalid = () => new HttpError(400, 'VERIFY_LINK_INVALID', 'This link has expired or was already used. Sign in to have a new one sent.');

async function sendVerification(user: User, appUrl: string, mailer: Mailer, now: Date): Promise<void> {
  const { token, tokenHash } = newLinkToken();
  await EmailVerification.create({ userId: user.id, tokenHash, expiresAt: new Date(now.getTime() + VERIFY_LINK_TTL_MS), usedAt: null });
  await mailer.send({
    to: user.email,
    subject: 'Confirm your e-mail address for Ovalyard',
    text: [
      `Hello ${user.name},`,
      '',
      'Open this link within 48 hours to confirm your address and start using your shop on Ovalyard:',
      appLink(appUrl, `/verify?token=${token}`),
      '',
      'If you did not sign up, ignore this message: nothing happens without the link.',
    ].join('\n'),
  });
}

async function sendAlreadyRegistered(email: string, appUrl: string, mailer: Mailer): Promise<void> {
  await mailer.send({
    to: email,
    subject: 'You already have an Ovalyard account',
    text: [
      'Hello,',
      '',
      'Someone (we hope you) asked to make an Ovalyard account with this e-mail address, which has one already.',
      'Nothing was changed. To sign in, or to set a new password, go to:',
      appLink(appUrl, '/sign-in'),
      '',
      'An address can belong to one account only; to use Ovalyard with another shop, use another address.',
    ].join('\n'),
  });
}

/**
 * Makes the shop and its (unconfirmed) owner and mails the link; for an address that has an
 * account, mails that instead. The same work (a password hash, a mail) either way.
 * @throws 400 WEAK_PASSWORD
 */
export async function signUp(body: SignUpBody, appUrl: string, mailer: Mailer, now = new Date()): Promise<void> {
  assertStrongPassword(body.password, [body.email, body.name, body.shopName]);
  const passwordHash = await hashPassword(body.password);
  const taken = await User.findOne({ where: { email: body.email }, attributes: ['id'] });
  if (taken) {
    await sendAlreadyRegistered(body.email, appUrl, mailer);
    return;
  }
  let owner: User;
  try {
    owner = await User.sequelize!.transaction(async (transaction) => {
      const shop = await Shop.create({ name: body.shopName }, { transaction });
      return User.create({ shopId: shop.id, email: body.email, name: body.name, role: 'owner', passwordHash, emailVerifiedAt: null }, { transaction });
    });
  } catch (err) {
    // two sign-ups with one address at once: the second is told as any taken address is
    if ((err as { name?: string }).name === 'SequelizeUniqueConstraintError') {
      await sendAlreadyRegistered(body.email, appUrl, mailer);
      return;
    }
    throw err;
  }
  await sendVerification(owner, appUrl, mailer, now);
}

/** Sends a fresh link to an unconfirmed account with this address; silently nothing otherwise. */
export async function resendVerification(email: string, appUrl: string, mailer: Mailer, now = new Date()): Promise<void> {
  const user = await User.findOne({ where: { email, emailVerifiedAt: null, active: true } });
  if (!user) return;
  await sendVerification(user, appUrl, mailer, now);
}

/**
 * Confirms the address of a valid link and uses the link up (and every other open link of that user).
 * @throws 400 VERIFY_LINK_INVALID for an unknown, expired or used link
 */
export async function verifyEmail(token: string, now = new Date()): Promise<void> {
  const link = await EmailVerification.findOne({ where: { tokenHash: sha256Hex(token), usedAt: null, expiresAt: { [Op.gt]: now } } });
  if (!link) throw linkInvalid();
  await User.sequelize!.transaction(async (transaction) => {
    const [used] = await EmailVerification.update({ usedAt: now }, { where: { id: link.id, usedAt: null }, transaction });
    if (used !== 1) throw linkInvalid();
    await EmailVerification.update({ usedAt: now }, { where: { userId: link.userId, usedAt: null }, transaction });
    await User.update({ emailVerifiedAt: now }, { where: { id: link.userId, emailVerifiedAt: null }, transaction });
  });
}
