import { Router } from 'express';
import type { Deps } from '@server/deps';
import { csvImportSchema } from '@shared/schemas/csv-import.schema';
import { tankParams } from '@shared/schemas/tank.schema';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { loadTank, ownedBy, requireActive } from '../tanks';
import { analyzeForTank, commitImport } from './csv-import.service';

/** Path prefix of the import routes, which take a larger JSON body (the file as text). */
export const IMPORT_ROUTES_PREFIX = '/clubs/:clubId/tanks/:tankId/imports';

/** Water tests from a spreadsheet: preview what would be saved, then save it in one go. */
export function csvImportRouter(deps: Pick<Deps, 'dataSource' | 'tankChanges'>): Router {
  const { dataSource } = deps;
  const router = Router();
  const route = { params: tankParams, body: csvImportSchema };

  router.post(
    `${IMPORT_ROUTES_PREFIX}/preview`,
    requireSignIn,
    validate(route),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, route);
      const tank = await loadTank(dataSource.manager, params.clubId, params.tankId);
      authorize(req, 'create', 'WaterTest', ownedBy(tank));
      requireActive(tank);
      const { preview } = await analyzeForTank(dataSource.manager, tank, body, viewerOf(req).user.timeZone);
      res.json(preview);
    },
  );

  router.post(
    `${IMPORT_ROUTES_PREFIX}/commit`,
    requireSignIn,
    validate(route),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, route);
      const { user } = viewerOf(req);
      const result = await dataSource.transaction(async (tx) => {
        const tank = await loadTank(tx, params.clubId, params.tankId);
        authorize(req, 'create', 'WaterTest', ownedBy(tank));
        requireActive(tank);
        return commitImport(tx, deps, tank, body, user.timeZone, user.id);
      });
      res.json(result);
    },
  );

  return router;
}
