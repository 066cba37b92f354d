import type { MigrationInterface, QueryRunner } from 'typeorm';

export class ConcernsAndReadiness1764635000000 implements MigrationInterface {
  name = 'ConcernsAndReadiness1764635000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE concern (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        club_id uuid NOT NULL REFERENCES club(id) ON DELETE CASCADE,
        tank_id uuid NOT NULL REFERENCES tank(id) ON DELETE CASCADE,
        owner_id uuid NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
        water_test_id uuid REFERENCES water_test(id) ON DELETE SET NULL,
        rule text NOT NULL,
        parameter text NOT NULL,
        severity text NOT NULL CHECK (severity IN ('info','caution','urgent')),
        reason text NOT NULL,
        next_steps jsonb NOT NULL DEFAULT '[]',
        water_changes jsonb,
        value double precision,
        unit text,
        status text NOT NULL DEFAULT 'open' CHECK (status IN ('open','acknowledged','resolved')),
        raised_at timestamptz NOT NULL DEFAULT now(),
        last_seen_at timestamptz NOT NULL DEFAULT now(),
        acknowledged_by_id uuid REFERENCES app_user(id) ON DELETE SET NULL,
        acknowledged_at timestamptz,
        acknowledge_note text,
        resolved_by_id uuid REFERENCES app_user(id) ON DELETE SET NULL,
        resolved_at timestamptz,
        resolve_note text,
        resolved_by_test boolean NOT NULL DEFAULT false,
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT ck_concern_resolved CHECK ((status = 'resolved') = (resolved_at IS NOT NULL))
      )`);
    // One live concern per cause per tank: re-evaluation updates it instead of adding another.
    await q.query(
      `CREATE UNIQUE INDEX uq_concern_live_rule ON concern (tank_id, rule) WHERE status <> 'resolved'`,
    );
    await q.query(`CREATE INDEX idx_concern_tank_status ON concern (tank_id, status, raised_at DESC)`);
    await q.query(
      `CREATE INDEX idx_concern_club_owner ON concern (club_id, owner_id) WHERE status <> 'resolved'`,
    );
    await q.query(`
      CREATE TABLE tank_readiness (
        tank_id uuid PRIMARY KEY REFERENCES tank(id) ON DELETE CASCADE,
        equipment_running boolean NOT NULL DEFAULT false,
        quarantine_plan boolean NOT NULL DEFAULT false,
        food_ready boolean NOT NULL DEFAULT false,
        notes text NOT NULL DEFAULT '',
        signed_off_by_id uuid REFERENCES app_user(id) ON DELETE SET NULL,
        signed_off_at timestamptz,
        sign_off_note text,
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT ck_tank_readiness_sign_off CHECK ((signed_off_by_id IS NULL) = (signed_off_at IS NULL))
      )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE tank_readiness`);
    await q.query(`DROP TABLE concern`);
  }
}
