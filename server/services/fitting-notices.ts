/**
 * E-mail to the other side of a fitting: the player (their profile's address, else their
 * sign-in's) or the staff (the fitting's fitter, else the shop's owners). A notice that cannot
 * be sent is logged and never undoes the change it tells of.
 */
import { Player, Shop, User, type Fitting } from '../models';
import type { Mailer } from './mailer';

export type Side = 'player' | 'staff';

/** Addresses of one side of a fitting. */
export async function addressesOf(fitting: Pick<Fitting, 'playerId' | 'fitterId' | 'shopId'>, side: Side): Promise<string[]> {
  if (side === 'player') {
    const player = await Player.findByPk(fitting.playerId, { attributes: ['email', 'userId'] });
    if (player?.email) return [player.email];
    const user = player?.userId ? await User.findByPk(player.userId, { attributes: ['email'] }) : null;
    return user ? [user.email] : [];
  }
  const fitter = fitting.fitterId ? await User.findOne({ where: { id: fitting.fitterId, active: true }, attributes: ['email'] }) : null;
  if (fitter) return [fitter.email];
  const owners = await User.findAll({ where: { shopId: fitting.shopId, role: 'owner', active: true }, attributes: ['email'] });
  return owners.map((o) => o.email);
}

/** Sends one notice to a side of a fitting; failures are logged, not thrown. */
export async function notify(mailer: Mailer, fitting: Pick<Fitting, 'playerId' | 'fitterId' | 'shopId'>, side: Side, subject: string, lines: string[], link: string): Promise<void> {
  try {
    const [to, ...cc] = await addressesOf(fitting, side);
    if (!to) return;
    const shop = await Shop.findByPk(fitting.shopId, { attributes: ['name'] });
    await mailer.send({ to, cc: cc.length ? cc : undefined, subject: `${subject} · ${shop?.name ?? 'Ovalyard'}`, text: [...lines, '', `Open the fitting: ${link}`].join('\n') });
  } catch (err) {
    console.error('A fitting notice could not be sent:', err);
  }
}

export const fittingLink = (appUrl: string, fittingId: string) => `${appUrl.replace(/\/$/, '')}/fittings/${fittingId}`;
