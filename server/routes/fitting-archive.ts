import { Router } from 'express';
import { actorOf } from '../middleware/authenticate';
import { archiveBodySchema, idParamsSchema } from '../schemas';
import { deleteFitting, setFittingArchived } from '../services/archive';
import { getFitting } from '../services/fittings';

/** Archive (hide from lists) and delete a fitting: staff of its shop. */
export function fittingArchiveRouter(): Router {
  const router = Router();

  router.put('/fittings/:id/archived', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const { archived } = archiveBodySchema.parse(req.body);
    await setFittingArchived(actorOf(res), id, archived);
    res.json(await getFitting(actorOf(res), id));
  });

  router.delete('/fittings/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    await deleteFitting(actorOf(res), id);
    res.status(204).end();
  });

  return router;
}
