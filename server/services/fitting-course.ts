/**
 * A fitting's course: requested → intake done → in progress → recommendation sent → accepted →
 * built → delivered. Each change is a dated row; the fitting holds the step it stands at. Staff
 * move it on one step (from "requested" they may skip the intake) or back to an earlier step
 * with a reason; the intake, the sent sheet and the player's acceptance move it themselves.
 */
import type { Transaction } from 'sequelize';
import { HttpError } from '../errors';
import { Fitting, FittingCourseStep, User } from '../models';
import { COURSE_STEP_WORDS, COURSE_STEPS, type Course, type CourseStep, type courseMoveSchema } from '../schemas';
import type { z } from 'zod';
import { type Actor, requireStaff } from './actor';
import { findVisibleFitting } from './fittings';
import type { Mailer } from './mailer';
import { fittingLink, notify, type Side } from './fitting-notices';

const indexOf = (step: CourseStep) => COURSE_STEPS.indexOf(step);
const stepOf = (fitting: Fitting): CourseStep => fitting.courseStep as CourseStep;

/** Steps only something else reaches: the player's intake, sending the sheet, the player's acceptance. */
const MOVED_ELSEWHERE: Partial<Record<CourseStep, string>> = {
  'intake-done': 'The intake is done when the player sends it.',
  'recommendation-sent': 'Send the spec sheet: that marks the recommendation sent.',
  accepted: 'The player accepts the spec sheet; that marks it accepted.',
};

/** Who each step concerns (the side that gets the e-mail), and what it says. */
const NOTICES: Partial<Record<CourseStep, { side: Side; subject: string; line: (player: string) => string }>> = {
  requested: { side: 'staff', subject: 'A remote fitting was requested', line: (p) => `${p} asked for a remote fitting.` },
  'intake-done': { side: 'staff', subject: 'The intake is in', line: (p) => `${p} sent their intake.` },
  'in-progress': { side: 'player', subject: 'Your fitting is under way', line: () => 'Your fitter is working on your fitting.' },
  accepted: { side: 'staff', subject: 'The spec sheet was accepted', line: (p) => `${p} accepted the spec sheet.` },
  built: { side: 'player', subject: 'Your clubs are built', line: () => 'The workshop has built your clubs.' },
  delivered: { side: 'player', subject: 'Your clubs are delivered', line: () => 'Your clubs are marked delivered. Enjoy them.' },
};

export interface CourseChange {
  fitting: Fitting;
  step: CourseStep;
  direction: 'forward' | 'back';
  reason?: string | null;
  byUserId: string | null;
  transaction?: Transaction;
}

/** Records a step and moves the fitting to it (in the caller's transaction, if any). */
export async function recordStep({ fitting, step, direction, reason = null, byUserId, transaction }: CourseChange): Promise<void> {
  await FittingCourseStep.create({ fittingId: fitting.id, shopId: fitting.shopId, step, direction, reason, at: new Date(), byUserId }, { transaction });
  await Fitting.update({ courseStep: step }, { where: { id: fitting.id }, transaction });
  fitting.courseStep = step;
}

/** E-mails the side a step concerns (after the change is stored). */
export async function noticeStep(mailer: Mailer, appUrl: string, fitting: Fitting, step: CourseStep, direction: 'forward' | 'back', reason: string | null = null): Promise<void> {
  const playerName = fitting.player?.name ?? 'The player';
  if (direction === 'back') {
    await notify(mailer, fitting, 'player', `Your fitting is back at “${COURSE_STEP_WORDS[step]}”`, [`Your fitting went back to “${COURSE_STEP_WORDS[step]}”.`, `Why: ${reason ?? ''}`], fittingLink(appUrl, fitting.id));
    return;
  }
  const notice = NOTICES[step];
  if (notice) await notify(mailer, fitting, notice.side, notice.subject, [notice.line(playerName)], fittingLink(appUrl, fitting.id));
}

/** GET /api/fittings/:id/course: the step and every dated change, oldest first. */
export async function getCourse(actor: Actor, fittingId: string): Promise<Course> {
  const fitting = await findVisibleFitting(actor, fittingId);
  const rows = await FittingCourseStep.findAll({ where: { fittingId }, order: [['id', 'ASC']], limit: 500 });
  const ids = [...new Set(rows.map((r) => r.byUserId).filter((id): id is string => id !== null))];
  const users = ids.length ? await User.findAll({ where: { id: ids }, attributes: ['id', 'name'] }) : [];
  const names = new Map(users.map((u) => [u.id, u.name]));
  return {
    step: stepOf(fitting),
    entries: rows.map((r) => ({ id: r.id, step: r.step, direction: r.direction, reason: r.reason, at: r.at.toISOString(), byName: r.byUserId ? (names.get(r.byUserId) ?? null) : null })),
  };
}

/**
 * POST /api/fittings/:id/course (staff): the next step, or an earlier one with a reason.
 * @throws 400 REASON_NEEDED going back without a reason, 409 COURSE_STEP when the step is not the next one or is reached elsewhere
 */
export async function moveCourse(actor: Actor, fittingId: string, body: z.output<typeof courseMoveSchema>, mailer: Mailer, appUrl: string): Promise<Course> {
  requireStaff(actor);
  const fitting = await findVisibleFitting(actor, fittingId);
  const from = indexOf(stepOf(fitting));
  const to = indexOf(body.to);
  let direction: 'forward' | 'back';
  if (to < from) {
    if (!body.reason) throw new HttpError(400, 'REASON_NEEDED', 'Say why the fitting goes back a step.', [{ path: ['reason'], message: 'Give a reason.' }]);
    direction = 'back';
  } else {
    const skipsIntake = fitting.courseStep === 'requested' && body.to === 'in-progress';
    if (to !== from + 1 && !skipsIntake) throw new HttpError(409, 'COURSE_STEP', `The fitting is at “${COURSE_STEP_WORDS[stepOf(fitting)]}”; it moves on one step at a time.`);
    const elsewhere = MOVED_ELSEWHERE[body.to];
    if (elsewhere) throw new HttpError(409, 'COURSE_STEP', elsewhere);
    direction = 'forward';
  }
  await Fitting.sequelize!.transaction(async (transaction) => {
    // The fitting's row first, as every change of a fitting takes it (no two moves at once).
    const locked = await Fitting.findByPk(fittingId, { transaction, lock: transaction.LOCK.UPDATE, attributes: ['id', 'courseStep'] });
    if (!locked || locked.courseStep !== fitting.courseStep) throw new HttpError(409, 'COURSE_STEP', 'The fitting moved on meanwhile: reload the page.');
    await recordStep({ fitting, step: body.to, direction, reason: direction === 'back' ? body.reason : null, byUserId: actor.id, transaction });
  });
  await noticeStep(mailer, appUrl, fitting, body.to, direction, body.reason);
  return getCourse(actor, fittingId);
}

/**
 * Moves a fitting on to `step` when it stands before it (the intake, a sent sheet, an accepted
 * one); a fitting already past it stays. Returns whether it moved.
 */
export async function reachStep(fitting: Fitting, step: CourseStep, byUserId: string | null, transaction?: Transaction): Promise<boolean> {
  if (indexOf(stepOf(fitting)) >= indexOf(step)) return false;
  await recordStep({ fitting, step, direction: 'forward', byUserId, transaction });
  return true;
}
