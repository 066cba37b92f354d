import type { EntityManager } from 'typeorm';
import { pageOf, type Position } from './cursor';
import type { ParameterKey, WaterTestInput } from '@shared/care';
import { VALUE_COLUMNS, WaterTest } from './water-test.entity';

/** The tank's tests of the last `days` days up to `now`, oldest first, as the care engine reads them (canonical units). */
export async function careHistory(
  m: EntityManager,
  tankId: string,
  now: Date,
  days = 120,
): Promise<WaterTestInput[]> {
  return (await careHistories(m, [tankId], now, days)).get(tankId) ?? [];
}

/** `careHistory` for several tanks in one query: every tank asked about is in the map (empty when untested). */
export async function careHistories(
  m: EntityManager,
  tankIds: readonly string[],
  now: Date,
  days = 120,
): Promise<Map<string, WaterTestInput[]>> {
  const byTank = new Map<string, WaterTestInput[]>(tankIds.map((id) => [id, []]));
  if (!tankIds.length) return byTank;
  const cols = Object.entries(VALUE_COLUMNS)
    .map(([key, { column }]) => `${column} AS "${key}"`)
    .join(', ');
  const rows: ({ id: string; tankId: string; takenAt: Date } & Record<ParameterKey, number | null>)[] =
    await m.query(
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

/** When each of the tank's tests was taken: what an import checks its rows against for duplicates. */
export async function takenAtsOf(m: EntityManager, tankId: string): Promise<Set<number>> {
  const rows = await m.find(WaterTest, { where: { tankId }, select: { takenAt: true } });
  return new Set(rows.map((r) => r.takenAt.getTime()));
}

/** One page of the tank's tests, newest first, optionally between two times. */
export async function waterTestPage(
  m: EntityManager,
  tankId: string,
  q: { before?: Position; from?: string; to?: string; limit: number },
): Promise<{ items: WaterTest[]; nextCursor: string | null }> {
  const qb = m.createQueryBuilder(WaterTest, 'w').where('w.tank_id = :tankId', { tankId });
  if (q.before) qb.andWhere('(w.taken_at, w.id) < (:at, :id)', { at: q.before.at, id: q.before.id });
  if (q.from) qb.andWhere('w.taken_at >= :from', { from: new Date(q.from) });
  if (q.to) qb.andWhere('w.taken_at <= :to', { to: new Date(q.to) });
  const rows = await qb
    .orderBy('w.taken_at', 'DESC')
    .addOrderBy('w.id', 'DESC')
    .limit(q.limit + 1)
    .getMany();
  return pageOf(rows, q.limit, (t) => ({ at: t.takenAt, id: t.id }));
}

export async function findWaterTest(
  m: EntityManager,
  tankId: string,
  testId: string,
): Promise<WaterTest | null> {
  return m.findOneBy(WaterTest, { id: testId, tankId });
}

/** All of the tank's tests, oldest first (the export). */
export async function allWaterTests(m: EntityManager, tankId: string): Promise<WaterTest[]> {
  return m.find(WaterTest, { where: { tankId }, order: { takenAt: 'ASC', id: 'ASC' } });
}
