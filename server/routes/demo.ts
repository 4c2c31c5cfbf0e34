import { Router } from 'express';
import type { DemoStatus } from '../schemas';
import { isDemoLoaded } from '../services/demo';

/**
 * GET /api/demo: `{ demo: true }` when the invented demo is loaded, so the sign-in screen may show
 * its sign-ins. Public, and says nothing else.
 */
export function demoRouter(): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    const body: DemoStatus = { demo: await isDemoLoaded() };
    res.json(body);
  });
  return router;
}
