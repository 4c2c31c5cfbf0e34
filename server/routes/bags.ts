import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import { actorOf } from '../middleware/authenticate';
import { bagClubBodySchema, bagClubUpdateSchema, bagClubWearSchema, bagQuerySchema, idParamsSchema } from '../schemas';
import { addBagClub, bagClubHistory, getBag, updateBagClub, updateBagClubWear } from '../services/bags';

/** The player's bag: /players/:id/bag and /bag-clubs/:id. */
export function bagsRouter(sequelize: Sequelize): Router {
  const router = Router();
  router.get('/players/:id/bag', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const { on } = bagQuerySchema.parse(req.query);
    res.json(await getBag(sequelize, actorOf(res), id, on));
  });
  router.post('/players/:id/bag/clubs', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.status(201).json(await addBagClub(actorOf(res), id, bagClubBodySchema.parse(req.body)));
  });
  router.patch('/bag-clubs/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await updateBagClub(actorOf(res), id, bagClubUpdateSchema.parse(req.body)));
  });
  router.patch('/bag-clubs/:id/wear', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await updateBagClubWear(actorOf(res), id, bagClubWearSchema.parse(req.body)));
  });
  router.get('/bag-clubs/:id/history', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await bagClubHistory(sequelize, actorOf(res), id));
  });
  return router;
}
