import { Router, type Request } from 'express';
import type { Config } from '../config';
import { actorOf } from '../middleware/authenticate';
import { fittingBodySchema, fittingListQuerySchema, fittingUpdateSchema, idParamsSchema } from '../schemas';
import { fittingLink, notify } from '../services/fitting-notices';
import { createFitting, getFitting, listFittings, updateFitting } from '../services/fittings';
import type { Mailer } from '../services/mailer';

export function fittingsRouter(config: Config, mailer: Mailer): Router {
  const router = Router();
  const appUrl = (req: Request) => config.appUrl ?? `${req.protocol}://${req.get('host')}`;

  router.get('/', async (req, res) => {
    res.json(await listFittings(actorOf(res), fittingListQuerySchema.parse(req.query)));
  });

  router.post('/', async (req, res) => {
    const fitting = await createFitting(actorOf(res), fittingBodySchema.parse(req.body));
    // a remote fitting opened by the staff concerns the player: tell them what to send (a notice never fails the request)
    if (fitting.remote) {
      await notify(mailer, fitting, 'player', 'Your fitter opened a remote fitting', ['Your fitter opened a remote fitting for you.', 'Answer the intake, add your clubs to your bag and send your launch-monitor files.'], fittingLink(appUrl(req), fitting.id));
    }
    res.status(201).json(fitting);
  });

  router.get('/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await getFitting(actorOf(res), id));
  });

  router.patch('/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await updateFitting(actorOf(res), id, fittingUpdateSchema.parse(req.body)));
  });

  return router;
}
