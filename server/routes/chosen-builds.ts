import { Router } from 'express';
import { actorOf } from '../middleware/authenticate';
import { chosenBuildsBodySchema, confirmChosenBuildsSchema, idParamsSchema } from '../schemas';
import { confirmChosenBuilds, getChosenBuilds, setChosenBuilds } from '../services/chosen-builds';

/** A fitting's chosen builds and the bag changes they propose: /fittings/:id/chosen-builds. */
export function chosenBuildsRouter(): Router {
  const router = Router();
  router.get('/fittings/:id/chosen-builds', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await getChosenBuilds(actorOf(res), id));
  });
  router.put('/fittings/:id/chosen-builds', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await setChosenBuilds(actorOf(res), id, chosenBuildsBodySchema.parse(req.body)));
  });
  router.post('/fittings/:id/chosen-builds/confirm', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await confirmChosenBuilds(actorOf(res), id, confirmChosenBuildsSchema.parse(req.body)));
  });
  return router;
}
