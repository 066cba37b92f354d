import { Router } from 'express';
import type { DataSource } from 'typeorm';
import type { Deps } from '@server/deps';

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
    res.status(up ? 200 : 503).json({
      status: up ? 'ok' : 'unavailable',
      database: up ? 'up' : 'down',
      uptimeSeconds: Math.round((Date.now() - startedAt) / 1000),
    });
  });
  return router;
}
