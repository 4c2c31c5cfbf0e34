import { Router } from 'express';
import { actorOf } from '../middleware/authenticate';
import { fittingBodySchema, fittingListQuerySchema, fittingUpdateSchema, idParamsSchema } from '../schemas';
import { createFitting, getFitting, listFittings, updateFitting } from '../services/fittings';

export function fittingsRouter(): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    res.json(await listFittings(actorOf(res), fittingListQuerySchema.parse(req.query)));
  });

  router.post('/', async (req, res) => {
    res.status(201).json(await createFitting(actorOf(res), fittingBodySchema.parse(req.body)));
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
