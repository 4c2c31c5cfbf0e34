/**
 * From a fitting to the bag: the fitter marks a chosen build per club (and clubs to take out),
 * Ovalyard proposes the bag changes, the fitter confirms them and the bag changes in one
 * transaction, each change recorded with who, when and the fitting.
 */
import { Op } from 'sequelize';
import type { z } from 'zod';
import { ProposalError, proposeBagChanges, type BagChange, type ProposalChoice } from '../../analysis/bag';
import { HttpError } from '../errors';
import { BagClub, Build, ChosenBuild, ChosenBuildConfirmation, ChosenTakeOut } from '../models';
import { specOf } from '../models/spec-attributes';
import type { ChosenBuildsView, chosenBuildsBodySchema, confirmChosenBuildsSchema } from '../schemas';
import { type Actor, requireStaff } from './actor';
import { recordChange, versionConflict } from './bags';
import { findVisibleFitting } from './fittings';

const bad = (message: string, path: string) => new HttpError(400, 'VALIDATION_FAILED', message, [{ path: [path], message }]);

/** The fitting's choice, the proposal it makes and whether it was confirmed. */
export async function getChosenBuilds(actor: Actor, fittingId: string): Promise<ChosenBuildsView> {
  const fitting = await findVisibleFitting(actor, fittingId);
  const [chosen, takeOut, confirmation] = await Promise.all([
    ChosenBuild.findAll({ where: { fittingId } }),
    ChosenTakeOut.findAll({ where: { fittingId } }),
    ChosenBuildConfirmation.findByPk(fittingId),
  ]);
  const builds = chosen.length ? await Build.findAll({ where: { id: { [Op.in]: chosen.map((c) => c.buildId) } } }) : [];
  const labels = new Map(builds.map((b) => [b.id, b.label]));
  const view: ChosenBuildsView = {
    fittingId,
    playerId: fitting.playerId,
    builds: chosen.map((c) => ({ buildId: c.buildId, club: c.club, label: labels.get(c.buildId) ?? '', replacesBagClubId: c.replacesBagClubId })),
    takeOut: takeOut.map((t) => t.bagClubId),
    proposal: [],
    confirmedAt: confirmation ? confirmation.confirmedAt.toISOString() : null,
    problem: null,
  };
  if (!confirmation) {
    try {
      view.proposal = await proposalOf(fitting.playerId, view);
    } catch (err) {
      if (!(err instanceof ProposalError)) throw err;
      view.problem = err.message;
    }
  }
  return view;
}

async function proposalOf(playerId: string, view: { builds: readonly ProposalChoice[]; takeOut: readonly string[] }): Promise<BagChange[]> {
  const bag = await BagClub.findAll({ where: { playerId, status: { [Op.ne]: 'out' } }, attributes: ['id', 'club', 'version', 'status'] });
  return proposeBagChanges(
    bag.map((b) => ({ id: b.id, club: b.club, version: b.version, status: b.status })),
    view.builds,
    view.takeOut,
  );
}

