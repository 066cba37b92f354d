import { Router, type Request } from 'express';
import type { EntityManager } from 'typeorm';
import type { Deps } from '@server/deps';
import { concernActionSchema, concernListQuery, concernParams, readinessChecklistSchema, signOffSchema } from '@shared/schemas/concern.schema';
import { clubIdParams, uuid } from '@shared/schemas/common';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { whereAllowed } from '../access';
import { audit } from '../audit';
import { tankForCare } from '../tanks';
import { careSummary } from './care-summary';
import { ConcernRow, TankReadiness } from './concern.entity';
import { presentConcern } from './concern.presenter';

const tankParams = clubIdParams.extend({ tankId: uuid });

/** Loads a tank of this club or answers 404 (a tank of another club does not exist for the caller). */
async function tankInClub(m: EntityManager, clubId: string, tankId: string) {
  const tank = await tankForCare(m, tankId);
  if (!tank || tank.clubId !== clubId) throw errors.notFound('That tank');
  return tank;
}

export function concernRouter(deps: Pick<Deps, 'dataSource' | 'tankChanges'>): Router {
  const { dataSource, tankChanges } = deps;
  const router = Router();
  const guard = [requireSignIn];

  const list = { params: tankParams, query: concernListQuery };
  router.get('/clubs/:clubId/tanks/:tankId/concerns', ...guard, validate(list), requireClubMember, async (req, res) => {
    const { params, query } = inputOf(res, list);
    const tank = await tankInClub(dataSource.manager, params.clubId, params.tankId);
    authorize(req, 'read', 'Tank', tank);
    const qb = dataSource.getRepository(ConcernRow).createQueryBuilder('c').where('c.tank_id = :tankId', { tankId: tank.id });
    whereAllowed(qb, viewerOf(req).ability, 'read', 'Concern', { clubId: 'c.club_id', ownerId: 'c.owner_id' });
    if (query.status === 'live') qb.andWhere("c.status <> 'resolved'");
    const rows = await qb.orderBy('c.raised_at', 'DESC').limit(500).getMany();
    res.json({ concerns: rows.map(presentConcern) });
  });

  router.get('/clubs/:clubId/tanks/:tankId/care', ...guard, validate({ params: tankParams }), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, { params: tankParams });
    const tank = await tankInClub(dataSource.manager, params.clubId, params.tankId);
    authorize(req, 'read', 'Tank', tank);
    res.json(await careSummary(dataSource.manager, tank));
  });

  const act = { params: concernParams, body: concernActionSchema };
  const changeConcern = (action: 'acknowledge' | 'resolve') => async (req: Request, res: import('express').Response) => {
    const { params, body } = inputOf(res, act);
    const actorId = viewerOf(req).user.id;
    const row = await dataSource.transaction(async (tx) => {
      const c = await tx.createQueryBuilder(ConcernRow, 'c').setLock('pessimistic_write').where('c.id = :id AND c.club_id = :clubId', { id: params.concernId, clubId: params.clubId }).getOne();
      if (!c) throw errors.notFound('That concern');
      authorize(req, action, 'Concern', c);
      if (c.status === 'resolved') throw errors.conflict('That concern is already resolved.');
      const now = new Date();
      const patch =
        action === 'acknowledge'
          ? { status: 'acknowledged' as const, acknowledgedById: actorId, acknowledgedAt: now, acknowledgeNote: body.note || null }
          : { status: 'resolved' as const, resolvedById: actorId, resolvedAt: now, resolveNote: body.note || null, resolvedByTest: false };
      await tx.update(ConcernRow, { id: c.id }, patch);
      await audit(tx, { actorId, clubId: c.clubId, action: `concern.${action}d`, targetType: 'Concern', targetId: c.id });
      await tankChanges.publish(tx, c.tankId, 'concern');
      return { ...c, ...patch };
    });
    res.json({ concern: presentConcern(row) });
  };
  router.post('/clubs/:clubId/concerns/:concernId/acknowledge', ...guard, validate(act), requireClubMember, changeConcern('acknowledge'));
  router.post('/clubs/:clubId/concerns/:concernId/resolve', ...guard, validate(act), requireClubMember, changeConcern('resolve'));

  const checklist = { params: tankParams, body: readinessChecklistSchema };
  router.put('/clubs/:clubId/tanks/:tankId/readiness', ...guard, validate(checklist), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, checklist);
    const tank = await tankInClub(dataSource.manager, params.clubId, params.tankId);
    authorize(req, 'update', 'Tank', tank);
    await dataSource.getRepository(TankReadiness).upsert({ tankId: tank.id, ...body }, ['tankId']);
    res.json(await careSummary(dataSource.manager, tank));
  });

  const signOff = { params: tankParams, body: signOffSchema };
  router.post('/clubs/:clubId/tanks/:tankId/sign-off', ...guard, validate(signOff), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, signOff);
    const tank = await tankInClub(dataSource.manager, params.clubId, params.tankId);
    authorize(req, 'signOff', 'Tank', tank);
    const summary = await careSummary(dataSource.manager, tank);
    const missing = summary.readiness.items.filter((i) => i.key !== 'mentor-sign-off' && !i.met);
    if (missing.length) {
      throw errors.conflict(`Not ready to sign off yet: ${missing.map((i) => i.label.toLowerCase()).join('; ')}.`);
    }
    const actorId = viewerOf(req).user.id;
    await dataSource.transaction(async (tx) => {
      await tx.getRepository(TankReadiness).upsert({ tankId: tank.id, signedOffById: actorId, signedOffAt: new Date(), signOffNote: body.note }, ['tankId']);
      await audit(tx, { actorId, clubId: tank.clubId, action: 'tank.signed-off', targetType: 'Tank', targetId: tank.id });
      await tankChanges.publish(tx, tank.id, 'sign-off');
    });
    res.json(await careSummary(dataSource.manager, tank));
  });

  router.delete('/clubs/:clubId/tanks/:tankId/sign-off', ...guard, validate({ params: tankParams }), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, { params: tankParams });
    const tank = await tankInClub(dataSource.manager, params.clubId, params.tankId);
    authorize(req, 'signOff', 'Tank', tank);
    await dataSource.transaction(async (tx) => {
      await tx.getRepository(TankReadiness).update({ tankId: tank.id }, { signedOffById: null, signedOffAt: null, signOffNote: null });
      await audit(tx, { actorId: viewerOf(req).user.id, clubId: tank.clubId, action: 'tank.sign-off-withdrawn', targetType: 'Tank', targetId: tank.id });
      await tankChanges.publish(tx, tank.id, 'sign-off');
    });
    res.json(await careSummary(dataSource.manager, tank));
  });

  return router;
}
