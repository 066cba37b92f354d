import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Questions a keeper asks about one water test or observation, with a copy of what it showed, and their threads. */
export class QuestionsOnReadings1764637000000 implements MigrationInterface {
  name = 'QuestionsOnReadings1764637000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE question (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        club_id uuid NOT NULL REFERENCES club(id) ON DELETE CASCADE,
        tank_id uuid NOT NULL REFERENCES tank(id) ON DELETE CASCADE,
        asker_id uuid NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
        water_test_id uuid REFERENCES water_test(id) ON DELETE CASCADE,
        event_id uuid REFERENCES tank_event(id) ON DELETE CASCADE,
        title text NOT NULL CHECK (length(title) BETWEEN 1 AND 160),
        body text NOT NULL CHECK (length(body) BETWEEN 1 AND 5000),
        status text NOT NULL DEFAULT 'open' CHECK (status IN ('open','answered')),
        snapshot jsonb NOT NULL,
        created_at timestamptz NOT NULL DEFAULT clock_timestamp(),
        answered_at timestamptz,
        CONSTRAINT ck_question_about_one CHECK (num_nonnulls(water_test_id, event_id) = 1),
        CONSTRAINT ck_question_answered CHECK ((status = 'answered') = (answered_at IS NOT NULL))
      )`);
    // The desk counts open questions per tank; lists page through a club newest first.
    await q.query(
      `CREATE INDEX idx_question_club_tank_open ON question (club_id, tank_id) WHERE status = 'open'`,
    );
    await q.query(`CREATE INDEX idx_question_club_created ON question (club_id, created_at DESC, id DESC)`);
    await q.query(`CREATE INDEX idx_question_asker ON question (asker_id)`);
    await q.query(`CREATE INDEX idx_question_tank ON question (tank_id)`);
    await q.query(
      `CREATE INDEX idx_question_water_test ON question (water_test_id) WHERE water_test_id IS NOT NULL`,
    );
    await q.query(`CREATE INDEX idx_question_event ON question (event_id) WHERE event_id IS NOT NULL`);
    // clock_timestamp, not now(): two replies in one transaction still get an order.
    await q.query(`
      CREATE TABLE question_reply (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        question_id uuid NOT NULL REFERENCES question(id) ON DELETE CASCADE,
        author_id uuid NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
        body text NOT NULL CHECK (length(body) BETWEEN 1 AND 5000),
        created_at timestamptz NOT NULL DEFAULT clock_timestamp()
      )`);
    await q.query(
      `CREATE INDEX idx_question_reply_question_created ON question_reply (question_id, created_at, id)`,
    );
    await q.query(`CREATE INDEX idx_question_reply_author ON question_reply (author_id)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE question_reply`);
    await q.query(`DROP TABLE question`);
  }
}
