import type { Pool, PoolClient } from 'pg';
import type { Logger } from 'pino';

/**
 * node-postgres kills the process when an idle client errors (e.g. PostgreSQL restarts) and nobody listens.
 * Listen on the pool and on every client it hands out.
 */
export function guardPool(pool: Pool, logger: Logger, name: string): Pool {
  pool.on('error', (err) => logger.warn({ err: err.message, pool: name }, 'idle database client error'));
  pool.on('connect', (client: PoolClient) => {
    client.on('error', (err) => logger.warn({ err: err.message, pool: name }, 'database client error'));
  });
  return pool;
}

export const POOL_DEFAULTS = {
  connectionTimeoutMillis: 2_000,
  idleTimeoutMillis: 30_000,
  query_timeout: 15_000,
} as const;
