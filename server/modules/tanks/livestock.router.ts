import { tankChanged } from '../concerns/tank-changed';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { createLivestockSchema, livestockListQuery, livestockParams, tankParams, updateLivestockSchema } from '../../../shared/schemas/tank.schema';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { removePhotoFiles } from '../photos/photo-storage';
import { storageKeysOf } from '../photos/photo.queries';
import { Livestock } from './livestock.entity';
import { addLivestock, editLivestock, loadLivestock } from './livestock.service';
import { loadTank, ownedBy, requireActive } from './tank-access';
import { TankEvent } from './tank-event.entity';
import { presentLivestock } from './tank.presenter';

/** Animals in a tank. Changing them is changing the tank, so the Tank rules apply. */
export function livestockRouter(deps: { dataSource: DataSource; uploadsDir: string }): Router {
  const { dataSource, uploadsDir } = deps;
  const router = Router();
  const base = '/clubs/:clubId/tanks/:tankId/livestock';

  const list = { params: tankParams, query: livestockListQuery };
  router.get(base, requireSignIn, validate(list), requireClubMember, async (req, res) => {
    const { params, query } = inputOf(res, list);
    const tank = await loadTank(dataSource.manager, params.clubId, params.tankId);
    authorize(req, 'read', 'Tank', ownedBy(tank));
    const qb = dataSource.getRepository(Livestock).createQueryBuilder('l').where('l.tank_id = :tankId', { tankId: tank.id });
    if (!query.includeRemoved) qb.andWhere('l.removed_on IS NULL');
    const rows = await qb.orderBy('l.added_on', 'ASC').addOrderBy('l.id', 'ASC').getMany();
    res.json({ livestock: rows.map(presentLivestock) });
  });

  const create = { params: tankParams, body: createLivestockSchema };
  router.post(base, requireSignIn, validate(create), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, create);
    const row = await dataSource.transaction(async (tx) => {
      const tank = await loadTank(tx, params.clubId, params.tankId);
      authorize(req, 'update', 'Tank', ownedBy(tank));
      requireActive(tank);
      return addLivestock(tx, tank, body, viewerOf(req).user.id);
    });
    res.status(201).json({ livestock: presentLivestock(row) });
  });

  const update = { params: livestockParams, body: updateLivestockSchema };
  router.patch(`${base}/:livestockId`, requireSignIn, validate(update), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, update);
    const row = await dataSource.transaction(async (tx) => {
      const tank = await loadTank(tx, params.clubId, params.tankId);
      authorize(req, 'update', 'Tank', ownedBy(tank));
      requireActive(tank);
      return editLivestock(tx, await loadLivestock(tx, tank.id, params.livestockId), body, viewerOf(req).user.id);
    });
    res.json({ livestock: presentLivestock(row) });
  });

  /** For an entry made by mistake: its timeline entries go with it. Animals that left are recorded with removedOn instead. */
  const one = { params: livestockParams };
  router.delete(`${base}/:livestockId`, requireSignIn, validate(one), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, one);
    const photoKeys = await dataSource.transaction(async (tx) => {
      const tank = await loadTank(tx, params.clubId, params.tankId);
      authorize(req, 'update', 'Tank', ownedBy(tank));
      requireActive(tank);
      const row = await loadLivestock(tx, tank.id, params.livestockId);
      const events = await tx.find(TankEvent, { where: { livestockId: row.id }, select: { id: true } });
      const keys = await storageKeysOf(tx, { eventIds: events.map((e) => e.id) });
      await tx.delete(Livestock, { id: row.id });
      await tankChanged(tx, tank.id);
      return keys;
    });
    await removePhotoFiles(uploadsDir, photoKeys);
    res.status(204).end();
  });

  return router;
}
