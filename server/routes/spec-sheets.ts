import { Router, type Request } from 'express';
import type { Sequelize } from 'sequelize';
import { z } from 'zod';
import type { Config } from '../config';
import { actorOf } from '../middleware/authenticate';
import { idParamsSchema } from '../schemas';
import type { Mailer } from '../services/mailer';
import { acceptSpecSheet, getFittingSpecSheet, getSpecSheet, sendSpecSheet, specSheetPdf } from '../services/spec-sheets';

const pdfQuerySchema = z.object({ paper: z.enum(['a4', 'letter']).default('a4') });

/** Spec sheets: /fittings/:id/spec-sheet (draft or sent), /spec-sheets/:id (sent), its PDF, send and accept. */
export function specSheetsRouter(sequelize: Sequelize, config: Config, mailer: Mailer): Router {
  const router = Router();
  const appUrl = (req: Request) => config.appUrl ?? `${req.protocol}://${req.get('host')}`;
  router.get('/fittings/:id/spec-sheet', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await getFittingSpecSheet(sequelize, actorOf(res), id));
  });
  router.post('/fittings/:id/spec-sheet/send', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await sendSpecSheet(sequelize, actorOf(res), id, mailer, appUrl(req)));
  });
  router.get('/spec-sheets/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await getSpecSheet(actorOf(res), id));
  });
  router.get('/spec-sheets/:id/pdf', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const { paper } = pdfQuerySchema.parse(req.query);
    const { pdf, fileName } = await specSheetPdf(actorOf(res), id, paper);
    res.set('Content-Type', 'application/pdf');
    res.set('Content-Disposition', `inline; filename="${fileName}"`);
    res.send(pdf);
  });
  router.post('/spec-sheets/:id/accept', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await acceptSpecSheet(actorOf(res), id, { mailer, appUrl: appUrl(req) }));
  });
  return router;
}
