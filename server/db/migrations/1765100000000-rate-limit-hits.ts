import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Rate-limit counters shared by every instance: one fixed window per limiter and key (server/lib/rate-limit-store.ts). */
export class RateLimitHits1765100000000 implements MigrationInterface {
  name = 'RateLimitHits1765100000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE rate_limit_hit (
        key text PRIMARY KEY,
        hits integer NOT NULL,
        reset_at timestamptz NOT NULL
      )`);
    await q.query(`CREATE INDEX rate_limit_hit_reset_at_idx ON rate_limit_hit (reset_at)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE rate_limit_hit`);
  }
}