/** PUT /api/fittings/:id/chosen-builds (staff): replaces the fitting's choice. */
export async function setChosenBuilds(actor: Actor, fittingId: string, body: z.output<typeof chosenBuildsBodySchema>): Promise<ChosenBuildsView> {
  requireStaff(actor);
  const fitting = await findVisibleFitting(actor, fittingId);
  if (await ChosenBuildConfirmation.findByPk(fittingId)) {
    throw new HttpError(409, 'CHOICE_CONFIRMED', 'These builds are already in the bag. Change the bag itself, or choose in a new fitting.');
  }
  const buildIds = body.builds.map((b) => b.buildId);
  const builds = buildIds.length ? await Build.findAll({ where: { id: { [Op.in]: buildIds }, fittingId } }) : [];
  if (builds.length !== new Set(buildIds).size) throw bad('Choose builds of this fitting.', 'builds');
  const named = [...body.builds.map((b) => b.replacesBagClubId).filter((id): id is string => typeof id === 'string'), ...body.takeOut];
  if (named.length) {
    const found = await BagClub.count({ where: { id: { [Op.in]: [...new Set(named)] }, playerId: fitting.playerId, status: { [Op.ne]: 'out' } } });
    if (found !== new Set(named).size) throw bad('A club to replace or take out is not in this player’s bag.', body.takeOut.length ? 'takeOut' : 'builds');
  }
  const byId = new Map(builds.map((b) => [b.id, b]));
  const choices = body.builds.map((b) => ({ buildId: b.buildId, club: byId.get(b.buildId)!.club, label: byId.get(b.buildId)!.label, replacesBagClubId: b.replacesBagClubId }));
  let proposal: BagChange[];
  try {
    proposal = await proposalOf(fitting.playerId, { builds: choices, takeOut: body.takeOut });
  } catch (err) {
    if (err instanceof ProposalError) throw bad(err.message, err.field);
    throw err;
  }
  // Store the proposal's matches, so the choice says exactly which club each build replaces.
  const replaces = new Map(proposal.filter((c) => c.kind === 'replace').map((c) => [c.buildId, c.bagClubId]));
  await ChosenBuild.sequelize!.transaction(async (transaction) => {
    await ChosenBuild.destroy({ where: { fittingId }, transaction });
    await ChosenTakeOut.destroy({ where: { fittingId }, transaction });
    if (choices.length) {
      await ChosenBuild.bulkCreate(choices.map((c) => ({ fittingId, buildId: c.buildId, club: c.club, replacesBagClubId: replaces.get(c.buildId) ?? null })), { transaction });
    }
    if (body.takeOut.length) await ChosenTakeOut.bulkCreate(body.takeOut.map((bagClubId) => ({ fittingId, bagClubId })), { transaction });
  });
  return getChosenBuilds(actor, fittingId);
}

/**
 * POST /api/fittings/:id/chosen-builds/confirm (staff): applies the proposal to the bag when every
 * club it changes is still at the version the fitter saw (else 409 VERSION_CONFLICT).
 */
export async function confirmChosenBuilds(actor: Actor, fittingId: string, body: z.output<typeof confirmChosenBuildsSchema>): Promise<ChosenBuildsView> {
  requireStaff(actor);
  const fitting = await findVisibleFitting(actor, fittingId);
  const view = await getChosenBuilds(actor, fittingId);
  if (view.confirmedAt) throw new HttpError(409, 'CHOICE_CONFIRMED', 'These builds are already in the bag.');
  if (view.problem) throw new HttpError(409, 'PROPOSAL_STALE', `${view.problem} Choose again.`);
  if (view.proposal.length === 0) throw bad('Choose at least one build or a club to take out first.', 'builds');
  for (const change of view.proposal) {
    if (change.kind === 'add') continue;
    const seen = body.versions[change.bagClubId];
    if (seen !== change.version) throw versionConflict(change.kind === 'replace' ? change.replacedClub : change.club, change.version);
  }
  const builds = new Map((await Build.findAll({ where: { fittingId } })).map((b) => [b.id, b]));
  const now = new Date();
  const today = now.toISOString().slice(0, 10);
  await BagClub.sequelize!.transaction(async (transaction) => {
    for (const change of view.proposal) {
      if (change.kind !== 'add') {
        const [count] = await BagClub.update({ status: 'out', version: change.version + 1 }, { where: { id: change.bagClubId, version: change.version }, transaction });
        if (count !== 1) throw versionConflict(change.club, change.version);
        const out = (await BagClub.findByPk(change.bagClubId, { transaction }))!;
        await recordChange(out, actor, change.kind === 'replace' ? 'replace' : 'out', now, transaction, fittingId);
      }
      if (change.kind === 'take-out') continue;
      const build = builds.get(change.buildId)!;
      const added = await BagClub.create(
        {
          shopId: fitting.shopId,
          playerId: fitting.playerId,
          club: change.club,
          ...specOf(build),
          status: body.newStatus,
          inBagSince: today,
          sourceBuildId: build.id,
          sourceFittingId: fittingId,
          version: 1,
        },
        { transaction },
      );
      await recordChange(added, actor, 'add', now, transaction, fittingId);
    }
    await ChosenBuildConfirmation.create({ fittingId, confirmedBy: actor.id, confirmedAt: now }, { transaction });
  });
  return getChosenBuilds(actor, fittingId);
}
