import { Router } from 'express';
import { actorOf } from '../middleware/authenticate';
import type { Sequelize } from 'sequelize';
import { archiveBodySchema, idParamsSchema, playerBodySchema, playerListQuerySchema, playerUpdateSchema } from '../schemas';
import { deletePlayer, setPlayerArchived } from '../services/archive';
import { PLAYER_TABLES, writeExportZip } from '../services/data-export';
import { createPlayer, findVisiblePlayer, getPlayer, listPlayers, updatePlayer } from '../services/players';

export function playersRouter(sequelize: Sequelize): Router {
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

  router.put('/:id/archived', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const { archived } = archiveBodySchema.parse(req.body);
    await setPlayerArchived(actorOf(res), id, archived);
    res.json(await getPlayer(actorOf(res), id));
  });

  router.delete('/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    await deletePlayer(actorOf(res), id);
    res.status(204).end();
  });

  // Everything the shop holds about a player: for the player themselves, and for staff.
  router.get('/:id/export', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const player = await findVisiblePlayer(actorOf(res), id);
    res.attachment(`ovalyard-player-${new Date().toISOString().slice(0, 10)}.zip`);
    res.type('application/zip');
    await writeExportZip(sequelize, PLAYER_TABLES, player.id, res);
  });

  return router;
}
