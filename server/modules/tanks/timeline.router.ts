import { Router } from 'express';
import { In } from 'typeorm';
import type { Deps } from '@server/deps';
import { timelineQuery } from '@shared/schemas/tank-event.schema';
import { tankParams } from '@shared/schemas/tank.schema';
import type { TimelineItem } from '@shared/schemas/tank-views';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn } from '../../middleware/viewer';
import { photosOf } from '../photos';
import { decodeCursor, pageOf } from './cursor';
import { loadTank, ownedBy } from './tank-access';
import { TankEvent } from './tank-event.entity';
import { presentTankEvent } from './tank-event.presenter';
import { WaterTest } from './water-test.entity';
import { presentWaterTest } from './water-test.presenter';

interface Slot {
  type: 'water-test' | 'event';
  id: string;
  at: Date;
}

/** Water tests and events of one tank, newest first, one page at a time. */
export function timelineRouter(deps: Pick<Deps, 'dataSource'>): Router {
  const { dataSource } = deps;
  const router = Router();

  const route = { params: tankParams, query: timelineQuery };
  router.get('/clubs/:clubId/tanks/:tankId/timeline', requireSignIn, validate(route), requireClubMember, async (req, res) => {
    const { params, query } = inputOf(res, route);
    const tank = await loadTank(dataSource.manager, params.clubId, params.tankId);
    authorize(req, 'read', 'WaterTest', ownedBy(tank));
    authorize(req, 'read', 'TankEvent', ownedBy(tank));
    const before = decodeCursor(query.before);
    const slots: Slot[] = await dataSource.query(
      `SELECT type, id, at FROM (
         SELECT 'water-test' AS type, id, taken_at AS at FROM water_test WHERE tank_id = $1
         UNION ALL
         SELECT 'event' AS type, id, occurred_at AS at FROM tank_event WHERE tank_id = $1
       ) items
       ${before ? 'WHERE (at, id) < ($3, $4)' : ''}
       ORDER BY at DESC, id DESC LIMIT $2`,
      before ? [tank.id, query.limit + 1, before.at, before.id] : [tank.id, query.limit + 1],
    );
    const page = pageOf(slots, query.limit, (s) => ({ at: new Date(s.at), id: s.id }));
    const testIds = page.items.filter((s) => s.type === 'water-test').map((s) => s.id);
    const eventIds = page.items.filter((s) => s.type === 'event').map((s) => s.id);
    const [tests, events, photos] = await Promise.all([
      testIds.length ? dataSource.manager.findBy(WaterTest, { id: In(testIds) }) : [],
      eventIds.length ? dataSource.manager.findBy(TankEvent, { id: In(eventIds) }) : [],
      photosOf(dataSource.manager, tank.clubId, { waterTestIds: testIds, eventIds }),
    ]);
    const testById = new Map(tests.map((t) => [t.id, t]));
    const eventById = new Map(events.map((e) => [e.id, e]));
    const items: TimelineItem[] = page.items.flatMap((s): TimelineItem[] => {
      const at = new Date(s.at).toISOString();
      const test = testById.get(s.id);
      if (s.type === 'water-test' && test) return [{ type: 'water-test', at, waterTest: presentWaterTest(test, photos) }];
      const event = eventById.get(s.id);
      return s.type === 'event' && event ? [{ type: 'event', at, event: presentTankEvent(event, photos) }] : [];
    });
    res.json({ items, nextCursor: page.nextCursor });
  });

  return router;
}
