/**
 * The spec sheet of a fitting: the chosen builds with every spec, the figures behind each, the
 * bag's ladder after the change, the conformance notes and the workshop caution. A draft is
 * worked out from the fitting as it stands; sending freezes it (what the player reads and
 * accepts), renders the PDF and e-mails the player with a copy to the shop.
 */
import type { Sequelize } from 'sequelize';
import { clubInfo } from '../../analysis/clubs';
import { HttpError, notFound } from '../errors';
import { BagClub, Build, ChosenBuild, ChosenBuildConfirmation, ChosenTakeOut, Player, Shop, SpecSheetRecord, User } from '../models';
import { specOf } from '../models/spec-attributes';
import { WORKSHOP_CAUTION, type SpecSheet, type SpecSheetChoice } from '../schemas';
import { type Actor, isStaff, requireStaff } from './actor';
import { analyseFitting } from './analysis';
import { bagViewOf, stateOf, type BagClubState } from './bags';
import { noticeStep, reachStep } from './fitting-course';
import { findVisibleFitting } from './fittings';
import type { Mailer } from './mailer';
import { choiceFigures, rivalOf } from './spec-sheet-figures';
import { renderSpecSheetPdf, type Paper } from './spec-sheet-pdf';
import { specSheetMessage } from './spec-sheet-mail';

const clubLabel = (code: string) => clubInfo(code)?.label ?? code;
const buildName = (label: string) => (label === '' ? 'No build named' : label);

/** The sheet as the fitting stands now (not stored). */
async function workOutSheet(sequelize: Sequelize, actor: Actor, fittingId: string): Promise<SpecSheet> {
  const fitting = await findVisibleFitting(actor, fittingId);
  const [player, shop, chosen, takeOuts, confirmation, builds] = await Promise.all([
    Player.findByPk(fitting.playerId),
    Shop.findByPk(fitting.shopId),
    ChosenBuild.findAll({ where: { fittingId } }),
    ChosenTakeOut.findAll({ where: { fittingId } }),
    ChosenBuildConfirmation.findByPk(fittingId),
    Build.findAll({ where: { fittingId } }),
  ]);
  const buildById = new Map(builds.map((b) => [b.id, b]));
  const bagRows = await BagClub.findAll({ where: { playerId: fitting.playerId } });
  const bagById = new Map(bagRows.map((r) => [r.id, r]));

  // The bag after the change: as it is once confirmed; before, the current bag with the choice applied.
  let after: BagClubState[];
  const labels: Record<string, string> = {};
  if (confirmation) {
    after = bagRows.map(stateOf);
  } else {
    const gone = new Set([...chosen.map((c) => c.replacesBagClubId), ...takeOuts.map((t) => t.bagClubId)].filter((id): id is string => id !== null));
    after = bagRows.filter((r) => r.status !== 'out' && !gone.has(r.id)).map(stateOf);
    for (const c of chosen) {
      const b = buildById.get(c.buildId);
      if (!b) continue;
      const id = `new-${b.id}`;
      after.push({ id, playerId: fitting.playerId, club: b.club, ...specOf(b), status: 'on-order', carryEnteredM: null, inBagSince: null, roundsSince: 0, practiceSessionsSince: 0, sourceBuildId: b.id, sourceFittingId: fittingId, version: 1 });
    }
  }
  for (const s of after) {
    const source = s.sourceFittingId === fittingId && s.sourceBuildId ? buildById.get(s.sourceBuildId) : undefined;
    labels[s.id] = source ? `${clubLabel(s.club)} (${buildName(source.label)})` : clubLabel(s.club);
  }
  const bag = await bagViewOf(sequelize, actor, player!, after);

  const { analysis } = await analyseFitting(sequelize, actor, fittingId, { units: actor.units, level: 0.95, includeStrays: false });
  const choices: SpecSheetChoice[] = [];
  for (const c of [...chosen].sort((a, b) => (clubInfo(a.club)?.order ?? 999) - (clubInfo(b.club)?.order ?? 999))) {
    const b = buildById.get(c.buildId);
    if (!b) continue;
    const ref = { club: b.club, build: b.label === '' ? null : b.label };
    const rival = rivalOf(analysis, ref);
    const hasShots = analysis.groups.some((g) => g.club === ref.club && (g.build ?? null) === ref.build && g.kept >= 2);
    // The head-to-head needs the analysis with `compare` (one more analysis per chosen build with a rival).
    const headToHead = rival && hasShots ? ((await analyseFitting(sequelize, actor, fittingId, { units: actor.units, level: 0.95, includeStrays: false, compare: [ref, rival] })).analysis.headToHead ?? null) : null;
    const replaced = c.replacesBagClubId ? bagById.get(c.replacesBagClubId) : undefined;
    choices.push({
      club: b.club,
      clubLabel: clubLabel(b.club),
      buildLabel: buildName(b.label),
      spec: specOf(b),
      change: replaced ? { kind: 'replace', replacedClubLabel: clubLabel(replaced.club) } : { kind: 'add' },
      figures: choiceFigures(analysis, ref, rival, headToHead),
    });
  }

  const fitter = fitting.fitter?.name ?? null;
  return {
    id: null,
    fittingId,
    state: 'draft',
    shopName: shop?.name ?? '',
    playerId: fitting.playerId,
    playerName: player?.name ?? '',
    fitterName: fitter,
    fittingDate: fitting.date,
    venue: fitting.venue,
    choices,
    takenOut: takeOuts.map((t) => bagById.get(t.bagClubId)).filter((r): r is BagClub => Boolean(r)).map((r) => clubLabel(r.club)),
    ladder: bag.ladder,
    ladderLabels: labels,
    checks: bag.checks,
    caution: WORKSHOP_CAUTION,
    sentAt: null,
    acceptedAt: null,
    confirmed: confirmation !== null,
  };
}

