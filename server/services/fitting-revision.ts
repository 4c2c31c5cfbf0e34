/**
 * A fitting's revision (fittings.revision, migration 0008): one number, raised in the same
 * transaction as every change to what the fitting's analysis is computed from, so a reader sees
 * either the old data with the old number or the new data with the new one. Every change of
 * that kind calls bumpFittingRevision: a bay file stored, re-mapped or deleted, a stray
 * decision, a build edited, the fitting's conditions edited; the shop's margins (every fitting of
 * the shop) and the player's bag (every fitting of the player: the ladder's neighbours).
 */
import { QueryTypes, type Transaction } from 'sequelize';
import { Fitting } from '../models';

/** Raises a fitting's revision; pass the transaction of the change it marks. One UPDATE. */
export async function bumpFittingRevision(fittingId: string, transaction?: Transaction): Promise<void> {
  await Fitting.sequelize!.query('UPDATE fittings SET revision = revision + 1 WHERE id = ?', {
    replacements: [fittingId],
    type: QueryTypes.UPDATE,
    transaction,
  });
}

/** Raises the revision of every fitting of a shop (a shop setting the analysis reads changed). One UPDATE. */
export async function bumpShopFittingRevisions(shopId: string, transaction?: Transaction): Promise<void> {
  await Fitting.sequelize!.query('UPDATE fittings SET revision = revision + 1 WHERE shop_id = ?', {
    replacements: [shopId],
    type: QueryTypes.UPDATE,
    transaction,
  });
}

/** Raises the revision of every fitting of a player (their bag, whose clubs the ladder reads, changed). One UPDATE. */
export async function bumpPlayerFittingRevisions(playerId: string, transaction?: Transaction): Promise<void> {
  await Fitting.sequelize!.query('UPDATE fittings SET revision = revision + 1 WHERE player_id = ?', {
    replacements: [playerId],
    type: QueryTypes.UPDATE,
    transaction,
  });
}
