import { Router } from 'express';
import type { Deps } from '@server/deps';
import {
  createLivestockSchema,
  livestockListQuery,
  livestockParams,
  tankParams,
  updateLivestockSchema,
} from '@shared/schemas/tank.schema';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { removePhotoFiles } from '../photos';
import { livestockOf } from './livestock.queries';
import { addLivestock, deleteLivestock, editLivestock, loadLivestock } from './livestock.service';
import { loadTank, ownedBy, requireActive } from './tank-access';
import { presentLivestock } from './tank.presenter';

/** Animals in a tank. Changing them is changing the tank, so the Tank rules apply. */
export function livestockRouter(deps: Pick<Deps, 'dataSource' | 'config' | 'tankChanges'>): Router {
  const { dataSource } = deps;
  const { uploadsDir } = deps.config;
  const router = Router();
  const base = '/clubs/:clubId/tanks/:tankId/livestock';

  const list = { params: tankParams, query: livestockListQuery };
  router.get(base, requireSignIn, validate(list), requireClubMember, async (req, res) => {
    const { params, query } = inputOf(res, list);
    const tank = await loadTank(dataSource.manager, params.clubId, params.tankId);
    authorize(req, 'read', 'Tank', ownedBy(tank));
    const rows = await livestockOf(dataSource.manager, tank.id, query);
    res.json({ livestock: rows.map(presentLivestock) });
  });

  const create = { params: tankParams, body: createLivestockSchema };
  router.post(base, requireSignIn, validate(create), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, create);
    const row = await dataSource.transaction(async (tx) => {
      const tank = await loadTank(tx, params.clubId, params.tankId);
      authorize(req, 'update', 'Tank', ownedBy(tank));
      requireActive(tank);
      return addLivestock(tx, deps, tank, body, viewerOf(req).user.id);
    });
    res.status(201).json({ livestock: presentLivestock(row) });
  });

  const update = { params: livestockParams, body: updateLivestockSchema };
  router.patch(
    `${base}/:livestockId`,
    requireSignIn,
    validate(update),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, update);
      const row = await dataSource.transaction(async (tx) => {
        const tank = await loadTank(tx, params.clubId, params.tankId);
        authorize(req, 'update', 'Tank', ownedBy(tank));
        requireActive(tank);
        return editLivestock(
          tx,
          deps,
          await loadLivestock(tx, tank.id, params.livestockId),
          body,
          viewerOf(req).user.id,
        );
      });
      res.json({ livestock: presentLivestock(row) });
    },
  );

  /** For an entry made by mistake: its timeline entries go with it. Animals that left are recorded with removedOn instead. */
  const one = { params: livestockParams };
  router.delete(`${base}/:livestockId`, requireSignIn, validate(one), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, one);
    const photoKeys = await dataSource.transaction(async (tx) => {
      const tank = await loadTank(tx, params.clubId, params.tankId);
      authorize(req, 'update', 'Tank', ownedBy(tank));
      requireActive(tank);
      return deleteLivestock(tx, deps, await loadLivestock(tx, tank.id, params.livestockId));
    });
    await removePhotoFiles(uploadsDir, photoKeys);
    res.status(204).end();
  });

  return router;
}
