import { Router } from 'express';
import type { Deps } from '@server/deps';
import { tankParams } from '@shared/schemas/tank.schema';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn } from '../../middleware/viewer';
import { allTankEvents, allWaterTests, loadTank, ownedBy } from '../tanks';
import { exportCsv } from './csv-export';

const fileSlug = (name: string) =>
  name
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '')
    .slice(0, 40) || 'tank';

export function csvExportRouter(deps: Pick<Deps, 'dataSource'>): Router {
  const { dataSource } = deps;
  const router = Router();
  const route = { params: tankParams };

  router.get(
    '/clubs/:clubId/tanks/:tankId/export.csv',
    requireSignIn,
    validate(route),
    requireClubMember,
    async (req, res) => {
      const { params } = inputOf(res, route);
      const tank = await loadTank(dataSource.manager, params.clubId, params.tankId);
      authorize(req, 'read', 'WaterTest', ownedBy(tank));
      authorize(req, 'read', 'TankEvent', ownedBy(tank));
      const [tests, events] = await Promise.all([
        allWaterTests(dataSource.manager, tank.id),
        allTankEvents(dataSource.manager, tank.id),
      ]);
      const filename = `${fileSlug(tank.name)}-${new Date().toISOString().slice(0, 10)}.csv`;
      res
        .status(200)
        .set({
          'Content-Type': 'text/csv; charset=utf-8',
          'Content-Disposition': `attachment; filename="${filename}"`,
          'Cache-Control': 'private, no-store',
          'X-Content-Type-Options': 'nosniff',
        })
        .send(exportCsv(tests, events));
    },
  );

  return router;
}
