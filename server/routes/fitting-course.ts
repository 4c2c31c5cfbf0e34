import { Router, type Request } from 'express';
import type { Sequelize } from 'sequelize';
import type { Config } from '../config';
import { actorOf } from '../middleware/authenticate';
import type { FittingLimits } from '../middleware/fitting-rate-limits';
import { consumeOrRefuse } from '../middleware/rate-limit';
import { courseMoveSchema, idParamsSchema, intakeBodySchema, messageBodySchema } from '../schemas';
import { getCourse, moveCourse } from '../services/fitting-course';
import { getIntake, putIntake } from '../services/fitting-intake';
import { listMessages, postMessage, readMessages } from '../services/fitting-messages';
import { findVisibleFitting } from '../services/fittings';
import type { Mailer } from '../services/mailer';
import { plainWords } from '../services/plain-words';

/** A fitting's course, intake, messages and plain words: /fittings/:id/course, /intake, /messages, /plain-words. */
export function fittingCourseRouter(sequelize: Sequelize, config: Config, mailer: Mailer, limits: FittingLimits): Router {
  const router = Router();
  const appUrl = (req: Request) => config.appUrl ?? `${req.protocol}://${req.get('host')}`;

  router.get('/:id/plain-words', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await plainWords(sequelize, actorOf(res), id));
  });

  router.get('/:id/course', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await getCourse(actorOf(res), id));
  });
  router.post('/:id/course', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await moveCourse(actorOf(res), id, courseMoveSchema.parse(req.body), mailer, appUrl(req)));
  });

  router.get('/:id/intake', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await getIntake(actorOf(res), id));
  });
  router.put('/:id/intake', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await putIntake(actorOf(res), id, intakeBodySchema.parse(req.body), mailer, appUrl(req)));
  });

  router.get('/:id/messages', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await listMessages(actorOf(res), id));
  });
  router.post('/:id/messages', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const actor = actorOf(res);
    const { body } = messageBodySchema.parse(req.body);
    await findVisibleFitting(actor, id); // 404 before a point is spent
    await consumeOrRefuse(limits.messages, actor.id, 'messages in a short time', res);
    res.status(201).json(await postMessage(actor, id, body, mailer, appUrl(req)));
  });
  router.post('/:id/messages/read', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await readMessages(actorOf(res), id));
  });
  return router;
}
