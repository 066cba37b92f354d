import { Router } from 'express';
import type { Deps } from '@server/deps';
import { assignmentParams, createAssignmentSchema } from '@shared/schemas/club.schema';
import { clubIdParams } from '@shared/schemas/common';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { presentAssignment } from './assignment.presenter';
import { assignMentor, endAssignment } from './assignment.service';
import { assignmentsOf, findAssignment } from './mentorship.queries';

export function assignmentRouter(deps: Pick<Deps, 'dataSource' | 'notify'>): Router {
  const { dataSource } = deps;
  const router = Router();

  router.get(
    '/clubs/:clubId/mentor-assignments',
    requireSignIn,
    validate({ params: clubIdParams }),
    requireClubMember,
    async (req, res) => {
      const { clubId } = inputOf(res, { params: clubIdParams }).params;
      const rows = await assignmentsOf(dataSource.manager, viewerOf(req).ability, clubId);
      res.json({ assignments: rows.map(presentAssignment) });
    },
  );

  const create = { params: clubIdParams, body: createAssignmentSchema };
  router.post(
    '/clubs/:clubId/mentor-assignments',
    requireSignIn,
    validate(create),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, create);
      authorize(req, 'create', 'MentorAssignment', { clubId: params.clubId, ...body });
      const { assignment } = await dataSource.transaction((tx) =>
        assignMentor(tx, deps, { clubId: params.clubId, ...body, actorId: viewerOf(req).user.id }),
      );
      res.status(201).json({ assignment: presentAssignment(assignment) });
    },
  );

  const one = { params: assignmentParams };
  router.post(
    '/clubs/:clubId/mentor-assignments/:assignmentId/end',
    requireSignIn,
    validate(one),
    requireClubMember,
    async (req, res) => {
      const { params } = inputOf(res, one);
      const row = await findAssignment(dataSource.manager, params.clubId, params.assignmentId);
      if (!row) throw errors.notFound('That assignment');
      authorize(req, 'update', 'MentorAssignment', row);
      res.json({
        assignment: presentAssignment(await endAssignment(dataSource.manager, row, viewerOf(req).user.id)),
      });
    },
  );

  return router;
}
