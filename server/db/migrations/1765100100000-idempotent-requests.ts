import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Answers to requests sent with an Idempotency-Key, so a retried save is answered from here instead of stored twice. */
export class IdempotentRequests1765100100000 implements MigrationInterface {
  name = 'IdempotentRequests1765100100000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE idempotent_request (
        user_id uuid NOT NULL REFERENCES app_user (id) ON DELETE CASCADE,
        key text NOT NULL,
        fingerprint text NOT NULL,
        status integer,
        body jsonb,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT idempotent_request_pkey PRIMARY KEY (user_id, key)
      )`);
    await q.query(`CREATE INDEX idempotent_request_created_at_idx ON idempotent_request (created_at)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE idempotent_request`);
  }
}
