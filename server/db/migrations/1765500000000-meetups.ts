import type { MigrationInterface, QueryRunner } from 'typeorm';

const KINDS_BEFORE = `('concern.urgent','concern.caution','question.asked','question.answered','mention','mentor-request','assignment')`;
const KINDS_AFTER = `('concern.urgent','concern.caution','question.asked','question.answered','mention','mentor-request','assignment','meetup')`;

/**
 * Club meetups with RSVPs, a waitlist served in arrival order, clinic slots, check-in, reminders sent once per
 * start time, and per-user calendar feed links that can be reset.
 */
export class Meetups1765500000000 implements MigrationInterface {
  name = 'Meetups1765500000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE meetup (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        club_id uuid NOT NULL REFERENCES club(id) ON DELETE CASCADE,
        kind text NOT NULL CHECK (kind IN ('talk','clinic','tour','swap','online')),
        title text NOT NULL CHECK (length(title) BETWEEN 1 AND 120),
        description text NOT NULL DEFAULT '' CHECK (length(description) <= 4000),
        starts_at timestamptz NOT NULL,
        ends_at timestamptz NOT NULL,
        place_text text NOT NULL DEFAULT '' CHECK (length(place_text) <= 200),
        map_url text CHECK (length(map_url) <= 500),
        online_url text CHECK (length(online_url) <= 500),
        capacity integer NOT NULL CHECK (capacity BETWEEN 1 AND 500),
        host_id uuid REFERENCES app_user(id) ON DELETE SET NULL,
        slot_minutes integer CHECK (slot_minutes BETWEEN 5 AND 120),
        status text NOT NULL DEFAULT 'scheduled' CHECK (status IN ('scheduled','cancelled')),
        cancel_reason text CHECK (length(cancel_reason) <= 500),
        cancelled_at timestamptz,
        sequence integer NOT NULL DEFAULT 0 CHECK (sequence >= 0),
        created_by_id uuid REFERENCES app_user(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT ck_meetup_ends_after_start CHECK (ends_at > starts_at),
        CONSTRAINT ck_meetup_cancelled CHECK ((status = 'cancelled') = (cancelled_at IS NOT NULL))
      )`);
    await q.query(`CREATE INDEX idx_meetup_club_starts ON meetup (club_id, starts_at)`);
    // The reminder job scans what is about to start.
    await q.query(
      `CREATE INDEX idx_meetup_scheduled_starts ON meetup (starts_at) WHERE status = 'scheduled'`,
    );
    await q.query(`CREATE INDEX idx_meetup_host ON meetup (host_id) WHERE host_id IS NOT NULL`);
    await q.query(
      `CREATE INDEX idx_meetup_created_by ON meetup (created_by_id) WHERE created_by_id IS NOT NULL`,
    );

    // Arrival order of answers: taken while the meetup row is locked, so it is the order places were handed out.
    await q.query(`CREATE SEQUENCE meetup_rsvp_arrival_seq AS bigint`);
    await q.query(`
      CREATE TABLE meetup_rsvp (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        meetup_id uuid NOT NULL REFERENCES meetup(id) ON DELETE CASCADE,
        user_id uuid NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
        status text NOT NULL CHECK (status IN ('going','waitlisted','not-going')),
        arrival bigint NOT NULL DEFAULT nextval('meetup_rsvp_arrival_seq'),
        responded_at timestamptz NOT NULL DEFAULT clock_timestamp(),
        promoted_at timestamptz,
        slot_starts_at timestamptz,
        tank_id uuid REFERENCES tank(id) ON DELETE SET NULL,
        water_test_id uuid REFERENCES water_test(id) ON DELETE SET NULL,
        checked_in_at timestamptz,
        checked_in_by_id uuid REFERENCES app_user(id) ON DELETE SET NULL,
        CONSTRAINT ck_meetup_rsvp_slot_going CHECK (slot_starts_at IS NULL OR status = 'going')
      )`);
    await q.query(`ALTER SEQUENCE meetup_rsvp_arrival_seq OWNED BY meetup_rsvp.arrival`);
    await q.query(`CREATE UNIQUE INDEX uq_meetup_rsvp_meetup_user ON meetup_rsvp (meetup_id, user_id)`);
    // One sample per clinic slot, whoever books at the same moment.
    await q.query(
      `CREATE UNIQUE INDEX uq_meetup_rsvp_slot ON meetup_rsvp (meetup_id, slot_starts_at) WHERE slot_starts_at IS NOT NULL`,
    );
    await q.query(`CREATE INDEX idx_meetup_rsvp_queue ON meetup_rsvp (meetup_id, status, arrival)`);
    await q.query(`CREATE INDEX idx_meetup_rsvp_user ON meetup_rsvp (user_id)`);
    await q.query(`CREATE INDEX idx_meetup_rsvp_tank ON meetup_rsvp (tank_id) WHERE tank_id IS NOT NULL`);
    await q.query(
      `CREATE INDEX idx_meetup_rsvp_water_test ON meetup_rsvp (water_test_id) WHERE water_test_id IS NOT NULL`,
    );
    await q.query(
      `CREATE INDEX idx_meetup_rsvp_checked_in_by ON meetup_rsvp (checked_in_by_id) WHERE checked_in_by_id IS NOT NULL`,
    );

    // The claim: whichever run inserts this row first sends the reminder. A moved meetup is reminded of again.
    await q.query(`
      CREATE TABLE meetup_reminder (
        meetup_id uuid NOT NULL REFERENCES meetup(id) ON DELETE CASCADE,
        user_id uuid NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
        starts_at timestamptz NOT NULL,
        sent_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT pk_meetup_reminder PRIMARY KEY (meetup_id, user_id, starts_at)
      )`);
    await q.query(`CREATE INDEX idx_meetup_reminder_user ON meetup_reminder (user_id)`);

    // Bumping the generation turns every calendar link handed out before into a dead one.
    await q.query(`
      CREATE TABLE calendar_feed (
        user_id uuid PRIMARY KEY REFERENCES app_user(id) ON DELETE CASCADE,
        generation integer NOT NULL DEFAULT 1 CHECK (generation >= 1),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);

    for (const table of ['notification', 'notification_preference']) {
      await q.query(
        `ALTER TABLE ${table} DROP CONSTRAINT ${table}_kind_check, ADD CONSTRAINT ${table}_kind_check CHECK (kind IN ${KINDS_AFTER})`,
      );
    }
    // The fake SMTP server keeps attachments (a reminder's .ics) so tests can read them.
    await q.query(`ALTER TABLE captured_mail ADD COLUMN attachments jsonb NOT NULL DEFAULT '[]'`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE captured_mail DROP COLUMN attachments`);
    await q.query(`DELETE FROM notification_preference WHERE kind = 'meetup'`);
    await q.query(`DELETE FROM notification WHERE kind = 'meetup'`);
    for (const table of ['notification', 'notification_preference']) {
      await q.query(
        `ALTER TABLE ${table} DROP CONSTRAINT ${table}_kind_check, ADD CONSTRAINT ${table}_kind_check CHECK (kind IN ${KINDS_BEFORE})`,
      );
    }
    for (const t of ['calendar_feed', 'meetup_reminder', 'meetup_rsvp', 'meetup'])
      await q.query(`DROP TABLE ${t}`);
  }
}
