/**
 * Messages on a fitting between the player and the shop's staff: plain text, kept with the
 * fitting, one read marker per person, an e-mail to the other side for each new message.
 */
import { Op, QueryTypes } from 'sequelize';
import { FittingMessageRecord, User } from '../models';
import type { FittingMessage, MessageList } from '../schemas';
import { type Actor, isStaff } from './actor';
import { findVisibleFitting } from './fittings';
import type { Mailer } from './mailer';
import { fittingLink, notify } from './fitting-notices';

/** The newest messages shown (older ones stay stored). */
const SHOWN = 500;

function toMessage(r: FittingMessageRecord, actor: Actor): FittingMessage {
  return { id: r.id, authorName: r.authorName, fromPlayer: r.fromPlayer, mine: r.authorId === actor.id, body: r.body, at: r.at.toISOString() };
}

/** Unread messages per fitting for one person: written by the other side, after their marker. O(one query). */
export async function unreadCounts(actor: Actor, fittingIds: string[]): Promise<Map<string, number>> {
  const out = new Map<string, number>();
  if (fittingIds.length === 0) return out;
  const rows = await FittingMessageRecord.sequelize!.query<{ fitting_id: string; n: number | bigint }>(
    `SELECT m.fitting_id, COUNT(*) AS n FROM fitting_messages m
       LEFT JOIN fitting_message_reads r ON r.fitting_id = m.fitting_id AND r.user_id = ?
      WHERE m.fitting_id IN (?) AND m.from_player = ? AND m.id > COALESCE(r.last_read_id, 0)
      GROUP BY m.fitting_id`,
    { replacements: [actor.id, fittingIds, isStaff(actor)], type: QueryTypes.SELECT },
  );
  for (const r of rows) out.set(r.fitting_id, Number(r.n));
  return out;
}

/** GET /api/fittings/:id/messages: the newest messages, oldest first, and how many are unread. */
export async function listMessages(actor: Actor, fittingId: string): Promise<MessageList> {
  await findVisibleFitting(actor, fittingId);
  const rows = await FittingMessageRecord.findAll({ where: { fittingId }, order: [['id', 'DESC']], limit: SHOWN });
  const unread = (await unreadCounts(actor, [fittingId])).get(fittingId) ?? 0;
  return { messages: rows.reverse().map((r) => toMessage(r, actor)), unread };
}

/** POST /api/fittings/:id/messages: stores a message and e-mails the other side. */
export async function postMessage(actor: Actor, fittingId: string, body: string, mailer: Mailer, appUrl: string): Promise<FittingMessage> {
  const fitting = await findVisibleFitting(actor, fittingId);
  const author = await User.findByPk(actor.id, { attributes: ['name'] });
  const fromPlayer = !isStaff(actor);
  const row = await FittingMessageRecord.create({ fittingId, shopId: fitting.shopId, authorId: actor.id, authorName: author?.name ?? '', fromPlayer, body, at: new Date() });
  // One's own message is read by oneself.
  await markRead(actor, fittingId, row.id);
  const excerpt = body.length > 400 ? `${body.slice(0, 400)}…` : body;
  await notify(mailer, fitting, fromPlayer ? 'staff' : 'player', `A message from ${author?.name ?? 'your fitting'}`, [`${author?.name ?? 'Someone'} wrote on the fitting of ${fitting.date}:`, '', excerpt], fittingLink(appUrl, fittingId));
  return toMessage(row, actor);
}

async function markRead(actor: Actor, fittingId: string, lastId: number): Promise<void> {
  await FittingMessageRecord.sequelize!.query(
    `INSERT INTO fitting_message_reads (fitting_id, user_id, last_read_id) VALUES (?, ?, ?)
       ON DUPLICATE KEY UPDATE last_read_id = GREATEST(last_read_id, VALUES(last_read_id))`,
    { replacements: [fittingId, actor.id, lastId], type: QueryTypes.INSERT },
  );
}

/** POST /api/fittings/:id/messages/read: everything shown so far is read. */
export async function readMessages(actor: Actor, fittingId: string): Promise<{ unread: number }> {
  await findVisibleFitting(actor, fittingId);
  const last = await FittingMessageRecord.max<number, FittingMessageRecord>('id', { where: { fittingId, id: { [Op.gt]: 0 } } });
  if (last) await markRead(actor, fittingId, Number(last));
  return { unread: 0 };
}
