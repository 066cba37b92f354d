import type { MigrationInterface, QueryRunner } from 'typeorm';

const KINDS = `('concern.urgent','concern.caution','question.asked','question.answered','mention','mentor-request','assignment')`;

/** In-app notifications, e-mail preferences per kind, and one claimed digest per user per local day. */
export class Notifications1764634600000 implements MigrationInterface {
  name = 'Notifications1764634600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE notification_digest (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
        digest_date date NOT NULL,
        notification_count integer NOT NULL DEFAULT 0 CHECK (notification_count >= 0),
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    // The claim: whichever worker inserts this row first sends that day's digest.
    await q.query(
      `CREATE UNIQUE INDEX uq_notification_digest_user_date ON notification_digest (user_id, digest_date)`,
    );
    await q.query(`
      CREATE TABLE notification (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
        club_id uuid NOT NULL REFERENCES club(id) ON DELETE CASCADE,
        kind text NOT NULL CHECK (kind IN ${KINDS}),
        title text NOT NULL CHECK (length(title) BETWEEN 1 AND 200),
        body text NOT NULL DEFAULT '' CHECK (length(body) <= 2000),
        link text NOT NULL CHECK (link ~ '^/([^/\\\\]|$)' AND length(link) <= 500),
        subject_type text,
        subject_id text,
        created_at timestamptz NOT NULL DEFAULT now(),
        read_at timestamptz,
        emailed_at timestamptz,
        digest_id uuid REFERENCES notification_digest(id) ON DELETE SET NULL,
        CONSTRAINT ck_notification_subject CHECK ((subject_type IS NULL) = (subject_id IS NULL))
      )`);
    await q.query(
      `CREATE INDEX idx_notification_user_created ON notification (user_id, created_at DESC, id DESC)`,
    );
    await q.query(
      `CREATE INDEX idx_notification_user_unread ON notification (user_id) WHERE read_at IS NULL`,
    );
    await q.query(
      `CREATE INDEX idx_notification_pending_email ON notification (user_id, created_at) WHERE emailed_at IS NULL AND read_at IS NULL`,
    );
    await q.query(`CREATE INDEX idx_notification_club ON notification (club_id)`);
    await q.query(`
      CREATE TABLE notification_preference (
        user_id uuid NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
        kind text NOT NULL CHECK (kind IN ${KINDS}),
        email_mode text NOT NULL CHECK (email_mode IN ('immediate','digest','off')),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT pk_notification_preference PRIMARY KEY (user_id, kind)
      )`);
    // The fake SMTP server keeps the headers too, so tests can see List-Unsubscribe.
    await q.query(`ALTER TABLE captured_mail ADD COLUMN headers jsonb NOT NULL DEFAULT '{}'`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE captured_mail DROP COLUMN headers`);
    for (const t of ['notification_preference', 'notification', 'notification_digest'])
      await q.query(`DROP TABLE ${t}`);
  }
}
