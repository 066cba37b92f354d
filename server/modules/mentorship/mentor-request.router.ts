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
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { presentAssignment } from './assignment.presenter';
import {
  acceptMentorRequest,
  createMentorRequest,
  declineMentorRequest,
  lockOpenRequest,
  myMentorRequest,
  presentRequests,
} from './mentor-request.service';
import { mentorRequestsOf } from './mentorship.queries';

export function mentorRequestRouter(deps: Pick<Deps, 'dataSource' | 'notify'>): Router {
  const { dataSource } = deps;
  const router = Router();

  const create = { params: clubIdParams, body: createMentorRequestSchema };
  router.post(
    '/clubs/:clubId/mentor-requests',
    requireSignIn,
    validate(create),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, create);
      const { user } = viewerOf(req);
      authorize(req, 'create', 'MentorRequest', { clubId: params.clubId, requesterId: user.id });
      const row = await dataSource.transaction((tx) =>
        createMentorRequest(tx, deps, { clubId: params.clubId, requester: user, ...body }),
      );
      res.status(201).json({ request: (await presentRequests(dataSource.manager, [row]))[0] });
    },
  );

  const list = { params: clubIdParams, query: listMentorRequestsQuery };
  router.get(
    '/clubs/:clubId/mentor-requests',
    requireSignIn,
    validate(list),
    requireClubMember,
    async (req, res) => {
      const { params, query } = inputOf(res, list);
      // The club's queue of requests is for the people who answer them.
      authorize(req, 'update', 'MentorRequest', { clubId: params.clubId, requesterId: '' });
      const rows = await mentorRequestsOf(
        dataSource.manager,
        viewerOf(req).ability,
        params.clubId,
        query.state,
      );
      res.json({ requests: await presentRequests(dataSource.manager, rows) });
    },
  );

  router.get(
    '/clubs/:clubId/mentor-requests/mine',
    requireSignIn,
    validate({ params: clubIdParams }),
    requireClubMember,
    async (req, res) => {
      const { clubId } = inputOf(res, { params: clubIdParams }).params;
      const { user } = viewerOf(req);
      authorize(req, 'read', 'MentorRequest', { clubId, requesterId: user.id });
      res.json(await myMentorRequest(dataSource.manager, clubId, user.id));
    },
  );

  const accept = { params: mentorRequestParams, body: acceptMentorRequestSchema };
  router.post(
    '/clubs/:clubId/mentor-requests/:requestId/accept',
    requireSignIn,
    validate(accept),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, accept);
      authorize(req, 'update', 'MentorRequest', { clubId: params.clubId, requesterId: '' });
      const actorId = viewerOf(req).user.id;
      const result = await dataSource.transaction(async (tx) => {
        const request = await lockOpenRequest(tx, params.clubId, params.requestId);
        authorize(req, 'update', 'MentorRequest', request);
        return acceptMentorRequest(tx, deps, { request, mentorId: body.mentorId, actorId });
      });
      res.json({
        request: (await presentRequests(dataSource.manager, [result.request]))[0],
        assignment: presentAssignment(result.assignment),
      });
    },
  );

  const decline = { params: mentorRequestParams, body: declineMentorRequestSchema };
  router.post(
    '/clubs/:clubId/mentor-requests/:requestId/decline',
    requireSignIn,
    validate(decline),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, decline);
      authorize(req, 'update', 'MentorRequest', { clubId: params.clubId, requesterId: '' });
      const row = await dataSource.transaction(async (tx) => {
        const request = await lockOpenRequest(tx, params.clubId, params.requestId);
        authorize(req, 'update', 'MentorRequest', request);
        return declineMentorRequest(tx, deps, {
          request,
          actorId: viewerOf(req).user.id,
          reason: body.reason,
        });
      });
      res.json({ request: (await presentRequests(dataSource.manager, [row]))[0] });
    },
  );

  return router;
}
