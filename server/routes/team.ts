import { Router } from 'express';
import { actorOf } from '../middleware/authenticate';
import { idParamsSchema, teamMemberUpdateSchema } from '../schemas';
import { listTeam, updateFitter } from '../services/team';

export function teamRouter(): Router {
  const router = Router();

  router.get('/', async (_req, res) => {
    res.json(await listTeam(actorOf(res)));
  });

  router.patch('/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await updateFitter(actorOf(res), id, teamMemberUpdateSchema.parse(req.body)));
  });

  return router;
}
