import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import type { Config } from '../config';
import { actorOf } from '../middleware/authenticate';
import { jsonField, singleFileUpload } from '../middleware/upload';
import { idParamsSchema, importOptionsSchema, remapBodySchema } from '../schemas';
import { commitBayFile, deleteBayFile, getBayFile, getBayFileText, listBayFiles, previewBayFile, remapBayFile, type CommitHooks } from '../services/bay-files';
import type { ImportPool } from '../services/import-pool';

/** /api/fittings/:id/bay-files… and /api/bay-files/:id… */
export function bayFilesRouter(sequelize: Sequelize, config: Config, pool: ImportPool, hooks: CommitHooks = {}): Router {
  const router = Router();
  const upload = singleFileUpload(config);
  const limits = { maxRows: config.upload.maxRows };
  const fileOf = (req: Express.Request) => ({ name: req.file!.originalname, buffer: req.file!.buffer });

  router.get('/fittings/:id/bay-files', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await listBayFiles(actorOf(res), id));
  });

  router.post('/fittings/:id/bay-files/preview', upload, async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const options = importOptionsSchema.parse(jsonField(req, 'options'));
    res.json(await previewBayFile(pool, actorOf(res), id, fileOf(req), options, limits));
  });

  router.post('/fittings/:id/bay-files', upload, async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const options = importOptionsSchema.parse(jsonField(req, 'options'));
    res.status(201).json(await commitBayFile(sequelize, pool, actorOf(res), id, fileOf(req), options, limits, hooks));
  });

  router.get('/bay-files/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await getBayFile(actorOf(res), id));
  });

  router.get('/bay-files/:id/raw', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const { fileName, text } = await getBayFileText(pool, actorOf(res), id);
    // a download, never shown in the page; nosniff keeps a browser from reading it as anything else
    res.set('X-Content-Type-Options', 'nosniff').type('text/csv; charset=utf-8').attachment(fileName).send(text);
  });

  router.put('/bay-files/:id/recipe', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const body = remapBodySchema.parse(req.body);
    res.json(await remapBayFile(sequelize, pool, actorOf(res), id, body.recipe, body.builds, limits));
  });

  router.delete('/bay-files/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    await deleteBayFile(actorOf(res), id);
    res.status(204).end();
  });

  return router;
}