function fromRecord(record: SpecSheetRecord): SpecSheet {
  const content = JSON.parse(record.content) as SpecSheet;
  return { ...content, id: record.id, state: record.state, sentAt: record.sentAt.toISOString(), acceptedAt: record.acceptedAt ? record.acceptedAt.toISOString() : null };
}

/** A stored sheet the actor may see (the shop's staff; the player once sent), or 404. */
async function findVisibleSheet(actor: Actor, id: string): Promise<SpecSheetRecord> {
  const where = isStaff(actor) ? { id, shopId: actor.shopId } : { id, shopId: actor.shopId, playerId: actor.playerId ?? '00000000-0000-0000-0000-000000000000' };
  const record = await SpecSheetRecord.findOne({ where });
  if (!record) throw notFound('That spec sheet');
  return record;
}

/** GET /api/fittings/:id/spec-sheet: the sent sheet, or (staff) the draft; a player sees no draft. */
export async function getFittingSpecSheet(sequelize: Sequelize, actor: Actor, fittingId: string): Promise<SpecSheet> {
  await findVisibleFitting(actor, fittingId);
  const record = await SpecSheetRecord.findOne({ where: { fittingId, shopId: actor.shopId } });
  if (record) return fromRecord(record);
  if (!isStaff(actor)) throw notFound('That spec sheet');
  return workOutSheet(sequelize, actor, fittingId);
}

/** GET /api/spec-sheets/:id */
export async function getSpecSheet(actor: Actor, id: string): Promise<SpecSheet> {
  return fromRecord(await findVisibleSheet(actor, id));
}

/** GET /api/spec-sheets/:id/pdf */
export async function specSheetPdf(actor: Actor, id: string, paper: Paper): Promise<{ pdf: Buffer; fileName: string }> {
  const sheet = fromRecord(await findVisibleSheet(actor, id));
  return { pdf: await renderSpecSheetPdf(sheet, { units: actor.units, paper }), fileName: specSheetFileName(sheet) };
}

