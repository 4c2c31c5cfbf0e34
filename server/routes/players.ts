import { Router } from 'express';
import { actorOf } from '../middleware/authenticate';
import { idParamsSchema, playerAccountBodySchema, playerBodySchema, playerListQuerySchema, playerUpdateSchema } from '../schemas';
import { createPlayer, getPlayer, listPlayers, updatePlayer } from '../services/players';
import { createPlayerAccount } from '../services/team';

export function playersRouter(): Router {
  const router = Router();

  router.get('/', async (req, res) => {
    res.json(await listPlayers(actorOf(res), playerListQuerySchema.parse(req.query)));
  });

  router.post('/', async (req, res) => {
    res.status(201).json(await createPlayer(actorOf(res), playerBodySchema.parse(req.body)));
  });

  router.get('/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await getPlayer(actorOf(res), id));
  });

  router.patch('/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await updatePlayer(actorOf(res), id, playerUpdateSchema.parse(req.body)));
  });

  router.post('/:id/account', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    await createPlayerAccount(actorOf(res), id, playerAccountBodySchema.parse(req.body));
    res.status(201).json(await getPlayer(actorOf(res), id));
  });

  return router;
}
