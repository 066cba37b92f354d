import { Router } from 'express';
import type { Deps } from '@server/deps';
import { asSubject } from '@shared/abilities';
import { membershipParams, updateMembershipSchema } from '@shared/schemas/club.schema';
import { clubIdParams } from '@shared/schemas/common';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { presentClub, presentMember, presentMembership } from './club.presenter';
import { findClub, findMembership, membersOf, mentorLoads } from './club.queries';
import { changeMembership } from './club.service';

export function clubRouter(deps: Pick<Deps, 'dataSource'>): Router {
  const { dataSource } = deps;
  const router = Router();
  const inClub = [requireSignIn, validate({ params: clubIdParams }), requireClubMember];

  router.get('/clubs/:clubId', ...inClub, async (req, res) => {
    const { clubId } = inputOf(res, { params: clubIdParams }).params;
    authorize(req, 'read', 'Club', { id: clubId });
    const club = await findClub(dataSource.manager, clubId);
    if (!club) throw errors.notFound('That club');
    res.json({ club: presentClub(club) });
  });

  router.get('/clubs/:clubId/members', ...inClub, async (req, res) => {
    const { ability } = viewerOf(req);
    const { clubId } = inputOf(res, { params: clubIdParams }).params;
    const withEmail = ability.can('update', asSubject('Membership', { clubId, userId: '' }));
    const [rows, loads] = await Promise.all([
      membersOf(dataSource.manager, ability, clubId),
      mentorLoads(dataSource.manager, clubId),
    ]);
    res.json({ members: rows.map((m) => presentMember(m, { withEmail, loads })) });
  });

  const update = { params: membershipParams, body: updateMembershipSchema };
  router.patch(
    '/clubs/:clubId/members/:membershipId',
    requireSignIn,
    validate(update),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, update);
      authorize(req, 'update', 'Membership', { clubId: params.clubId, userId: '' });
      const result = await dataSource.transaction(async (tx) => {
        const m = await findMembership(tx, params.clubId, params.membershipId);
        if (!m) throw errors.notFound('That membership');
        return changeMembership(tx, m, body, viewerOf(req).user.id);
      });
      res.json({ membership: presentMembership(result) });
    },
  );

  return router;
}
