import { Router } from 'express';
import type { Deps } from '@server/deps';
import { timelineQuery } from '@shared/schemas/tank-event.schema';
import { tankParams } from '@shared/schemas/tank.schema';
import type { TimelineItem } from '@shared/schemas/tank-views';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn } from '../../middleware/viewer';
import { photosOf } from '../photos';
import { decodeCursor } from './cursor';
import { loadTank, ownedBy } from './tank-access';
import { presentTankEvent } from './tank-event.presenter';
import { timelinePage } from './timeline.queries';
import { presentWaterTest } from './water-test.presenter';

/** Water tests and events of one tank, newest first, one page at a time. */
export function timelineRouter(deps: Pick<Deps, 'dataSource'>): Router {
  const { dataSource } = deps;
  const router = Router();

  const route = { params: tankParams, query: timelineQuery };
  router.get(
    '/clubs/:clubId/tanks/:tankId/timeline',
    requireSignIn,
    validate(route),
    requireClubMember,
    async (req, res) => {
      const { params, query } = inputOf(res, route);
      const tank = await loadTank(dataSource.manager, params.clubId, params.tankId);
      authorize(req, 'read', 'WaterTest', ownedBy(tank));
      authorize(req, 'read', 'TankEvent', ownedBy(tank));
      const page = await timelinePage(dataSource.manager, tank.id, {
        limit: query.limit,
        before: decodeCursor(query.before),
      });
      const photos = await photosOf(dataSource.manager, tank.clubId, {
        waterTestIds: page.items.flatMap((i) => (i.type === 'water-test' ? [i.waterTest.id] : [])),
        eventIds: page.items.flatMap((i) => (i.type === 'event' ? [i.event.id] : [])),
      });
      const items = page.items.map((i): TimelineItem =>
        i.type === 'water-test'
          ? { type: 'water-test', at: i.at.toISOString(), waterTest: presentWaterTest(i.waterTest, photos) }
          : { type: 'event', at: i.at.toISOString(), event: presentTankEvent(i.event, photos) },
      );
      res.json({ items, nextCursor: page.nextCursor });
    },
  );

  return router;
}
