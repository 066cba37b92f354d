import type { EntityManager } from 'typeorm';

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
