import { Router } from 'express';
import type { EntityManager } from 'typeorm';
import type { Deps } from '@server/deps';
import { tankParams } from '@shared/schemas/tank.schema';
import type { WaterTestDetailView } from '@shared/schemas/tank-views';
import {
  createWaterTestSchema,
  updateWaterTestSchema,
  waterTestListQuery,
  waterTestParams,
} from '@shared/schemas/water-test.schema';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { photosOf, removePhotoFiles } from '../photos';
import { decodeCursor } from './cursor';
import { loadTank, ownedBy, requireActive } from './tank-access';
import { lastKnownBefore } from './water-test.context';
import { findWaterTest, waterTestPage } from './water-test.queries';
import { presentWaterTest } from './water-test.presenter';
import { createWaterTest, deleteWaterTest, updateWaterTest } from './water-test.service';

/**
 * Water tests of one tank. Deleting is for good (a mistyped test should vanish from charts and evaluation) and only
 * for the tank's owner; archiving the tank is how history is kept.
 */
export function waterTestRouter(deps: Pick<Deps, 'dataSource' | 'config' | 'tankChanges'>): Router {
  const { dataSource } = deps;
  const { uploadsDir } = deps.config;
  const router = Router();
  const base = '/clubs/:clubId/tanks/:tankId/water-tests';

  const loadTest = async (manager: EntityManager, tankId: string, testId: string) => {
    const test = await findWaterTest(manager, tankId, testId);
    if (!test) throw errors.notFound('That water test');
    return test;
  };

  const list = { params: tankParams, query: waterTestListQuery };
  router.get(base, requireSignIn, validate(list), requireClubMember, async (req, res) => {
    const { params, query } = inputOf(res, list);
    const tank = await loadTank(dataSource.manager, params.clubId, params.tankId);
    authorize(req, 'read', 'WaterTest', ownedBy(tank));
    const page = await waterTestPage(dataSource.manager, tank.id, {
      ...query,
      before: decodeCursor(query.before),
    });
    const photos = await photosOf(dataSource.manager, tank.clubId, {
      waterTestIds: page.items.map((t) => t.id),
    });
    res.json({ items: page.items.map((t) => presentWaterTest(t, photos)), nextCursor: page.nextCursor });
  });

  const create = { params: tankParams, body: createWaterTestSchema };
  router.post(base, requireSignIn, validate(create), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, create);
    const saved = await dataSource.transaction(async (tx) => {
      const tank = await loadTank(tx, params.clubId, params.tankId);
      authorize(req, 'create', 'WaterTest', ownedBy(tank));
      requireActive(tank);
      return createWaterTest(tx, deps, tank, body, viewerOf(req).user.id);
    });
    res.status(201).json({ waterTest: presentWaterTest(saved.test, () => []), warnings: saved.warnings });
  });

  const one = { params: waterTestParams };
  router.get(`${base}/:testId`, requireSignIn, validate(one), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, one);
    const tank = await loadTank(dataSource.manager, params.clubId, params.tankId);
    authorize(req, 'read', 'WaterTest', ownedBy(tank));
    const test = await loadTest(dataSource.manager, tank.id, params.testId);
    const photos = await photosOf(dataSource.manager, tank.clubId, { waterTestIds: [test.id] });
    const lastKnown = await lastKnownBefore(dataSource.manager, tank.id, {
      takenAt: test.takenAt.toISOString(),
      id: test.id,
    });
    const view: WaterTestDetailView = { waterTest: presentWaterTest(test, photos), lastKnown };
    res.json(view);
  });

  const update = { params: waterTestParams, body: updateWaterTestSchema };
  router.patch(`${base}/:testId`, requireSignIn, validate(update), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, update);
    const saved = await dataSource.transaction(async (tx) => {
      const tank = await loadTank(tx, params.clubId, params.tankId);
      authorize(req, 'update', 'WaterTest', ownedBy(tank));
      requireActive(tank);
      return updateWaterTest(tx, deps, tank, await loadTest(tx, tank.id, params.testId), body);
    });
    const photos = await photosOf(dataSource.manager, params.clubId, { waterTestIds: [saved.test.id] });
    res.json({ waterTest: presentWaterTest(saved.test, photos), warnings: saved.warnings });
  });

  router.delete(`${base}/:testId`, requireSignIn, validate(one), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, one);
    const photoKeys = await dataSource.transaction(async (tx) => {
      const tank = await loadTank(tx, params.clubId, params.tankId);
      authorize(req, 'delete', 'WaterTest', ownedBy(tank));
      requireActive(tank);
      return deleteWaterTest(
        tx,
        deps,
        tank,
        await loadTest(tx, tank.id, params.testId),
        viewerOf(req).user.id,
      );
    });
    await removePhotoFiles(uploadsDir, photoKeys);
    res.status(204).end();
  });

  return router;
}