export function specSheetFileName(sheet: SpecSheet): string {
  const name = sheet.playerName.replace(/[^A-Za-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60) || 'player';
  return `spec-sheet-${name}-${sheet.fittingDate}.pdf`;
}

/**
 * POST /api/fittings/:id/spec-sheet/send (staff): freezes the sheet as it stands, e-mails it to
 * the player (link and PDF) with a copy to the shop's owners and the sender, state 'sent'.
 * @throws 400 NOTHING_CHOSEN without a chosen build, 400 PLAYER_HAS_NO_EMAIL, 409 SPEC_SHEET_ACCEPTED
 */
export async function sendSpecSheet(sequelize: Sequelize, actor: Actor, fittingId: string, mailer: Mailer, appUrl: string): Promise<SpecSheet> {
  requireStaff(actor);
  const fitting = await findVisibleFitting(actor, fittingId);
  const existing = await SpecSheetRecord.findOne({ where: { fittingId } });
  if (existing?.state === 'accepted') throw new HttpError(409, 'SPEC_SHEET_ACCEPTED', 'The player has accepted this spec sheet; it can no longer change.');
  const player = (await Player.findByPk(fitting.playerId))!;
  if (!player.email) throw new HttpError(400, 'PLAYER_HAS_NO_EMAIL', `Add ${player.name}’s e-mail address to the profile first, so the sheet can reach them.`);
  const sheet = await workOutSheet(sequelize, actor, fittingId);
  if (sheet.choices.length === 0) throw new HttpError(400, 'NOTHING_CHOSEN', 'Choose at least one build first: the sheet writes up the chosen builds.');
  const now = new Date();
  const content = JSON.stringify({ ...sheet, state: 'sent', sentAt: now.toISOString() });
  let record: SpecSheetRecord;
  if (existing) {
    await existing.update({ content, sentAt: now, sentBy: actor.id, state: 'sent' });
    record = existing;
  } else {
    record = await SpecSheetRecord.create({ shopId: fitting.shopId, fittingId, playerId: fitting.playerId, state: 'sent', content, sentAt: now, sentBy: actor.id, acceptedAt: null, acceptedBy: null });
  }
  // The course: the recommendation is sent (the sheet's own e-mail tells the player).
  await reachStep(fitting, 'recommendation-sent', actor.id);
  const sent = fromRecord(record);
  const owners = await User.findAll({ where: { shopId: fitting.shopId, role: 'owner', active: true }, attributes: ['email'] });
  const sender = await User.findByPk(actor.id, { attributes: ['email', 'name', 'units'] });
  const cc = [...new Set([...owners.map((o) => o.email), ...(sender ? [sender.email] : [])])].filter((e) => e !== player.email);
  const playerUser = player.userId ? await User.findByPk(player.userId, { attributes: ['units'] }) : null;
  const units = playerUser?.units ?? sender?.units ?? 'imperial';
  const pdf = await renderSpecSheetPdf(sent, { units, paper: 'a4' });
  await mailer.send(specSheetMessage(sent, { to: player.email, cc, link: `${appUrl.replace(/\/$/, '')}/spec-sheets/${sent.id}`, pdf, fileName: specSheetFileName(sent), units }));
  return sent;
}

/** POST /api/spec-sheets/:id/accept: the player accepts their sheet (only the player; staff 403). */
export async function acceptSpecSheet(actor: Actor, id: string, notice?: { mailer: Mailer; appUrl: string }): Promise<SpecSheet> {
  if (actor.role !== 'player') throw new HttpError(403, 'FORBIDDEN', 'Only the player accepts their spec sheet.');
  const record = await findVisibleSheet(actor, id);
  if (record.state !== 'accepted') {
    const [changed] = await SpecSheetRecord.update({ state: 'accepted', acceptedAt: new Date(), acceptedBy: actor.id }, { where: { id: record.id, state: 'sent' } });
    await record.reload();
    // The course: accepted, and the fitter hears of it.
    const fitting = changed ? await findVisibleFitting(actor, record.fittingId) : null;
    if (fitting && (await reachStep(fitting, 'accepted', actor.id)) && notice) await noticeStep(notice.mailer, notice.appUrl, fitting, 'accepted', 'forward');
  }
  return fromRecord(record);
}
