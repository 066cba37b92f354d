import { Router } from 'express';
import type { EntityManager } from 'typeorm';
import type { Deps } from '@server/deps';
import {
  createTankEventSchema,
  tankEventListQuery,
  tankEventParams,
  updateTankEventSchema,
} from '@shared/schemas/tank-event.schema';
import { tankParams } from '@shared/schemas/tank.schema';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { photosOf, removePhotoFiles } from '../photos';
import { decodeCursor } from './cursor';
import { loadTank, ownedBy, requireActive } from './tank-access';
import { findTankEvent, tankEventPage } from './tank-event.queries';
import { presentTankEvent } from './tank-event.presenter';
import { createTankEvent, deleteTankEvent, updateTankEvent } from './tank-event.service';

/** Timeline entries other than water tests: water changes, doses, feeding, equipment, animals, observations. */
export function tankEventRouter(deps: Pick<Deps, 'dataSource' | 'config'>): Router {
  const { dataSource } = deps;
  const { uploadsDir } = deps.config;
  const router = Router();
  const base = '/clubs/:clubId/tanks/:tankId/events';

  const loadEvent = async (manager: EntityManager, tankId: string, eventId: string) => {
    const event = await findTankEvent(manager, tankId, eventId);
    if (!event) throw errors.notFound('That entry');
    return event;
  };

  const list = { params: tankParams, query: tankEventListQuery };
  router.get(base, requireSignIn, validate(list), requireClubMember, async (req, res) => {
    const { params, query } = inputOf(res, list);
    const tank = await loadTank(dataSource.manager, params.clubId, params.tankId);
    authorize(req, 'read', 'TankEvent', ownedBy(tank));
    const page = await tankEventPage(dataSource.manager, tank.id, {
      ...query,
      before: decodeCursor(query.before),
    });
    const photos = await photosOf(dataSource.manager, tank.clubId, { eventIds: page.items.map((e) => e.id) });
    res.json({ items: page.items.map((e) => presentTankEvent(e, photos)), nextCursor: page.nextCursor });
  });

  const create = { params: tankParams, body: createTankEventSchema };
  router.post(base, requireSignIn, validate(create), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, create);
    const event = await dataSource.transaction(async (tx) => {
      const tank = await loadTank(tx, params.clubId, params.tankId);
      authorize(req, 'create', 'TankEvent', ownedBy(tank));
      requireActive(tank);
      return createTankEvent(tx, tank, body, viewerOf(req).user.id);
    });
    res.status(201).json({ event: presentTankEvent(event, () => []) });
  });

  const one = { params: tankEventParams };
  const update = { params: tankEventParams, body: updateTankEventSchema };
  router.patch(`${base}/:eventId`, requireSignIn, validate(update), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, update);
    const event = await dataSource.transaction(async (tx) => {
      const tank = await loadTank(tx, params.clubId, params.tankId);
      authorize(req, 'update', 'TankEvent', ownedBy(tank));
      requireActive(tank);
      return updateTankEvent(tx, tank, await loadEvent(tx, tank.id, params.eventId), body);
    });
    const photos = await photosOf(dataSource.manager, params.clubId, { eventIds: [event.id] });
    res.json({ event: presentTankEvent(event, photos) });
  });

  router.delete(`${base}/:eventId`, requireSignIn, validate(one), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, one);
    const photoKeys = await dataSource.transaction(async (tx) => {
      const tank = await loadTank(tx, params.clubId, params.tankId);
      authorize(req, 'delete', 'TankEvent', ownedBy(tank));
      requireActive(tank);
      return deleteTankEvent(tx, tank, await loadEvent(tx, tank.id, params.eventId), viewerOf(req).user.id);
    });
    await removePhotoFiles(uploadsDir, photoKeys);
    res.status(204).end();
  });

  return router;
}
