import { QueryTypes, type Sequelize } from 'sequelize';
import { notFound } from '../errors';
import { type Actor, requireStaff } from './actor';
import { findVisibleFitting } from './fittings';
import { renameNotFound } from './not-found';
import { loadFittingShots, type StoredShot } from './shot-store';

export async function listShots(sequelize: Sequelize, actor: Actor, fittingId: string): Promise<StoredShot[]> {
  await findVisibleFitting(actor, fittingId);
  return loadFittingShots(sequelize, fittingId);
}

/** A fitter keeps or drops a shot (null: back to the automatic stray rules). */
export async function setShotDecision(sequelize: Sequelize, actor: Actor, shotId: number, decision: 'keep' | 'drop' | null) {
  requireStaff(actor);
  const rows = await sequelize.query<{ fitting_id: string }>('SELECT fitting_id FROM shots WHERE id = ?', {
    replacements: [shotId],
    type: QueryTypes.SELECT,
  });
  if (!rows[0]) throw notFound('That shot');
  await renameNotFound(findVisibleFitting(actor, rows[0].fitting_id), 'That shot');
  await sequelize.query('UPDATE shots SET decision = ? WHERE id = ?', { replacements: [decision, shotId], type: QueryTypes.UPDATE });
  return { id: shotId, decision };
}
