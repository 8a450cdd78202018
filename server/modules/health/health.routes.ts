import { Router } from 'express';
import type { Database } from '../../db/client';
import { checkHealth } from './health.service';

/** GET /api/health → {"status":"ok","db":"ok"}, or 503 with "db":"down". */
export function healthRoutes(db: Database): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    const health = await checkHealth(db);
    res.status(health.db === 'ok' ? 200 : 503).json(health);
  });
  return router;
}
