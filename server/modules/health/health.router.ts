import { Router } from 'express';
import type { Deps } from '@server/deps';
import { databaseIsUp } from './health.queries';

export function healthRouter({ dataSource }: Pick<Deps, 'dataSource'>): Router {
  const router = Router();
  const startedAt = Date.now();
  router.get('/health', async (_req, res) => {
    const up = await databaseIsUp(dataSource);
    res.status(up ? 200 : 503).json({
      status: up ? 'ok' : 'unavailable',
      database: up ? 'up' : 'down',
      uptimeSeconds: Math.round((Date.now() - startedAt) / 1000),
    });
  });
  return router;
}
