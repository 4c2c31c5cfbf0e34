import { Router, type NextFunction, type Request, type Response } from 'express';
import type { Sequelize } from 'sequelize';
import { HttpError } from '../errors';
import { actorOf } from '../middleware/authenticate';
import { closeShopBodySchema, shopUpdateSchema } from '../schemas';
import { requireOwner } from '../services/actor';
import { SHOP_TABLES, writeExportZip } from '../services/data-export';
import { closeShop, getShop, reopenShop, updateShop } from '../services/shops';

/** What the owner of a closed shop may still reach: the shop, reopening it, its export. */
const OPEN_WHILE_CLOSED = new Set(['GET /api/shop', 'POST /api/shop/reopen', 'GET /api/shop/export']);

/** After authenticate: the owner of a closed shop gets 403 SHOP_CLOSED for everything else. */
export function refuseClosedShop(req: Request, res: Response, next: NextFunction): void {
  if (actorOf(res).shopClosed) {
    const raw = req.originalUrl.split('?')[0];
    let end = raw.length; // trailing slashes off, by a loop (a pattern like /\/+$/ is quadratic on a run of slashes)
    while (end > 1 && raw.charCodeAt(end - 1) === 47) end -= 1;
    const path = raw.slice(0, end);
    if (!OPEN_WHILE_CLOSED.has(`${req.method} ${path}`)) {
      throw new HttpError(403, 'SHOP_CLOSED', 'The shop is closed: reopen it to use it again.');
    }
  }
  next();
}

/** The shop itself: read by staff; units, closing, reopening and the export by the owner. */
export function shopRouter(sequelize: Sequelize): Router {
  const router = Router();

  router.get('/', async (_req, res) => {
    res.json(await getShop(actorOf(res)));
  });

  router.patch('/', async (req, res) => {
    res.json(await updateShop(actorOf(res), shopUpdateSchema.parse(req.body)));
  });

  router.post('/close', async (req, res) => {
    const actor = actorOf(res);
    requireOwner(actor);
    res.json(await closeShop(actor, closeShopBodySchema.parse(req.body).shopName));
  });

  router.post('/reopen', async (_req, res) => {
    res.json(await reopenShop(actorOf(res)));
  });

  // Everything of the shop as JSON and CSV per table, streamed.
  router.get('/export', async (_req, res) => {
    const actor = actorOf(res);
    requireOwner(actor);
    const day = new Date().toISOString().slice(0, 10);
    res.attachment(`ovalyard-shop-${day}.zip`);
    res.type('application/zip');
    await writeExportZip(sequelize, SHOP_TABLES, actor.shopId, res);
  });

  return router;
}
