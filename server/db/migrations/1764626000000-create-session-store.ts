import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The table connect-pg-simple expects (its table.sql), owned by our migrations. */
export class CreateSessionStore1764626000000 implements MigrationInterface {
  name = 'CreateSessionStore1764626000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE "session" (
        "sid" varchar NOT NULL COLLATE "default" PRIMARY KEY,
        "sess" json NOT NULL,
        "expire" timestamp(6) NOT NULL
      )`);
    await q.query(`CREATE INDEX "idx_session_expire" ON "session" ("expire")`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE "session"`);
  }
}
