import type { DataSource } from 'typeorm';
import { defaultProfileFor, type ParameterKey, type SystemType } from '@shared/care';
import { VALUE_COLUMNS } from '@server/modules/tanks/water-test.entity';
import { DAY_MS } from '@shared/care/time';

/** A tank row straight into the database, for tests about what happens around tanks rather than their API. */
export async function insertTank(
  ds: DataSource,
  p: {
    clubId: string;
    ownerId: string;
    systemType?: SystemType;
    phase?: 'cycling' | 'established';
    volumeL?: number;
    createdAt?: Date;
    name?: string;
  },
): Promise<string> {
  const systemType = p.systemType ?? 'seahorse';
  const rows: { id: string }[] = await ds.query(
    `INSERT INTO tank (club_id, owner_id, name, system_type, volume_l, volume_source, phase, care_profile_key, created_at)
     VALUES ($1, $2, $3, $4, $5, 'entered', $6, $7, $8) RETURNING id`,
    [
      p.clubId,
      p.ownerId,
      p.name ?? 'Test tank',
      systemType,
      p.volumeL ?? 200,
      p.phase ?? 'established',
      defaultProfileFor(systemType).key,
      (p.createdAt ?? new Date(Date.now() - 90 * DAY_MS)).toISOString(),
    ],
  );
  return rows[0]!.id;
}

export async function insertWaterTest(
  ds: DataSource,
  tankId: string,
  takenAt: Date,
  values: Partial<Record<ParameterKey, number>>,
): Promise<string> {
  const keys = Object.keys(values) as ParameterKey[];
  const cols = keys.map((k) => VALUE_COLUMNS[k].column);
  const rows: { id: string }[] = await ds.query(
    `INSERT INTO water_test (tank_id, taken_at, entries${cols.map((c) => `, ${c}`).join('')})
     VALUES ($1, $2, '{}'${keys.map((_, i) => `, $${i + 3}`).join('')}) RETURNING id`,
    [tankId, takenAt.toISOString(), ...keys.map((k) => values[k])],
  );
  return rows[0]!.id;
}
