import type { EntityManager } from 'typeorm';
import type { ParameterKey, SystemType, TankPhase, WaterTestInput } from '../../../shared/care';
import { VALUE_COLUMNS } from '../tanks/water-test.entity';


export interface TankForCare {
  id: string;
  clubId: string;
  ownerId: string;
  name: string;
  systemType: SystemType;
  volumeL: number;
  phase: TankPhase;
  careProfileKey: string;
  createdAt: string;
  setUpOn: string | null;
  hasLivestock: boolean;
  archived: boolean;
}

export async function loadTankForCare(m: EntityManager, tankId: string): Promise<TankForCare | null> {
  const rows: (Omit<TankForCare, 'createdAt' | 'setUpOn'> & { createdAt: Date; setUpOn: string | null })[] = await m.query(
    `SELECT t.id, t.club_id AS "clubId", t.owner_id AS "ownerId", t.name, t.system_type AS "systemType",
            t.volume_l AS "volumeL", t.phase, t.care_profile_key AS "careProfileKey", t.created_at AS "createdAt",
            to_char(t.set_up_on, 'YYYY-MM-DD') AS "setUpOn", t.archived_at IS NOT NULL AS archived,
            EXISTS (SELECT 1 FROM livestock l WHERE l.tank_id = t.id AND l.removed_on IS NULL) AS "hasLivestock"
       FROM tank t WHERE t.id = $1`,
    [tankId],
  );
  const r = rows[0];
  return r ? { ...r, createdAt: new Date(r.createdAt).toISOString() } : null;
}

/** The tank's tests of the last `days` days as the care engine reads them (canonical units). */
export async function loadHistory(m: EntityManager, tankId: string, now: Date, days = 120): Promise<WaterTestInput[]> {
  return (await loadHistories(m, [tankId], now, days)).get(tankId) ?? [];
}

/** `loadHistory` for several tanks in one query: every tank asked about is in the map (empty when untested). */
export async function loadHistories(m: EntityManager, tankIds: readonly string[], now: Date, days = 120): Promise<Map<string, WaterTestInput[]>> {
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

/** The nitrate of the water the keeper last changed with, when they measured it. */
export async function lastSourceNitrate(m: EntityManager, tankId: string): Promise<number | undefined> {
  const rows: { n: number | null }[] = await m.query(
    `SELECT (computed->>'sourceNitrateMgL')::double precision AS n FROM tank_event
      WHERE tank_id = $1 AND kind = 'water-change' AND computed ? 'sourceNitrateMgL'
      ORDER BY occurred_at DESC LIMIT 1`,
    [tankId],
  );
  return rows[0]?.n ?? undefined;
}
