import { Op, type WhereOptions } from 'sequelize';
import { notFound } from '../errors';
import { Fitting, Player as PlayerModel } from '../models';
import type { ArchivedFilter, Player, PlayerListQuery, PlayerSort, playerBodySchema, playerUpdateSchema } from '../schemas';
import type { z } from 'zod';
import { type Actor, isStaff, requireStaff } from './actor';

export function toPlayer(p: PlayerModel, fittingCount?: number): Player {
  return {
    id: p.id,
    shopId: p.shopId,
    name: p.name,
    email: p.email,
    handedness: p.handedness,
    heightCm: p.heightCm,
    wristToFloorCm: p.wristToFloorCm,
    handicap: p.handicap,
    usualMiss: p.usualMiss,
    goals: p.goals,
    hasAccount: p.userId != null,
    archived: p.archivedAt != null,
    ...(fittingCount === undefined ? {} : { fittingCount }),
    createdAt: p.createdAt.toISOString(),
    updatedAt: p.updatedAt.toISOString(),
  };
}

/** Where-clause of the players an actor may see: their shop's, or only their own. */
export function visiblePlayers(actor: Actor): WhereOptions<PlayerModel> {
  if (isStaff(actor)) return { shopId: actor.shopId };
  return { shopId: actor.shopId, id: actor.playerId ?? '00000000-0000-0000-0000-000000000000' };
}

/** Where-clause of a list's archived filter (players and fittings both have archived_at). */
export function archivedWhere(filter: ArchivedFilter): WhereOptions | null {
  if (filter === 'show') return null;
  return { archivedAt: filter === 'only' ? { [Op.ne]: null } : null };
}

const PLAYER_ORDER: Record<PlayerSort, [string, 'ASC' | 'DESC'][]> = {
  'name-asc': [['name', 'ASC']],
  'name-desc': [['name', 'DESC']],
  newest: [['createdAt', 'DESC'], ['name', 'ASC']],
  oldest: [['createdAt', 'ASC'], ['name', 'ASC']],
};

export async function listPlayers(actor: Actor, filters: PlayerListQuery): Promise<Player[]> {
  const like = filters.q ? `%${filters.q.replace(/[%_\\]/g, '\\$&')}%` : null;
  const where: WhereOptions<PlayerModel>[] = [visiblePlayers(actor)];
  if (like) where.push({ [Op.or]: [{ name: { [Op.like]: like } }, { email: { [Op.like]: like } }] });
  const archived = archivedWhere(filters.archived ?? 'hide');
  if (archived) where.push(archived as WhereOptions<PlayerModel>);
  const players = await PlayerModel.findAll({ where: { [Op.and]: where }, order: PLAYER_ORDER[filters.sort ?? 'name-asc'], limit: 500 });
  const counts = (await Fitting.count({
    where: { playerId: players.map((p) => p.id) },
    group: ['playerId'],
  })) as unknown as { playerId: string; count: number }[];
  const byPlayer = new Map(counts.map((c) => [c.playerId, Number(c.count)]));
  return players.map((p) => toPlayer(p, byPlayer.get(p.id) ?? 0));
}

/** A player the actor may see, or 404 (never 403: another shop's ids are not confirmed to exist). */
export async function findVisiblePlayer(actor: Actor, id: string): Promise<PlayerModel> {
  const player = await PlayerModel.findOne({ where: { [Op.and]: [visiblePlayers(actor), { id }] } });
  if (!player) throw notFound('That player');
  return player;
}

export async function getPlayer(actor: Actor, id: string): Promise<Player> {
  const player = await findVisiblePlayer(actor, id);
  return toPlayer(player, await Fitting.count({ where: { playerId: id } }));
}

export async function createPlayer(actor: Actor, body: z.output<typeof playerBodySchema>): Promise<Player> {
  requireStaff(actor);
  const player = await PlayerModel.create({
    shopId: actor.shopId,
    userId: null,
    name: body.name,
    email: body.email,
    handedness: body.handedness,
    heightCm: body.heightCm,
    wristToFloorCm: body.wristToFloorCm,
    handicap: body.handicap,
    usualMiss: body.usualMiss,
    goals: body.goals,
  });
  return toPlayer(player, 0);
}

export async function updatePlayer(actor: Actor, id: string, body: z.output<typeof playerUpdateSchema>): Promise<Player> {
  requireStaff(actor);
  const player = await findVisiblePlayer(actor, id);
  const { name, email, handedness, heightCm, wristToFloorCm, handicap, usualMiss, goals } = body;
  const changes = { name, email, handedness, heightCm, wristToFloorCm, handicap, usualMiss, goals };
  for (const [key, value] of Object.entries(changes)) {
    if (value !== undefined) player.set(key as keyof typeof changes, value as never);
  }
  await player.save();
  return getPlayer(actor, id);
}
