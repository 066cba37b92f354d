import { In, type EntityManager } from 'typeorm';
import { pageOf, type Position } from './cursor';
import { TankEvent } from './tank-event.entity';
import { WaterTest } from './water-test.entity';

export type TimelineRow =
  { type: 'water-test'; at: Date; waterTest: WaterTest } | { type: 'event'; at: Date; event: TankEvent };

interface Slot {
  type: 'water-test' | 'event';
  id: string;
  at: Date;
}

/** One page of the tank's timeline, tests and events together, newest first. */
export async function timelinePage(
  m: EntityManager,
  tankId: string,
  q: { before?: Position; limit: number },
): Promise<{ items: TimelineRow[]; nextCursor: string | null }> {
  const { before } = q;
  const slots: Slot[] = await m.query(
    `SELECT type, id, at FROM (
       SELECT 'water-test' AS type, id, taken_at AS at FROM water_test WHERE tank_id = $1
       UNION ALL
       SELECT 'event' AS type, id, occurred_at AS at FROM tank_event WHERE tank_id = $1
     ) items
     ${before ? 'WHERE (at, id) < ($3, $4)' : ''}
     ORDER BY at DESC, id DESC LIMIT $2`,
    before ? [tankId, q.limit + 1, before.at, before.id] : [tankId, q.limit + 1],
  );
  const page = pageOf(slots, q.limit, (s) => ({ at: new Date(s.at), id: s.id }));
  const testIds = page.items.filter((s) => s.type === 'water-test').map((s) => s.id);
  const eventIds = page.items.filter((s) => s.type === 'event').map((s) => s.id);
  const [tests, events] = await Promise.all([
    testIds.length ? m.findBy(WaterTest, { id: In(testIds) }) : [],
    eventIds.length ? m.findBy(TankEvent, { id: In(eventIds) }) : [],
  ]);
  const testById = new Map(tests.map((t) => [t.id, t]));
  const eventById = new Map(events.map((e) => [e.id, e]));
  const items = page.items.flatMap((s): TimelineRow[] => {
    const at = new Date(s.at);
    const test = testById.get(s.id);
    if (s.type === 'water-test' && test) return [{ type: 'water-test' as const, at, waterTest: test }];
    const event = eventById.get(s.id);
    return s.type === 'event' && event ? [{ type: 'event' as const, at, event }] : [];
  });
  return { items, nextCursor: page.nextCursor };
}
