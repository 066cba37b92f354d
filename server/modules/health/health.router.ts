import { Router } from 'express';
import type { Deps } from '@server/deps';
import { errors } from '@server/lib/app-error';
import { databaseIsUp } from './health.queries';

export function healthRouter({ dataSource }: Pick<Deps, 'dataSource'>): Router {
  const router = Router();
  const startedAt = Date.now();
  router.get('/health', async (_req, res) => {
    const up = await databaseIsUp(dataSource);
    const uptimeSeconds = Math.round((Date.now() - startedAt) / 1000);
    if (up) return void res.json({ status: 'ok', database: 'up', uptimeSeconds });
    // The same error shape as every other 503, so a client shows one message for "the service is down".
    const { code, message } = errors.unavailable();
    res
      .status(503)
      .json({ status: 'unavailable', database: 'down', uptimeSeconds, error: { code, message } });
  });
  return router;
}
