import type { EntityManager } from 'typeorm';
import type { TankEventKind } from '@shared/schemas/tank-event.schema';
import { pageOf, type Position } from './cursor';
import { TankEvent } from './tank-event.entity';

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

/** One page of the tank's events, newest first, optionally of one kind. */
export async function tankEventPage(
  m: EntityManager,
  tankId: string,
  q: { before?: Position; kind?: TankEventKind; limit: number },
): Promise<{ items: TankEvent[]; nextCursor: string | null }> {
  const qb = m.createQueryBuilder(TankEvent, 'e').where('e.tank_id = :tankId', { tankId });
  if (q.kind) qb.andWhere('e.kind = :kind', { kind: q.kind });
  if (q.before) qb.andWhere('(e.occurred_at, e.id) < (:at, :id)', { at: q.before.at, id: q.before.id });
  const rows = await qb
    .orderBy('e.occurred_at', 'DESC')
    .addOrderBy('e.id', 'DESC')
    .limit(q.limit + 1)
    .getMany();
  return pageOf(rows, q.limit, (e) => ({ at: e.occurredAt, id: e.id }));
}

export async function findTankEvent(
  m: EntityManager,
  tankId: string,
  eventId: string,
): Promise<TankEvent | null> {
  return m.findOneBy(TankEvent, { id: eventId, tankId });
}

/** All of the tank's events, oldest first (the export). */
export async function allTankEvents(m: EntityManager, tankId: string): Promise<TankEvent[]> {
  return m.find(TankEvent, { where: { tankId }, order: { occurredAt: 'ASC', id: 'ASC' } });
}
