import { Router } from 'express';
import type { Deps } from '@server/deps';
import { assignmentParams, createAssignmentSchema } from '@shared/schemas/club.schema';
import { clubIdParams } from '@shared/schemas/common';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { whereAllowed } from '../access';
import { audit } from '../audit';
import { assignMentor } from './assignment.service';
import { MentorAssignment } from './mentor-assignment.entity';

export const presentAssignment = (a: MentorAssignment) => ({
  id: a.id,
  clubId: a.clubId,
  mentorId: a.mentorId,
  menteeId: a.menteeId,
  startedAt: a.startedAt.toISOString(),
  endedAt: a.endedAt?.toISOString() ?? null,
});

export function assignmentRouter(deps: Pick<Deps, 'dataSource' | 'notify'>): Router {
  const { dataSource } = deps;
  const router = Router();

  router.get('/clubs/:clubId/mentor-assignments', requireSignIn, validate({ params: clubIdParams }), requireClubMember, async (req, res) => {
    const clubId = req.params.clubId as string;
    const qb = dataSource.getRepository(MentorAssignment).createQueryBuilder('a').where('a.club_id = :clubId', { clubId });
    whereAllowed(qb, viewerOf(req).ability, 'read', 'MentorAssignment', { clubId: 'a.club_id', mentorId: 'a.mentor_id', menteeId: 'a.mentee_id' });
    const rows = await qb.orderBy('a.started_at', 'DESC').getMany();
    res.json({ assignments: rows.map(presentAssignment) });
  });

  const create = { params: clubIdParams, body: createAssignmentSchema };
  router.post('/clubs/:clubId/mentor-assignments', requireSignIn, validate(create), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, create);
    authorize(req, 'create', 'MentorAssignment', { clubId: params.clubId, ...body });
    const { assignment } = await dataSource.transaction((tx) => assignMentor(tx, deps, { clubId: params.clubId, ...body, actorId: viewerOf(req).user.id }));
    res.status(201).json({ assignment: presentAssignment(assignment) });
  });

  const one = { params: assignmentParams };
  router.post('/clubs/:clubId/mentor-assignments/:assignmentId/end', requireSignIn, validate(one), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, one);
    const row = await dataSource.getRepository(MentorAssignment).findOneBy({ id: params.assignmentId, clubId: params.clubId });
    if (!row) throw errors.notFound('That assignment');
    authorize(req, 'update', 'MentorAssignment', row);
    if (!row.endedAt) {
      row.endedAt = new Date();
      await dataSource.getRepository(MentorAssignment).update({ id: row.id }, { endedAt: row.endedAt });
      await audit(dataSource.manager, { actorId: viewerOf(req).user.id, clubId: row.clubId, action: 'mentor-assignment.ended', targetType: 'MentorAssignment', targetId: row.id });
    }
    res.json({ assignment: presentAssignment(row) });
  });

  return router;
}
