import { Op, type Order, type WhereOptions } from 'sequelize';
import type { z } from 'zod';
import { HttpError, notFound } from '../errors';
import { Fitting as FittingModel, Player, User } from '../models';
import type { Fitting, FittingListQuery, fittingBodySchema, fittingUpdateSchema } from '../schemas';
import { type Actor, isStaff, requireStaff } from './actor';
import { bumpFittingRevision } from './fitting-revision';
import { notFoundAs } from './not-found';
import { archivedWhere, findVisiblePlayer } from './players';
import { countShotsByFitting } from './shot-store';
import { recordStep } from './fitting-course';
import { unreadCounts } from './fitting-messages';

const countShots = (ids: string[]) => countShotsByFitting(FittingModel.sequelize!, ids);

const include = [
  { model: Player, as: 'player', attributes: ['id', 'name', 'handedness'] },
  { model: User, as: 'fitter', attributes: ['id', 'name'] },
];

export function toFitting(f: FittingModel, shotCount = 0, unreadMessages = 0): Fitting {
  return {
    id: f.id,
    shopId: f.shopId,
    playerId: f.playerId,
    playerName: f.player?.name ?? '',
    fitterId: f.fitterId,
    fitterName: f.fitter?.name ?? null,
    date: f.date,
    venue: f.venue,
    temperatureC: f.temperatureC,
    altitudeM: f.altitudeM,
    humidityPct: f.humidityPct,
    groundFirmness: f.groundFirmness ?? null,
    ball: f.ball,
    notes: f.notes,
    remote: f.remote,
    archived: f.archivedAt != null,
    shotCount,
    courseStep: f.courseStep,
    unreadMessages,
    createdAt: f.createdAt.toISOString(),
    updatedAt: f.updatedAt.toISOString(),
  };
}

/** Where-clause of the fittings an actor may see: their shop's, or only their own. */
export function visibleFittings(actor: Actor): WhereOptions<FittingModel> {
  if (isStaff(actor)) return { shopId: actor.shopId };
  return { shopId: actor.shopId, playerId: actor.playerId ?? '00000000-0000-0000-0000-000000000000' };
}

/** A LIKE pattern that finds `text` anywhere, its own wildcards taken literally (as players.ts does). */
const containsPattern = (text: string): string => `%${text.replace(/[%_\\]/g, '\\$&')}%`;

const ORDER: Record<FittingListQuery['sort'], Order> = {
  'date-desc': [['date', 'DESC'], ['createdAt', 'DESC']],
  'date-asc': [['date', 'ASC'], ['createdAt', 'ASC']],
  'player-asc': [[{ model: Player, as: 'player' }, 'name', 'ASC'], ['date', 'DESC']],
  'player-desc': [[{ model: Player, as: 'player' }, 'name', 'DESC'], ['date', 'DESC']],
};

/** The fittings an actor may see, filtered (player, name search, date range) and ordered; at most 500. */
export async function listFittings(actor: Actor, filters: FittingListQuery): Promise<Fitting[]> {
  const where: WhereOptions<FittingModel>[] = [visibleFittings(actor)];
  if (filters.playerId) where.push({ playerId: filters.playerId });
  if (filters.from || filters.to) {
    const range: Record<symbol, string> = {};
    if (filters.from) range[Op.gte] = filters.from;
    if (filters.to) range[Op.lte] = filters.to;
    where.push({ date: range });
  }
  if (filters.step) where.push({ courseStep: filters.step });
  const archived = archivedWhere(filters.archived ?? 'hide');
  if (archived) where.push(archived as WhereOptions<FittingModel>);
  if (filters.q) where.push({ '$player.name$': { [Op.like]: containsPattern(filters.q) } } as WhereOptions<FittingModel>);
  const fittings = await FittingModel.findAll({ where: { [Op.and]: where }, include, order: ORDER[filters.sort], limit: 500 });
  const ids = fittings.map((f) => f.id);
  const [shots, unread] = await Promise.all([countShots(ids), unreadCounts(actor, ids)]);
  return fittings.map((f) => toFitting(f, shots.get(f.id) ?? 0, unread.get(f.id) ?? 0));
}

/** A fitting the actor may see, or 404. */
export async function findVisibleFitting(actor: Actor, id: string): Promise<FittingModel> {
  const fitting = await FittingModel.findOne({ where: { [Op.and]: [visibleFittings(actor), { id }] }, include });
  if (!fitting) throw notFound('That fitting');
  return fitting;
}

export async function getFitting(actor: Actor, id: string): Promise<Fitting> {
  const fitting = await findVisibleFitting(actor, id);
  const [shots, unread] = await Promise.all([countShots([id]), unreadCounts(actor, [id])]);
  return toFitting(fitting, shots.get(id) ?? 0, unread.get(id) ?? 0);
}

async function checkFitter(actor: Actor, fitterId: string): Promise<void> {
  const fitter = await User.findOne({ where: { id: fitterId, shopId: actor.shopId, role: ['owner', 'fitter'], active: true } });
  if (!fitter) throw new HttpError(400, 'VALIDATION_FAILED', 'The fitter must be an active member of your shop.', [{ path: ['fitterId'], message: 'Unknown fitter' }]);
}

export async function createFitting(actor: Actor, body: z.output<typeof fittingBodySchema>): Promise<Fitting> {
  requireStaff(actor);
  await notFoundAs(findVisiblePlayer(actor, body.playerId), () => new HttpError(400, 'VALIDATION_FAILED', 'Choose a player of your shop.', [{ path: ['playerId'], message: 'Unknown player' }]));
  const fitterId = body.fitterId ?? actor.id;
  await checkFitter(actor, fitterId);
  const step = body.remote ? 'requested' : 'in-progress';
  const fitting = await FittingModel.sequelize!.transaction(async (transaction) => {
    const f = await FittingModel.create(
      {
        shopId: actor.shopId,
        playerId: body.playerId,
        fitterId,
        date: body.date,
        venue: body.venue,
        temperatureC: body.temperatureC,
        altitudeM: body.altitudeM,
        humidityPct: body.humidityPct,
        groundFirmness: body.groundFirmness,
        ball: body.ball,
        notes: body.notes,
        remote: body.remote,
        courseStep: step,
      },
      { transaction },
    );
    await recordStep({ fitting: f, step, direction: 'forward', byUserId: actor.id, transaction });
    return f;
  });
  return getFitting(actor, fitting.id);
}

export async function updateFitting(actor: Actor, id: string, body: z.output<typeof fittingUpdateSchema>): Promise<Fitting> {
  requireStaff(actor);
  const fitting = await findVisibleFitting(actor, id);
  if (body.fitterId) await checkFitter(actor, body.fitterId);
  const { fitterId, date, venue, temperatureC, altitudeM, humidityPct, groundFirmness, ball, notes, remote } = body;
  const changes = { fitterId, date, venue, temperatureC, altitudeM, humidityPct, groundFirmness, ball, notes, remote };
  for (const [key, value] of Object.entries(changes)) {
    if (value !== undefined) fitting.set(key as keyof typeof changes, value as never);
  }
  await FittingModel.sequelize!.transaction(async (transaction) => {
    await fitting.save({ transaction });
    await bumpFittingRevision(id, transaction);
  });
  return getFitting(actor, id);
}
