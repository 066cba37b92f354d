import type { MigrationInterface, QueryRunner } from 'typeorm';

export class TanksReadingsPhotos1764628000000 implements MigrationInterface {
  name = 'TanksReadingsPhotos1764628000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE tank (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        club_id uuid NOT NULL REFERENCES club(id) ON DELETE CASCADE,
        owner_id uuid NOT NULL REFERENCES app_user(id) ON DELETE CASCADE,
        name text NOT NULL CHECK (char_length(name) BETWEEN 1 AND 80),
        system_type text NOT NULL CHECK (system_type IN ('marine-fish-only','reef','seahorse','brackish','tropical-freshwater','coldwater')),
        volume_l double precision NOT NULL CHECK (volume_l > 0 AND volume_l <= 100000),
        volume_source text NOT NULL CHECK (volume_source IN ('entered','dimensions')),
        shape text CHECK (shape IN ('rectangle','cylinder','bowfront')),
        length_cm double precision CHECK (length_cm > 0),
        width_cm double precision CHECK (width_cm > 0),
        height_cm double precision CHECK (height_cm > 0),
        diameter_cm double precision CHECK (diameter_cm > 0),
        bow_depth_cm double precision CHECK (bow_depth_cm >= 0),
        fill_height_cm double precision CHECK (fill_height_cm > 0 AND fill_height_cm <= height_cm),
        displacement_fraction double precision CHECK (displacement_fraction BETWEEN 0 AND 0.9),
        set_up_on date,
        phase text NOT NULL DEFAULT 'cycling' CHECK (phase IN ('cycling','established')),
        equipment_notes text NOT NULL DEFAULT '',
        care_profile_key text NOT NULL,
        archived_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT ck_tank_dimensions CHECK (
          (volume_source = 'dimensions') = (shape IS NOT NULL AND height_cm IS NOT NULL AND displacement_fraction IS NOT NULL)
        )
      )`);
    await q.query(`CREATE INDEX idx_tank_club_owner ON tank (club_id, owner_id)`);
    await q.query(`CREATE INDEX idx_tank_owner ON tank (owner_id)`);

    await q.query(`
      CREATE TABLE livestock (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        tank_id uuid NOT NULL REFERENCES tank(id) ON DELETE CASCADE,
        species_common_name text NOT NULL CHECK (char_length(species_common_name) BETWEEN 1 AND 120),
        count integer NOT NULL CHECK (count BETWEEN 1 AND 10000),
        added_on date NOT NULL,
        source text NOT NULL DEFAULT '',
        quarantine_notes text NOT NULL DEFAULT '',
        removed_on date,
        removal_reason text,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT ck_livestock_removed_after_added CHECK (removed_on IS NULL OR removed_on >= added_on)
      )`);
    await q.query(`CREATE INDEX idx_livestock_tank ON livestock (tank_id, added_on)`);

    // One row per test session; a nullable column per parameter in its canonical unit, the entries as typed in jsonb.
    await q.query(`
      CREATE TABLE water_test (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        tank_id uuid NOT NULL REFERENCES tank(id) ON DELETE CASCADE,
        taken_at timestamptz NOT NULL,
        temperature_c double precision,
        salinity_psu double precision CHECK (salinity_psu >= 0),
        ph double precision CHECK (ph BETWEEN 0 AND 14),
        ammonia_mg_l double precision CHECK (ammonia_mg_l >= 0),
        nitrite_mg_l double precision CHECK (nitrite_mg_l >= 0),
        nitrate_mg_l double precision CHECK (nitrate_mg_l >= 0),
        alkalinity_dkh double precision CHECK (alkalinity_dkh >= 0),
        calcium_mg_l double precision CHECK (calcium_mg_l >= 0),
        magnesium_mg_l double precision CHECK (magnesium_mg_l >= 0),
        phosphate_mg_l double precision CHECK (phosphate_mg_l >= 0),
        free_ammonia_mg_l double precision CHECK (free_ammonia_mg_l >= 0),
        entries jsonb NOT NULL,
        derived jsonb NOT NULL DEFAULT '{}',
        note text NOT NULL DEFAULT '',
        origin text NOT NULL DEFAULT 'form' CHECK (origin IN ('form','import')),
        created_by_id uuid REFERENCES app_user(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT ck_water_test_has_reading CHECK (num_nonnulls(temperature_c, salinity_psu, ph, ammonia_mg_l, nitrite_mg_l,
          nitrate_mg_l, alkalinity_dkh, calcium_mg_l, magnesium_mg_l, phosphate_mg_l) > 0)
      )`);
    await q.query(`CREATE INDEX idx_water_test_tank_taken ON water_test (tank_id, taken_at DESC, id DESC)`);
    await q.query(`COMMENT ON COLUMN water_test.salinity_psu IS 'practical salinity (PSS-78)'`);
    await q.query(`COMMENT ON COLUMN water_test.ammonia_mg_l IS 'total ammonia (NH3 + NH4+), mg/L as NH3'`);
    await q.query(`COMMENT ON COLUMN water_test.nitrite_mg_l IS 'mg/L as NO2'`);
    await q.query(`COMMENT ON COLUMN water_test.nitrate_mg_l IS 'mg/L as NO3'`);
    await q.query(`COMMENT ON COLUMN water_test.phosphate_mg_l IS 'mg/L as PO4'`);
    await q.query(
      `COMMENT ON COLUMN water_test.free_ammonia_mg_l IS 'derived: un-ionized NH3, mg/L as NH3; how in derived'`,
    );

    await q.query(`
      CREATE TABLE tank_event (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        tank_id uuid NOT NULL REFERENCES tank(id) ON DELETE CASCADE,
        kind text NOT NULL CHECK (kind IN ('water-change','supplement-dose','feeding-note','equipment-change',
          'livestock-added','livestock-removed','observation')),
        occurred_at timestamptz NOT NULL,
        note text NOT NULL DEFAULT '',
        details jsonb NOT NULL DEFAULT '{}',
        computed jsonb NOT NULL DEFAULT '{}',
        livestock_id uuid REFERENCES livestock(id) ON DELETE CASCADE,
        created_by_id uuid REFERENCES app_user(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT ck_tank_event_livestock CHECK ((kind IN ('livestock-added','livestock-removed')) = (livestock_id IS NOT NULL))
      )`);
    await q.query(
      `CREATE INDEX idx_tank_event_tank_occurred ON tank_event (tank_id, occurred_at DESC, id DESC)`,
    );
    await q.query(
      `CREATE UNIQUE INDEX uq_tank_event_livestock_kind ON tank_event (livestock_id, kind) WHERE livestock_id IS NOT NULL`,
    );

    await q.query(`
      CREATE TABLE photo (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        tank_id uuid NOT NULL REFERENCES tank(id) ON DELETE CASCADE,
        water_test_id uuid REFERENCES water_test(id) ON DELETE CASCADE,
        event_id uuid REFERENCES tank_event(id) ON DELETE CASCADE,
        storage_key text NOT NULL CHECK (storage_key ~ '^[0-9a-f]{32}$'),
        caption text NOT NULL DEFAULT '',
        width integer NOT NULL CHECK (width > 0),
        height integer NOT NULL CHECK (height > 0),
        bytes integer NOT NULL CHECK (bytes > 0),
        original_type text NOT NULL CHECK (original_type IN ('image/jpeg','image/png','image/webp')),
        uploaded_by_id uuid REFERENCES app_user(id) ON DELETE SET NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        CONSTRAINT ck_photo_one_parent CHECK (water_test_id IS NULL OR event_id IS NULL)
      )`);
    await q.query(`CREATE UNIQUE INDEX uq_photo_storage_key ON photo (storage_key)`);
    await q.query(`CREATE INDEX idx_photo_tank ON photo (tank_id, created_at)`);
    await q.query(
      `CREATE INDEX idx_photo_water_test ON photo (water_test_id) WHERE water_test_id IS NOT NULL`,
    );
    await q.query(`CREATE INDEX idx_photo_event ON photo (event_id) WHERE event_id IS NOT NULL`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of ['photo', 'tank_event', 'water_test', 'livestock', 'tank'])
      await q.query(`DROP TABLE ${t}`);
  }
}
