import { Router } from 'express';
import { QueryTypes, type Sequelize } from 'sequelize';

/** GET /api/health: the server and its database. 503 when the database does not answer. */
export function healthRouter(sequelize: Sequelize): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    const started = Date.now();
    try {
      // Raw queries need a type with mariadb 3.5 + sequelize 6 (see DEVELOPERS.md).
      await sequelize.query('SELECT 1 AS ok', { type: QueryTypes.SELECT });
      res.json({ status: 'ok', database: { status: 'ok', latencyMs: Date.now() - started } });
    } catch {
      res.status(503).json({ status: 'degraded', database: { status: 'unreachable' } });
    }
  });
  return router;
}
