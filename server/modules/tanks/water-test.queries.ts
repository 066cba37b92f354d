import type { EntityManager } from 'typeorm';
import type { ParameterKey, WaterTestInput } from '@shared/care';
import { VALUE_COLUMNS } from './water-test.entity';

/** The tank's tests of the last `days` days up to `now`, oldest first, as the care engine reads them (canonical units). */
export async function careHistory(m: EntityManager, tankId: string, now: Date, days = 120): Promise<WaterTestInput[]> {
  return (await careHistories(m, [tankId], now, days)).get(tankId) ?? [];
}

/** `careHistory` for several tanks in one query: every tank asked about is in the map (empty when untested). */
export async function careHistories(m: EntityManager, tankIds: readonly string[], now: Date, days = 120): Promise<Map<string, WaterTestInput[]>> {
  const byTank = new Map<string, WaterTestInput[]>(tankIds.map((id) => [id, []]));
  if (!tankIds.length) return byTank;
  const cols = Object.entries(VALUE_COLUMNS).map(([key, { column }]) => `${column} AS "${key}"`).join(', ');
  const rows: ({ id: string; tankId: string; takenAt: Date } & Record<ParameterKey, number | null>)[] = await m.query(
    `SELECT id, tank_id AS "tankId", taken_at AS "takenAt", ${cols} FROM water_test
      WHERE tank_id = ANY($1::uuid[]) AND taken_at <= $2 AND taken_at > $2::timestamptz - make_interval(days => $3)
      ORDER BY taken_at, id`,
    [[...tankIds], now.toISOString(), days],
  );
  for (const r of rows) {
    const values: WaterTestInput['values'] = {};
    for (const key of Object.keys(VALUE_COLUMNS) as ParameterKey[]) {
      const v = r[key];
      if (v !== null && v !== undefined) values[key] = Number(v);
    }
    byTank.get(r.tankId)?.push({ id: r.id, takenAt: new Date(r.takenAt).toISOString(), values });
  }
  return byTank;
}
