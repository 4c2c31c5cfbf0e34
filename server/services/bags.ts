/**
 * A player's bag: its clubs with their build specs, status, carry and history; the bag's ladder
 * and checks; optimistic concurrency on every save (a version per club).
 */
import { Op, QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { z } from 'zod';
import { bagAsOf, wedgeWearReminder, type WedgeWearLimits } from '../../analysis/bag';
import { compareClubs } from '../../analysis/clubs';
import { bagChecks } from '../../analysis/conformance';
import { bagLadder, type BagLadderClub } from '../../analysis/ladder';
import { staticFitStart } from '../../analysis/workshop';
import { HttpError, notFound } from '../errors';
import { BagClub as BagClubModel, BagClubHistory, Player } from '../models';
import { SPEC_ATTRIBUTE_KEYS, specOf } from '../models/spec-attributes';
import type { BagCarry, BagClub, BagHistoryItem, BagView, bagClubBodySchema, bagClubUpdateSchema, bagClubWearSchema } from '../schemas';
import { type Actor, isStaff, requireStaff } from './actor';
import { bagCarries } from './bag-carries';
import { bumpPlayerFittingRevisions } from './fitting-revision';
import { findVisiblePlayer } from './players';
import { shopWorkshopRules } from './workshop-settings';

/** A bag club's whole state, as the history keeps it. */
export type BagClubState = Omit<BagClub, 'carry' | 'wear' | 'updatedAt'>;

export function stateOf(row: BagClubModel): BagClubState {
  return {
    id: row.id,
    playerId: row.playerId,
    club: row.club,
    ...specOf(row),
    status: row.status,
    carryEnteredM: row.carryEnteredM ?? null,
    inBagSince: row.inBagSince ?? null,
    roundsSince: row.roundsSince ?? 0,
    practiceSessionsSince: row.practiceSessionsSince ?? 0,
    sourceBuildId: row.sourceBuildId ?? null,
    sourceFittingId: row.sourceFittingId ?? null,
    version: row.version,
  };
}

/**
 * Records a change: who, when, what (the club's state after it). Every bag write goes through
 * here, in its transaction, so it also marks the player's fittings as changed: their ladders take
 * the bag's clubs as neighbours.
 */
export async function recordChange(row: BagClubModel, actor: Actor, action: BagHistoryItem['action'], at: Date, transaction?: Transaction, fittingId: string | null = null): Promise<void> {
  await BagClubHistory.create(
    { bagClubId: row.id, shopId: row.shopId, playerId: row.playerId, action, changedAt: at, changedBy: actor.id, fittingId, snapshot: JSON.stringify(stateOf(row)) },
    { transaction },
  );
  await bumpPlayerFittingRevisions(row.playerId, transaction);
}

/** The conflict answer when a club changed since the editor read it. */
export const versionConflict = (club: string, current: number) =>
  new HttpError(409, 'VERSION_CONFLICT', `Someone else changed the ${club} since you opened it. Reload to see their change, then make yours again.`, [{ path: ['version'], message: 'Out of date', current }]);

/** A bag club the actor may see, or 404 (another shop's or another player's answers 404). */
export async function findVisibleBagClub(actor: Actor, id: string): Promise<BagClubModel> {
  const where = isStaff(actor) ? { id, shopId: actor.shopId } : { id, shopId: actor.shopId, playerId: actor.playerId ?? '00000000-0000-0000-0000-000000000000' };
  const row = await BagClubModel.findOne({ where });
  if (!row) throw notFound('That club');
  return row;
}

/** A bag (a list of club states) with carries, ladder, checks and wear reminders. */
export async function bagViewOf(
  sequelize: Sequelize,
  actor: Actor,
  player: Player,
  states: readonly BagClubState[],
  options: { on?: string | null; rules?: { wear: WedgeWearLimits; table: Parameters<typeof staticFitStart>[2] } } = {},
): Promise<BagView> {
  const rules = options.rules ?? (await shopWorkshopRules(player.shopId));
  const active = states.filter((c) => c.status !== 'out');
  const { carries, speed } = await bagCarries(sequelize, actor, player.id, active);
  const clubs: BagClub[] = [...states]
    .sort((a, b) => compareClubs(a.club, b.club) || (a.loftDeg ?? 0) - (b.loftDeg ?? 0) || a.id.localeCompare(b.id))
    .map((s) => ({
      ...s,
      carry: carries.get(s.id) ?? null,
      wear: s.status === 'out' ? null : wedgeWearReminder(s.club, s.roundsSince, s.practiceSessionsSince, rules.wear),
      updatedAt: '',
    }));
  const ladderClubs: BagLadderClub[] = active.map((c) => {
    const carry: BagCarry | null = carries.get(c.id) ?? null;
    return { id: c.id, club: c.club, loftDeg: c.loftDeg, carryM: carry?.carryM ?? null, carrySource: carry?.source ?? null, carryQ1M: carry?.q1M ?? null, carryQ3M: carry?.q3M ?? null };
  });
  const ladder = bagLadder(ladderClubs);
  return {
    playerId: player.id,
    playerName: player.name,
    on: options.on ?? null,
    clubs,
    ladder,
    checks: bagChecks(active.map((c) => ({ id: c.id, club: c.club, loftDeg: c.loftDeg, lengthIn: c.lengthIn })), ladder),
    speed,
    staticFit: staticFitStart(player.heightCm, player.wristToFloorCm, rules.table),
    wedgeWearLimits: rules.wear,
  };
}

/** The start of the day after an ISO date, as an ISO instant (UTC). */
const dayAfter = (isoDate: string) => new Date(Date.parse(`${isoDate}T00:00:00.000Z`) + 86_400_000).toISOString();

/** GET /api/players/:id/bag — today's bag, or (with `on`) the bag as recorded at the end of that date. */
export async function getBag(sequelize: Sequelize, actor: Actor, playerId: string, on?: string): Promise<BagView> {
  const player = await findVisiblePlayer(actor, playerId);
  if (on) {
    const rows = await BagClubHistory.findAll({ where: { playerId, changedAt: { [Op.lt]: new Date(dayAfter(on)) } }, order: [['id', 'ASC']] });
    const entries = rows.map((r) => ({ bagClubId: r.bagClubId, changedAt: r.changedAt.toISOString(), seq: Number(r.id), snapshot: JSON.parse(r.snapshot) as BagClubState }));
    return bagViewOf(sequelize, actor, player, bagAsOf(entries, dayAfter(on)), { on });
  }
  const rows = await BagClubModel.findAll({ where: { playerId, shopId: player.shopId } });
  const view = await bagViewOf(sequelize, actor, player, rows.map(stateOf));
  const updated = new Map(rows.map((r) => [r.id, r.updatedAt.toISOString()]));
  for (const c of view.clubs) c.updatedAt = updated.get(c.id) ?? '';
  return view;
}

type BagClubBody = z.output<typeof bagClubBodySchema>;
type BagClubUpdate = z.output<typeof bagClubUpdateSchema>;

const EDITABLE = [...SPEC_ATTRIBUTE_KEYS, 'club', 'status', 'carryEnteredM', 'inBagSince', 'roundsSince', 'practiceSessionsSince'] as const;

/** POST /api/players/:id/bag/clubs (staff, or the player for their own bag, as in a remote intake): a club goes in the bag. */
export async function addBagClub(actor: Actor, playerId: string, body: BagClubBody): Promise<BagClubState> {
  const player = await findVisiblePlayer(actor, playerId);
  const values: Record<string, unknown> = { shopId: player.shopId, playerId: player.id, version: 1 };
  for (const key of EDITABLE) values[key] = body[key] ?? null;
  values.roundsSince = body.roundsSince;
  values.practiceSessionsSince = body.practiceSessionsSince;
  values.status = body.status;
  const now = new Date();
  return BagClubModel.sequelize!.transaction(async (transaction) => {
    const row = await BagClubModel.create(values as BagClubModel['_creationAttributes'], { transaction });
    await recordChange(row, actor, 'add', now, transaction);
    return stateOf(row);
  });
}

/**
 * Saves changes to a club when `version` is still the club's (then raises it), else 409
 * VERSION_CONFLICT: two fitters editing one club never lose a change silently.
 */
async function saveVersioned(actor: Actor, row: BagClubModel, version: number, changes: Record<string, unknown>, action: BagHistoryItem['action']): Promise<BagClubState> {
  const now = new Date();
  return BagClubModel.sequelize!.transaction(async (transaction) => {
    const [count] = await BagClubModel.update({ ...changes, version: version + 1 }, { where: { id: row.id, version }, transaction });
    if (count !== 1) {
      const current = await BagClubModel.findByPk(row.id, { transaction });
      throw versionConflict(current?.club ?? row.club, current?.version ?? row.version);
    }
    const saved = (await BagClubModel.findByPk(row.id, { transaction }))!;
    await recordChange(saved, actor, action, now, transaction);
    return stateOf(saved);
  });
}

/** PATCH /api/bag-clubs/:id (staff, or the player for their own club): only the keys sent change. */
export async function updateBagClub(actor: Actor, id: string, body: BagClubUpdate): Promise<BagClubState> {
  const row = await findVisibleBagClub(actor, id);
  const changes: Record<string, unknown> = {};
  for (const key of EDITABLE) if (body[key] !== undefined) changes[key] = body[key];
  return saveVersioned(actor, row, body.version, changes, changes.status === 'out' && row.status !== 'out' ? 'out' : 'update');
}

/** PATCH /api/bag-clubs/:id/wear (the player or staff): a wedge's rounds and practice sessions since it went in. */
export async function updateBagClubWear(actor: Actor, id: string, body: z.output<typeof bagClubWearSchema>): Promise<BagClubState> {
  const row = await findVisibleBagClub(actor, id);
  const changes: Record<string, unknown> = {};
  if (body.roundsSince !== undefined) changes.roundsSince = body.roundsSince;
  if (body.practiceSessionsSince !== undefined) changes.practiceSessionsSince = body.practiceSessionsSince;
  return saveVersioned(actor, row, body.version, changes, 'wear');
}

/** GET /api/bag-clubs/:id/history: every recorded change, newest first. */
export async function bagClubHistory(sequelize: Sequelize, actor: Actor, id: string): Promise<BagHistoryItem[]> {
  const row = await findVisibleBagClub(actor, id);
  const items = await sequelize.query<{ id: number; action: BagHistoryItem['action']; changed_at: Date; changed_by: string | null; name: string | null; fitting_id: string | null; snapshot: string }>(
    `SELECT h.id, h.action, h.changed_at, h.changed_by, u.name, h.fitting_id, h.snapshot
       FROM bag_club_history h LEFT JOIN users u ON u.id = h.changed_by
      WHERE h.bag_club_id = ? ORDER BY h.id DESC LIMIT 500`,
    { replacements: [row.id], type: QueryTypes.SELECT },
  );
  return items.map((h) => ({
    id: Number(h.id),
    bagClubId: row.id,
    action: h.action,
    changedAt: new Date(h.changed_at).toISOString(),
    changedBy: h.changed_by,
    changedByName: h.name,
    fittingId: h.fitting_id,
    snapshot: JSON.parse(h.snapshot) as BagClubState,
  }));
}
