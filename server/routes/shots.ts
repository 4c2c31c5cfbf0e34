import { Router, type Response } from 'express';
import { z } from 'zod';
import type { Sequelize } from 'sequelize';
import { actorOf } from '../middleware/authenticate';
import { sendPreparedJson } from '../middleware/send-prepared-json';
import { analysisQuerySchema, buildSpecBodySchema, idParamsSchema, shotDecisionBodySchema, shotPageQuerySchema } from '../schemas';
import { analyseFitting } from '../services/analysis';
import { type AnalysisCache, cachedFittingAnalysis } from '../services/analysis-cache';
import { getBuild, listBuilds, updateBuild } from '../services/bay-files';
import { exportGroupsCsv, exportShotsCsv, listShotPage, setShotDecision } from '../services/shots';

/** Sends CSV text as a download. */
function sendCsv(res: Response, fileName: string, text: string): void {
  res.set('Content-Type', 'text/csv; charset=utf-8');
  res.set('Content-Disposition', `attachment; filename="${fileName}"`);
  res.send(text);
}

export function shotsRouter(sequelize: Sequelize, analysisCache: AnalysisCache): Router {
  const router = Router();
  router.get('/fittings/:id/shots', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await listShotPage(sequelize, actorOf(res), id, shotPageQuerySchema.parse(req.query)));
  });
  router.get('/fittings/:id/shots.csv', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    sendCsv(res, `shots-${id.slice(0, 8)}.csv`, await exportShotsCsv(sequelize, actorOf(res), id));
  });
  router.get('/fittings/:id/groups.csv', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    sendCsv(res, `groups-${id.slice(0, 8)}.csv`, await exportGroupsCsv(sequelize, actorOf(res), id));
  });
  router.get('/fittings/:id/analysis', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    const q = analysisQuerySchema.parse(req.query);
    const hasTo = q.toTemperatureC !== undefined || q.toAltitudeM !== undefined || q.toHumidityPct !== undefined || q.toFirmness !== undefined;
    const to = hasTo ? { temperatureC: q.toTemperatureC, altitudeM: q.toAltitudeM, humidityPct: q.toHumidityPct, firmness: q.toFirmness } : undefined;
    const actor = actorOf(res);
    // Computed once per fitting revision and query; the access check runs first every time.
    const answer = await cachedFittingAnalysis(analysisCache, actor, id, q, () =>
      analyseFitting(sequelize, actor, id, {
        units: actor.units,
        level: q.level,
        includeStrays: q.all,
        compare: q.a && q.b ? [q.a, q.b] : undefined,
        to,
        fairwayWidthM: q.fairwayWidthM,
        greenRadiusM: q.greenRadiusM,
        target: q.targetClub !== undefined && q.targetCarryM !== undefined ? { club: q.targetClub, carryM: q.targetCarryM } : undefined,
      }),
    );
    await sendPreparedJson(req, res, answer);
  });
  router.patch('/shots/:shotId', async (req, res) => {
    const { shotId } = z.object({ shotId: z.coerce.number().int().positive() }).parse(req.params);
    const { decision } = shotDecisionBodySchema.parse(req.body);
    res.json(await setShotDecision(sequelize, actorOf(res), shotId, decision));
  });
  router.get('/fittings/:id/builds', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await listBuilds(actorOf(res), id));
  });
  router.get('/builds/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await getBuild(actorOf(res), id));
  });
  router.patch('/builds/:id', async (req, res) => {
    const { id } = idParamsSchema.parse(req.params);
    res.json(await updateBuild(actorOf(res), id, buildSpecBodySchema.parse(req.body)));
  });
  return router;
}
