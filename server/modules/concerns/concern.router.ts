import { Router, type Request, type Response } from 'express';
import type { EntityManager } from 'typeorm';
import type { Deps } from '@server/deps';
import {
  concernActionSchema,
  concernListQuery,
  concernParams,
  readinessChecklistSchema,
  signOffSchema,
} from '@shared/schemas/concern.schema';
import { clubIdParams, uuid } from '@shared/schemas/common';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { tankForCare } from '../tanks';
import { careSummary } from './care-summary';
import { presentConcern } from './concern.presenter';
import { concernsOfTank, lockConcern } from './concern.queries';
import { handleConcern, saveChecklist, signOff, withdrawSignOff } from './concern.service';

const tankParams = clubIdParams.extend({ tankId: uuid });

/** Loads a tank of this club or answers 404 (a tank of another club does not exist for the caller). */
async function tankInClub(m: EntityManager, clubId: string, tankId: string) {
  const tank = await tankForCare(m, tankId);
  if (!tank || tank.clubId !== clubId) throw errors.notFound('That tank');
  return tank;
}

export function concernRouter(deps: Pick<Deps, 'dataSource' | 'tankChanges'>): Router {
  const { dataSource } = deps;
  const router = Router();
  const guard = [requireSignIn];

  const list = { params: tankParams, query: concernListQuery };
  router.get(
    '/clubs/:clubId/tanks/:tankId/concerns',
    ...guard,
    validate(list),
    requireClubMember,
    async (req, res) => {
      const { params, query } = inputOf(res, list);
      const tank = await tankInClub(dataSource.manager, params.clubId, params.tankId);
      authorize(req, 'read', 'Tank', tank);
      const rows = await concernsOfTank(dataSource.manager, viewerOf(req).ability, tank.id, query.status);
      res.json({ concerns: rows.map(presentConcern) });
    },
  );

  router.get(
    '/clubs/:clubId/tanks/:tankId/care',
    ...guard,
    validate({ params: tankParams }),
    requireClubMember,
    async (req, res) => {
      const { params } = inputOf(res, { params: tankParams });
      const tank = await tankInClub(dataSource.manager, params.clubId, params.tankId);
      authorize(req, 'read', 'Tank', tank);
      res.json(await careSummary(dataSource.manager, tank));
    },
  );

  const act = { params: concernParams, body: concernActionSchema };
  const changeConcern = (action: 'acknowledge' | 'resolve') => async (req: Request, res: Response) => {
    const { params, body } = inputOf(res, act);
    const row = await dataSource.transaction(async (tx) => {
      const c = await lockConcern(tx, params.clubId, params.concernId);
      authorize(req, action, 'Concern', c);
      return handleConcern(tx, deps, c, action, { actorId: viewerOf(req).user.id, note: body.note });
    });
    res.json({ concern: presentConcern(row) });
  };
  router.post(
    '/clubs/:clubId/concerns/:concernId/acknowledge',
    ...guard,
    validate(act),
    requireClubMember,
    changeConcern('acknowledge'),
  );
  router.post(
    '/clubs/:clubId/concerns/:concernId/resolve',
    ...guard,
    validate(act),
    requireClubMember,
    changeConcern('resolve'),
  );

  const checklist = { params: tankParams, body: readinessChecklistSchema };
  router.put(
    '/clubs/:clubId/tanks/:tankId/readiness',
    ...guard,
    validate(checklist),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, checklist);
      const tank = await tankInClub(dataSource.manager, params.clubId, params.tankId);
      authorize(req, 'update', 'Tank', tank);
      await saveChecklist(dataSource.manager, tank.id, body);
      res.json(await careSummary(dataSource.manager, tank));
    },
  );

  const signOffRoute = { params: tankParams, body: signOffSchema };
  router.post(
    '/clubs/:clubId/tanks/:tankId/sign-off',
    ...guard,
    validate(signOffRoute),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, signOffRoute);
      const tank = await tankInClub(dataSource.manager, params.clubId, params.tankId);
      authorize(req, 'signOff', 'Tank', tank);
      await dataSource.transaction((tx) =>
        signOff(tx, deps, tank, { actorId: viewerOf(req).user.id, note: body.note }),
      );
      res.json(await careSummary(dataSource.manager, tank));
    },
  );

  router.delete(
    '/clubs/:clubId/tanks/:tankId/sign-off',
    ...guard,
    validate({ params: tankParams }),
    requireClubMember,
    async (req, res) => {
      const { params } = inputOf(res, { params: tankParams });
      const tank = await tankInClub(dataSource.manager, params.clubId, params.tankId);
      authorize(req, 'signOff', 'Tank', tank);
      await dataSource.transaction((tx) => withdrawSignOff(tx, deps, tank, viewerOf(req).user.id));
      res.json(await careSummary(dataSource.manager, tank));
    },
  );

  return router;
}
