import type { MigrationInterface, QueryRunner } from 'typeorm';

export class AccountsClubsRoles1764627000000 implements MigrationInterface {
  name = 'AccountsClubsRoles1764627000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE app_user (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        email text NOT NULL CHECK (email = lower(email)),
        display_name text NOT NULL,
        password_hash text NOT NULL,
        experience_level text NOT NULL DEFAULT 'beginner' CHECK (experience_level IN ('beginner','some-experience','experienced')),
        temperature_unit text NOT NULL DEFAULT 'C' CHECK (temperature_unit IN ('C','F')),
        volume_unit text NOT NULL DEFAULT 'L' CHECK (volume_unit IN ('L','USgal')),
        salinity_display text NOT NULL DEFAULT 'sg' CHECK (salinity_display IN ('sg','ppt')),
        time_zone text NOT NULL DEFAULT 'UTC',
        disabled_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE UNIQUE INDEX uq_app_user_email_lower ON app_user (lower(email))`);
    await q.query(`
      CREATE TABLE club (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        name text NOT NULL,
        slug text NOT NULL,
        description text NOT NULL DEFAULT '',
        location_text text NOT NULL DEFAULT '',
        time_zone text NOT NULL DEFAULT 'UTC',
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE UNIQUE INDEX uq_club_slug ON club (slug)`);
    await q.query(`
      CREATE TABLE membership (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        club_id uuid NOT NULL REFERENCES club(id) ON DELETE CASCADE,
        user_id uuid NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
        role text NOT NULL CHECK (role IN ('member','mentor','admin')),
        status text NOT NULL DEFAULT 'active' CHECK (status IN ('active','suspended')),
        mentor_capacity integer CHECK (mentor_capacity IS NULL OR mentor_capacity BETWEEN 0 AND 100),
        joined_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE UNIQUE INDEX uq_membership_club_user ON membership (club_id, user_id)`);
    await q.query(`CREATE INDEX idx_membership_user ON membership (user_id)`);
    await q.query(`
      CREATE TABLE invite (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        club_id uuid NOT NULL REFERENCES club(id) ON DELETE CASCADE,
        email text NOT NULL,
        role text NOT NULL CHECK (role IN ('member','mentor','admin')),
        token_hash text NOT NULL,
        invited_by_id uuid REFERENCES app_user(id) ON DELETE SET NULL,
        expires_at timestamptz NOT NULL,
        accepted_at timestamptz,
        revoked_at timestamptz,
        last_sent_at timestamptz NOT NULL DEFAULT now(),
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE UNIQUE INDEX uq_invite_token_hash ON invite (token_hash)`);
    await q.query(`CREATE INDEX idx_invite_club ON invite (club_id)`);
    await q.query(`
      CREATE TABLE password_reset (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        user_id uuid NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
        token_hash text NOT NULL,
        expires_at timestamptz NOT NULL,
        used_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE UNIQUE INDEX uq_password_reset_token_hash ON password_reset (token_hash)`);
    await q.query(`
      CREATE TABLE mentor_assignment (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        club_id uuid NOT NULL REFERENCES club(id) ON DELETE CASCADE,
        mentor_id uuid NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
        mentee_id uuid NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
        started_at timestamptz NOT NULL DEFAULT now(),
        ended_at timestamptz,
        created_by_id uuid REFERENCES app_user(id) ON DELETE SET NULL,
        CHECK (mentor_id <> mentee_id),
        CHECK (ended_at IS NULL OR ended_at >= started_at)
      )`);
    await q.query(`CREATE INDEX idx_mentor_assignment_mentor ON mentor_assignment (mentor_id, club_id)`);
    await q.query(`CREATE INDEX idx_mentor_assignment_mentee ON mentor_assignment (mentee_id, club_id)`);
    // A mentee has at most one running mentor per club.
    await q.query(
      `CREATE UNIQUE INDEX uq_mentor_assignment_current ON mentor_assignment (club_id, mentee_id) WHERE ended_at IS NULL`,
    );
    await q.query(`
      CREATE TABLE audit_event (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        actor_id uuid,
        club_id uuid,
        action text NOT NULL,
        target_type text,
        target_id text,
        details jsonb NOT NULL DEFAULT '{}',
        at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX idx_audit_event_club_at ON audit_event (club_id, at)`);
    await q.query(`
      CREATE TABLE captured_mail (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        from_address text NOT NULL,
        to_address text NOT NULL,
        subject text NOT NULL,
        text text NOT NULL DEFAULT '',
        html text NOT NULL DEFAULT '',
        received_at timestamptz NOT NULL DEFAULT now()
      )`);
    // Lets "end every session of this user" find them without scanning JSON.
    await q.query(`CREATE INDEX idx_session_user ON "session" ((sess->>'userId'))`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX IF EXISTS idx_session_user`);
    for (const t of [
      'captured_mail',
      'audit_event',
      'mentor_assignment',
      'password_reset',
      'invite',
      'membership',
      'club',
      'app_user',
    ]) {
      await q.query(`DROP TABLE ${t}`);
    }
  }
}
