import { Router } from 'express';
import type { Deps } from '@server/deps';
import { clubIdParams } from '@shared/schemas/common';
import { createTankSchema, tankListQuery, tankParams, updateTankSchema } from '@shared/schemas/tank.schema';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { loadTank, ownedBy, requireActive } from './tank-access';
import { loadTankDetail } from './tank-detail';
import { presentTank } from './tank.presenter';
import { listTanks } from './tank.queries';
import { createTank, setArchived, updateTank } from './tank.service';

export function tankRouter(deps: Pick<Deps, 'dataSource' | 'tankChanges'>): Router {
  const { dataSource } = deps;
  const router = Router();

  const list = { params: clubIdParams, query: tankListQuery };
  router.get('/clubs/:clubId/tanks', requireSignIn, validate(list), requireClubMember, async (req, res) => {
    const { params, query } = inputOf(res, list);
    const viewer = viewerOf(req);
    const ownerId = query.mine ? viewer.user.id : query.ownerId;
    const rows = await listTanks(dataSource.manager, viewer.ability, params.clubId, {
      ...(ownerId ? { ownerId } : {}),
      includeArchived: query.includeArchived ?? false,
    });
    res.json({ tanks: rows.map((r) => presentTank(r.tank, r)) });
  });

  const create = { params: clubIdParams, body: createTankSchema };
  router.post(
    '/clubs/:clubId/tanks',
    requireSignIn,
    validate(create),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, create);
      const ownerId = viewerOf(req).user.id;
      authorize(req, 'create', 'Tank', { clubId: params.clubId, ownerId });
      const tank = await dataSource.transaction((tx) => createTank(tx, params.clubId, ownerId, body));
      res.status(201).json({ tank: await loadTankDetail(dataSource.manager, tank) });
    },
  );

  const one = { params: tankParams };
  router.get(
    '/clubs/:clubId/tanks/:tankId',
    requireSignIn,
    validate(one),
    requireClubMember,
    async (req, res) => {
      const { params } = inputOf(res, one);
      const tank = await loadTank(dataSource.manager, params.clubId, params.tankId);
      authorize(req, 'read', 'Tank', ownedBy(tank));
      res.json({ tank: await loadTankDetail(dataSource.manager, tank) });
    },
  );

  const update = { params: tankParams, body: updateTankSchema };
  router.patch(
    '/clubs/:clubId/tanks/:tankId',
    requireSignIn,
    validate(update),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, update);
      const saved = await dataSource.transaction(async (tx) => {
        const tank = await loadTank(tx, params.clubId, params.tankId);
        authorize(req, 'update', 'Tank', ownedBy(tank));
        requireActive(tank);
        return updateTank(tx, deps, tank, body);
      });
      res.json({ tank: await loadTankDetail(dataSource.manager, saved) });
    },
  );

  const archiveRoute = (archived: boolean) =>
    router.post(
      `/clubs/:clubId/tanks/:tankId/${archived ? 'archive' : 'restore'}`,
      requireSignIn,
      validate(one),
      requireClubMember,
      async (req, res) => {
        const { params } = inputOf(res, one);
        const saved = await dataSource.transaction(async (tx) => {
          const tank = await loadTank(tx, params.clubId, params.tankId);
          authorize(req, 'update', 'Tank', ownedBy(tank));
          return setArchived(tx, tank, archived, viewerOf(req).user.id);
        });
        res.json({ tank: await loadTankDetail(dataSource.manager, saved) });
      },
    );
  archiveRoute(true);
  archiveRoute(false);

  return router;
}
