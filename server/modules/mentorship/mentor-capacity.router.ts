import { Router } from 'express';
import type { Deps } from '@server/deps';
import { mentorParams, updateMentorCapacitySchema } from '@shared/schemas/mentor-request.schema';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { setMentorCapacity } from './assignment.service';

/** How many mentees a mentor takes on in a club: set by the mentor themselves or by an admin. */
export function mentorCapacityRouter(deps: Pick<Deps, 'dataSource'>): Router {
  const { dataSource } = deps;
  const router = Router();

  const update = { params: mentorParams, body: updateMentorCapacitySchema };
  router.patch(
    '/clubs/:clubId/mentors/:userId/capacity',
    requireSignIn,
    validate(update),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, update);
      authorize(req, 'update', 'MentorSettings', { clubId: params.clubId, mentorId: params.userId });
      const result = await dataSource.transaction((tx) =>
        setMentorCapacity(tx, {
          clubId: params.clubId,
          mentorId: params.userId,
          capacity: body.capacity,
          actorId: viewerOf(req).user.id,
        }),
      );
      res.json(result);
    },
  );

  return router;
}
