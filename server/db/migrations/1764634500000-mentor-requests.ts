import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Members asking for a mentor; a mentor's capacity is capped at 20 (shared/constants/mentorship.ts). */
export class MentorRequests1764634500000 implements MigrationInterface {
  name = 'MentorRequests1764634500000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE mentor_request (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        club_id uuid NOT NULL REFERENCES club(id) ON DELETE CASCADE,
        requester_id uuid NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
        preferred_mentor_id uuid REFERENCES app_user(id) ON DELETE SET NULL,
        note text NOT NULL DEFAULT '' CHECK (length(note) <= 500),
        state text NOT NULL DEFAULT 'open' CHECK (state IN ('open','accepted','declined')),
        decline_reason text CHECK (decline_reason IS NULL OR length(decline_reason) BETWEEN 1 AND 500),
        decided_by_id uuid REFERENCES app_user(id) ON DELETE SET NULL,
        decided_at timestamptz,
        assignment_id uuid REFERENCES mentor_assignment(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT ck_mentor_request_decided CHECK ((state = 'open') = (decided_at IS NULL)),
        CONSTRAINT ck_mentor_request_declined_reason CHECK ((state = 'declined') = (decline_reason IS NOT NULL)),
        CONSTRAINT ck_mentor_request_not_self CHECK (preferred_mentor_id IS NULL OR preferred_mentor_id <> requester_id)
      )`);
    // One open request per member per club; answered ones stay as history.
    await q.query(
      `CREATE UNIQUE INDEX uq_mentor_request_open ON mentor_request (club_id, requester_id) WHERE state = 'open'`,
    );
    await q.query(
      `CREATE INDEX idx_mentor_request_club_state ON mentor_request (club_id, state, created_at)`,
    );
    await q.query(
      `CREATE INDEX idx_mentor_request_requester ON mentor_request (requester_id, club_id, created_at DESC)`,
    );
    await q.query(`UPDATE membership SET mentor_capacity = 20 WHERE mentor_capacity > 20`);
    await q.query(`ALTER TABLE membership DROP CONSTRAINT IF EXISTS membership_mentor_capacity_check`);
    await q.query(
      `ALTER TABLE membership ADD CONSTRAINT ck_membership_mentor_capacity CHECK (mentor_capacity IS NULL OR mentor_capacity BETWEEN 0 AND 20)`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE membership DROP CONSTRAINT ck_membership_mentor_capacity`);
    await q.query(
      `ALTER TABLE membership ADD CONSTRAINT membership_mentor_capacity_check CHECK (mentor_capacity IS NULL OR mentor_capacity BETWEEN 0 AND 100)`,
    );
    await q.query(`DROP TABLE mentor_request`);
  }
}
