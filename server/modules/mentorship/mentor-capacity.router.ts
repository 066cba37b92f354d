import { Router } from 'express';
import { IsNull } from 'typeorm';
import type { Deps } from '@server/deps';
import { mentorParams, updateMentorCapacitySchema } from '@shared/schemas/mentor-request.schema';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { audit } from '../audit';
import { Membership } from '../clubs';
import { MentorAssignment } from './mentor-assignment.entity';

/** How many mentees a mentor takes on in a club: set by the mentor themselves or by an admin. */
export function mentorCapacityRouter(deps: Pick<Deps, 'dataSource'>): Router {
  const { dataSource } = deps;
  const router = Router();

  const update = { params: mentorParams, body: updateMentorCapacitySchema };
  router.patch('/clubs/:clubId/mentors/:userId/capacity', requireSignIn, validate(update), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, update);
    authorize(req, 'update', 'MentorSettings', { clubId: params.clubId, mentorId: params.userId });
    const result = await dataSource.transaction(async (tx) => {
      const m = await tx.findOne(Membership, { where: { clubId: params.clubId, userId: params.userId }, lock: { mode: 'pessimistic_write' } });
      if (!m) throw errors.notFound('That mentor');
      if (m.role === 'member' || m.status !== 'active') throw errors.conflict('Only active mentors and admins take on mentees.');
      await tx.update(Membership, { id: m.id }, { mentorCapacity: body.capacity });
      await audit(tx, {
        actorId: viewerOf(req).user.id,
        clubId: params.clubId,
        action: 'mentor.capacity-changed',
        targetType: 'Membership',
        targetId: m.id,
        details: { mentorId: params.userId, from: m.mentorCapacity, to: body.capacity },
      });
      const menteeCount = await tx.countBy(MentorAssignment, { clubId: params.clubId, mentorId: params.userId, endedAt: IsNull() });
      return { mentorId: params.userId, capacity: body.capacity, menteeCount };
    });
    res.json(result);
  });

  return router;
}
