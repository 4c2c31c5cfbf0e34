/**
 * The player's intake of a remote fitting: body measures, handedness, handicap, miss, ball
 * flight now and wanted, wishes. Sending it copies the measures onto the player's profile and
 * moves the course to "intake done". Only the player sends it; the staff read it.
 */
import type { z } from 'zod';
import { forbidden, HttpError } from '../errors';
import { FittingIntake, Player } from '../models';
import type { Intake, IntakeAnswer, intakeBodySchema } from '../schemas';
import type { Actor } from './actor';
import { noticeStep, reachStep } from './fitting-course';
import { findVisibleFitting } from './fittings';
import type { Mailer } from './mailer';

function toIntake(r: FittingIntake): Intake {
  return {
    fittingId: r.fittingId,
    handedness: r.handedness,
    heightCm: r.heightCm,
    wristToFloorCm: r.wristToFloorCm,
    handicap: r.handicap,
    usualMiss: r.usualMiss,
    ballFlightNow: r.ballFlightNow,
    ballFlightWanted: r.ballFlightWanted,
    wishes: r.wishes,
    submittedAt: r.submittedAt.toISOString(),
  };
}

/** GET /api/fittings/:id/intake */
export async function getIntake(actor: Actor, fittingId: string): Promise<IntakeAnswer> {
  await findVisibleFitting(actor, fittingId);
  const row = await FittingIntake.findByPk(fittingId);
  return { intake: row ? toIntake(row) : null };
}

/**
 * PUT /api/fittings/:id/intake (the player): stores the answers, copies the measures to the profile.
 * @throws 403 for staff, 404 for another's fitting, 409 NOT_REMOTE for a fitting in the bay
 */
export async function putIntake(actor: Actor, fittingId: string, body: z.output<typeof intakeBodySchema>, mailer: Mailer, appUrl: string): Promise<Intake> {
  if (actor.role !== 'player') throw forbidden('The player answers the intake.');
  const fitting = await findVisibleFitting(actor, fittingId);
  if (!fitting.remote) throw new HttpError(409, 'NOT_REMOTE', 'This fitting happens in the bay: there is no intake to answer.');
  const values = {
    handedness: body.handedness,
    heightCm: body.heightCm,
    wristToFloorCm: body.wristToFloorCm,
    handicap: body.handicap,
    usualMiss: body.usualMiss,
    ballFlightNow: body.ballFlightNow,
    ballFlightWanted: body.ballFlightWanted,
    wishes: body.wishes,
  };
  let moved = false;
  await FittingIntake.sequelize!.transaction(async (transaction) => {
    await FittingIntake.upsert({ fittingId, shopId: fitting.shopId, playerId: fitting.playerId, ...values, submittedAt: new Date(), submittedBy: actor.id }, { transaction });
    await Player.update(
      { handedness: body.handedness, heightCm: body.heightCm, wristToFloorCm: body.wristToFloorCm, handicap: body.handicap, usualMiss: body.usualMiss },
      { where: { id: fitting.playerId, shopId: fitting.shopId }, transaction },
    );
    moved = await reachStep(fitting, 'intake-done', actor.id, transaction);
  });
  if (moved) await noticeStep(mailer, appUrl, fitting, 'intake-done', 'forward');
  return toIntake((await FittingIntake.findByPk(fittingId))!);
}
