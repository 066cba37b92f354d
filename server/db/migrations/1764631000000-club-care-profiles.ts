import type { MigrationInterface, QueryRunner } from 'typeorm';

export class ClubCareProfiles1764631000000 implements MigrationInterface {
  name = 'ClubCareProfiles1764631000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE club_care_profile (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        club_id uuid NOT NULL REFERENCES club(id) ON DELETE CASCADE,
        key text NOT NULL CHECK (key ~ '^[a-z0-9]+(-[a-z0-9]+)*$'),
        based_on_key text NOT NULL,
        current_version integer NOT NULL CHECK (current_version >= 1),
        created_by_id uuid REFERENCES app_user(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE UNIQUE INDEX uq_club_care_profile_key ON club_care_profile (club_id, key)`);
    await q.query(`
      CREATE TABLE club_care_profile_version (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        profile_id uuid NOT NULL REFERENCES club_care_profile(id) ON DELETE CASCADE,
        version integer NOT NULL CHECK (version >= 1),
        definition jsonb NOT NULL,
        changes jsonb NOT NULL DEFAULT '[]',
        note text NOT NULL,
        changed_by_id uuid REFERENCES app_user(id) ON DELETE SET NULL,
        changed_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(
      `CREATE UNIQUE INDEX uq_club_care_profile_version ON club_care_profile_version (profile_id, version)`,
    );
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE club_care_profile_version`);
    await q.query(`DROP TABLE club_care_profile`);
  }
}
