import { Router } from 'express';
import type { DataSource } from 'typeorm';
import type { Deps } from '@server/deps';
import { errors } from '../../lib/app-error';

const PING_TIMEOUT_MS = 2_000;

async function databaseIsUp(dataSource: DataSource): Promise<boolean> {
  if (!dataSource.isInitialized) return false;
  let timer: NodeJS.Timeout | undefined;
  try {
    const timeout = new Promise<never>((_, reject) => {
      timer = setTimeout(() => reject(new Error('ping timeout')), PING_TIMEOUT_MS);
    });
    await Promise.race([dataSource.query('SELECT 1'), timeout]);
    return true;
  } catch {
    return false;
  } finally {
    clearTimeout(timer);
  }
}

export function healthRouter({ dataSource }: Pick<Deps, 'dataSource'>): Router {
  const router = Router();
  const startedAt = Date.now();
  router.get('/health', async (_req, res) => {
    const up = await databaseIsUp(dataSource);
    const uptimeSeconds = Math.round((Date.now() - startedAt) / 1000);
    if (up) return void res.json({ status: 'ok', database: 'up', uptimeSeconds });
    // The same error shape as every other 503, so a client shows one message for "the service is down".
    const { code, message } = errors.unavailable();
    res.status(503).json({ status: 'unavailable', database: 'down', uptimeSeconds, error: { code, message } });
  });
  return router;
}
