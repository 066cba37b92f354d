import type { ClientRateLimitInfo, IncrementResponse, Options, Store } from 'express-rate-limit';
import type { DataSource } from 'typeorm';

/**
 * An express-rate-limit store in PostgreSQL, so every instance behind a load balancer counts the same attempts
 * (in-memory counters let an attacker multiply the limit by the number of instances). A fixed window per key,
 * counted in one atomic upsert. Queries go through the app's guarded pool: during an outage the limiter fails
 * with the database error, which the error handler answers as 503 (fail closed).
 */
export class PostgresRateLimitStore implements Store {
  localKeys = false;
  private windowMs = 60_000;

  constructor(
    private readonly dataSource: DataSource,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  private key(key: string): string {
    return `${this.prefix}:${key}`;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const rows: { hits: number; resetAt: Date }[] = await this.dataSource.query(
      `SELECT hits, reset_at AS "resetAt" FROM rate_limit_hit WHERE key = $1 AND reset_at > now()`,
      [this.key(key)],
    );
    return rows[0] ? { totalHits: rows[0].hits, resetTime: new Date(rows[0].resetAt) } : undefined;
  }

  async increment(key: string): Promise<IncrementResponse> {
    const [row] = (await this.dataSource.query(
      `INSERT INTO rate_limit_hit AS r (key, hits, reset_at) VALUES ($1, 1, now() + make_interval(secs => $2 / 1000.0))
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN r.reset_at <= now() THEN 1 ELSE r.hits + 1 END,
         reset_at = CASE WHEN r.reset_at <= now() THEN EXCLUDED.reset_at ELSE r.reset_at END
       RETURNING hits, reset_at AS "resetAt"`,
      [this.key(key), this.windowMs],
    )) as [{ hits: number; resetAt: Date }];
    return { totalHits: row.hits, resetTime: new Date(row.resetAt) };
  }

  async decrement(key: string): Promise<void> {
    await this.dataSource.query(
      `UPDATE rate_limit_hit SET hits = greatest(hits - 1, 0) WHERE key = $1 AND reset_at > now()`,
      [this.key(key)],
    );
  }

  async resetKey(key: string): Promise<void> {
    await this.dataSource.query(`DELETE FROM rate_limit_hit WHERE key = $1`, [this.key(key)]);
  }
}

/** Windows that ended long ago: nothing reads them again. boot.ts calls it hourly. */
export async function pruneRateLimitHits(dataSource: DataSource): Promise<number> {
  const rows: unknown[] = await dataSource.query(
    `DELETE FROM rate_limit_hit WHERE reset_at < now() - interval '1 hour' RETURNING 1`,
  );
  return rows.length;
}
