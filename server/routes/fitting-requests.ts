import { Router, type Request } from 'express';
import type { Config } from '../config';
import { actorOf, authenticate } from '../middleware/authenticate';
import type { FittingLimits } from '../middleware/fitting-rate-limits';
import { consumeOrRefuse } from '../middleware/rate-limit';
import { fittingRequestBodySchema, slugParamsSchema } from '../schemas';
import { requestFitting, requestPage, shopRequestLink } from '../services/fitting-requests';
import type { Mailer } from '../services/mailer';

/** The shop's public request page: GET /requests/:slug (anyone), POST (a signed-in player); /shop/request-link (staff). */
export function fittingRequestsRouter(config: Config, mailer: Mailer, limits: FittingLimits): Router {
  const router = Router();
  const appUrl = (req: Request) => config.appUrl ?? `${req.protocol}://${req.get('host')}`;

  router.get('/requests/:slug', async (req, res) => {
    const { slug } = slugParamsSchema.parse(req.params);
    res.json(await requestPage(slug));
  });
  router.post('/requests/:slug', authenticate(config), async (req, res) => {
    const { slug } = slugParamsSchema.parse(req.params);
    const { note } = fittingRequestBodySchema.parse(req.body ?? {});
    const actor = actorOf(res);
    await consumeOrRefuse(limits.requests, actor.id, 'fitting requests today', res);
    const today = new Date().toISOString().slice(0, 10);
    res.status(201).json(await requestFitting(actor, slug, note, today, mailer, appUrl(req)));
  });
  router.get('/shop/request-link', authenticate(config), async (_req, res) => {
    res.json(await shopRequestLink(actorOf(res)));
  });
  return router;
}
