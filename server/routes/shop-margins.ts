import { Router } from 'express';
import { actorOf } from '../middleware/authenticate';
import { shopMarginsBodySchema } from '../schemas';
import { getShopMargins, setShopMargins } from '../services/shop-margins';

/** /api/shop/margins: the signed-in user's own shop (staff read, the owner writes). */
export function shopMarginsRouter(): Router {
  const router = Router();
  router.get('/margins', async (_req, res) => {
    res.json(await getShopMargins(actorOf(res)));
  });
  router.put('/margins', async (req, res) => {
    res.json(await setShopMargins(actorOf(res), shopMarginsBodySchema.parse(req.body)));
  });
  return router;
}
