import type { EntityManager } from 'typeorm';
import type { ParameterKey, WaterTestInput } from '@shared/care';
import { VALUE_COLUMNS, WaterTest } from './water-test.entity';

/** The tank's tests of the last `days` days up to `now`, oldest first, as the care engine reads them (canonical units). */
export async function careHistory(m: EntityManager, tankId: string, now: Date, days = 120): Promise<WaterTestInput[]> {
  const cols = Object.entries(VALUE_COLUMNS).map(([key, { column }]) => `${column} AS "${key}"`).join(', ');
  const rows: ({ id: string; takenAt: Date } & Record<ParameterKey, number | null>)[] = await m.query(
    `SELECT id, taken_at AS "takenAt", ${cols} FROM water_test
      WHERE tank_id = $1 AND taken_at <= $2 AND taken_at > $2::timestamptz - make_interval(days => $3)
      ORDER BY taken_at, id`,
    [tankId, now.toISOString(), days],
  );
  return rows.map((r) => {
    const values: WaterTestInput['values'] = {};
    for (const key of Object.keys(VALUE_COLUMNS) as ParameterKey[]) {
      const v = r[key];
      if (v !== null && v !== undefined) values[key] = Number(v);
    }
    return { id: r.id, takenAt: new Date(r.takenAt).toISOString(), values };
  });
}

/** When each of the tank's tests was taken: what an import checks its rows against for duplicates. */
export async function takenAtsOf(m: EntityManager, tankId: string): Promise<Set<number>> {
  const rows = await m.find(WaterTest, { where: { tankId }, select: { takenAt: true } });
  return new Set(rows.map((r) => r.takenAt.getTime()));
}
