import type { DataSource } from 'typeorm';
import { defaultProfileFor, type ParameterKey, type SystemType } from '../../shared/care';

const COLUMN: Record<ParameterKey, string> = {
  temperature: 'temperature_c', salinity: 'salinity_psu', pH: 'ph', ammonia: 'ammonia_mg_l', nitrite: 'nitrite_mg_l',
  nitrate: 'nitrate_mg_l', alkalinity: 'alkalinity_dkh', calcium: 'calcium_mg_l', magnesium: 'magnesium_mg_l', phosphate: 'phosphate_mg_l',
};

/** A tank row straight into the database, for tests about what happens around tanks rather than their API. */
export async function insertTank(
  ds: DataSource,
  p: { clubId: string; ownerId: string; systemType?: SystemType; phase?: 'cycling' | 'established'; volumeL?: number; createdAt?: Date; name?: string },
): Promise<string> {
  const systemType = p.systemType ?? 'seahorse';
  const rows: { id: string }[] = await ds.query(
    `INSERT INTO tank (club_id, owner_id, name, system_type, volume_l, volume_source, phase, care_profile_key, created_at)
     VALUES ($1, $2, $3, $4, $5, 'entered', $6, $7, $8) RETURNING id`,
    [p.clubId, p.ownerId, p.name ?? 'Test tank', systemType, p.volumeL ?? 200, p.phase ?? 'established', defaultProfileFor(systemType).key, (p.createdAt ?? new Date(Date.now() - 90 * 86_400_000)).toISOString()],
  );
  return rows[0]!.id;
}

export async function insertWaterTest(ds: DataSource, tankId: string, takenAt: Date, values: Partial<Record<ParameterKey, number>>): Promise<string> {
  const keys = Object.keys(values) as ParameterKey[];
  const cols = keys.map((k) => COLUMN[k]);
  const rows: { id: string }[] = await ds.query(
    `INSERT INTO water_test (tank_id, taken_at, entries${cols.map((c) => `, ${c}`).join('')})
     VALUES ($1, $2, '{}'${keys.map((_, i) => `, $${i + 3}`).join('')}) RETURNING id`,
    [tankId, takenAt.toISOString(), ...keys.map((k) => values[k])],
  );
  return rows[0]!.id;
}
