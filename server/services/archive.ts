/**
 * Archiving hides a player or a fitting from lists (nothing else changes); deleting removes it
 * with everything that hangs from it, by the foreign keys: a player's fittings, bay files, shots,
 * builds, chosen builds, spec sheets, bag and its history, invitations, and their sign-in with its
 * sessions; a fitting's bay files, shots, builds, chosen builds and spec sheet (bag clubs that came
 * from it keep their specs and lose the link).
 */
import { Player, User } from '../models';
import { type Actor, requireStaff } from './actor';
import { bumpPlayerFittingRevisions } from './fitting-revision';
import { findVisibleFitting } from './fittings';
import { findVisiblePlayer } from './players';

export async function setPlayerArchived(actor: Actor, id: string, archived: boolean, now = new Date()): Promise<void> {
  requireStaff(actor);
  const player = await findVisiblePlayer(actor, id);
  await player.update({ archivedAt: archived ? now : null });
}

export async function deletePlayer(actor: Actor, id: string): Promise<void> {
  requireStaff(actor);
  const player = await findVisiblePlayer(actor, id);
  await Player.sequelize!.transaction(async (transaction) => {
    const userId = player.userId;
    await Player.destroy({ where: { id: player.id, shopId: actor.shopId }, transaction });
    // their own sign-in goes with them (only ever a player's, of this shop)
    if (userId) await User.destroy({ where: { id: userId, shopId: actor.shopId, role: 'player' }, transaction });
  });
}

export async function setFittingArchived(actor: Actor, id: string, archived: boolean, now = new Date()): Promise<void> {
  requireStaff(actor);
  const fitting = await findVisibleFitting(actor, id);
  await fitting.update({ archivedAt: archived ? now : null });
}

export async function deleteFitting(actor: Actor, id: string): Promise<void> {
  requireStaff(actor);
  const fitting = await findVisibleFitting(actor, id);
  await Player.sequelize!.transaction(async (transaction) => {
    await fitting.destroy({ transaction });
    // bag clubs that came from it lose their source, so the carries the ladder reads may change
    await bumpPlayerFittingRevisions(fitting.playerId, transaction);
  });
}
