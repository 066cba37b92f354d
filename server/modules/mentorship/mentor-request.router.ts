import { Router } from 'express';
import type { Deps } from '@server/deps';
import { clubIdParams } from '@shared/schemas/common';
import {
  acceptMentorRequestSchema,
  createMentorRequestSchema,
  declineMentorRequestSchema,
  listMentorRequestsQuery,
  mentorRequestParams,
} from '@shared/schemas/mentor-request.schema';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { whereAllowed } from '../access';
import { Membership } from '../clubs';
import { presentAssignment } from './assignment.router';
import { assignMentor } from './assignment.service';
import { MentorRequest } from './mentor-request.entity';
import { createMentorRequest, declineMentorRequest, lockOpenRequest, myMentorRequest, presentRequests } from './mentor-request.service';

export function mentorRequestRouter(deps: Pick<Deps, 'dataSource' | 'notify'>): Router {
  const { dataSource } = deps;
  const router = Router();

  const create = { params: clubIdParams, body: createMentorRequestSchema };
  router.post('/clubs/:clubId/mentor-requests', requireSignIn, validate(create), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, create);
    const { user } = viewerOf(req);
    authorize(req, 'create', 'MentorRequest', { clubId: params.clubId, requesterId: user.id });
    const row = await dataSource.transaction((tx) => createMentorRequest(tx, deps, { clubId: params.clubId, requester: user, ...body }));
    res.status(201).json({ request: (await presentRequests(dataSource.manager, [row]))[0] });
  });

  const list = { params: clubIdParams, query: listMentorRequestsQuery };
  router.get('/clubs/:clubId/mentor-requests', requireSignIn, validate(list), requireClubMember, async (req, res) => {
    const { params, query } = inputOf(res, list);
    const { ability } = viewerOf(req);
    // The club's queue of requests is for the people who answer them.
    authorize(req, 'update', 'MentorRequest', { clubId: params.clubId, requesterId: '' });
    const qb = dataSource
      .getRepository(MentorRequest)
      .createQueryBuilder('r')
      .where('r.club_id = :clubId AND r.state = :state', { clubId: params.clubId, state: query.state });
    whereAllowed(qb, ability, 'read', 'MentorRequest', { clubId: 'r.club_id', requesterId: 'r.requester_id' });
    const rows = await qb.orderBy('r.created_at', query.state === 'open' ? 'ASC' : 'DESC').limit(200).getMany();
    res.json({ requests: await presentRequests(dataSource.manager, rows) });
  });

  router.get('/clubs/:clubId/mentor-requests/mine', requireSignIn, validate({ params: clubIdParams }), requireClubMember, async (req, res) => {
    const clubId = req.params.clubId as string;
    const { user } = viewerOf(req);
    authorize(req, 'read', 'MentorRequest', { clubId, requesterId: user.id });
    res.json(await myMentorRequest(dataSource.manager, clubId, user.id));
  });

  const accept = { params: mentorRequestParams, body: acceptMentorRequestSchema };
  router.post('/clubs/:clubId/mentor-requests/:requestId/accept', requireSignIn, validate(accept), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, accept);
    authorize(req, 'update', 'MentorRequest', { clubId: params.clubId, requesterId: '' });
    const actorId = viewerOf(req).user.id;
    const result = await dataSource.transaction(async (tx) => {
      const request = await lockOpenRequest(tx, params.clubId, params.requestId);
      authorize(req, 'update', 'MentorRequest', request);
      const mentorId = body.mentorId ?? request.preferredMentorId;
      if (!mentorId) throw errors.badRequest('Choose a mentor for this member.', [{ path: 'mentorId', message: 'Choose a mentor.' }]);
      const requester = await tx.findOneBy(Membership, { clubId: params.clubId, userId: request.requesterId });
      if (requester?.status !== 'active') throw errors.conflict('That member is no longer active in the club. Decline the request instead.');
      const { assignment } = await assignMentor(tx, deps, { clubId: params.clubId, mentorId, menteeId: request.requesterId, actorId });
      return { assignment, request: await tx.findOneByOrFail(MentorRequest, { id: request.id }) };
    });
    res.json({ request: (await presentRequests(dataSource.manager, [result.request]))[0], assignment: presentAssignment(result.assignment) });
  });

  const decline = { params: mentorRequestParams, body: declineMentorRequestSchema };
  router.post('/clubs/:clubId/mentor-requests/:requestId/decline', requireSignIn, validate(decline), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, decline);
    authorize(req, 'update', 'MentorRequest', { clubId: params.clubId, requesterId: '' });
    const row = await dataSource.transaction(async (tx) => {
      const request = await lockOpenRequest(tx, params.clubId, params.requestId);
      authorize(req, 'update', 'MentorRequest', request);
      return declineMentorRequest(tx, deps, { request, actorId: viewerOf(req).user.id, reason: body.reason });
    });
    res.json({ request: (await presentRequests(dataSource.manager, [row]))[0] });
  });

  return router;
}
