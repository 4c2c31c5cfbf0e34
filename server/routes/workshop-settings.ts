import { Router } from 'express';
import { actorOf } from '../middleware/authenticate';
import { workshopSettingsBodySchema } from '../schemas';
import { getWorkshopSettings, updateWorkshopSettings } from '../services/workshop-settings';

/** The shop's workshop settings (staff read, owner changes): /workshop-settings. */
export function workshopSettingsRouter(): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    res.json(await getWorkshopSettings(actorOf(res)));
  });
  router.put('/', async (req, res) => {
    res.json(await updateWorkshopSettings(actorOf(res), workshopSettingsBodySchema.parse(req.body)));
  });
  return router;
}
