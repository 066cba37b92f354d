import { Router } from 'express';
import type { Deps } from '@server/deps';
import { clubIdParams } from '@shared/schemas/common';
import { deskQuery } from '@shared/schemas/desk.schema';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { buildDesk } from './desk.service';

export function deskRouter(deps: Pick<Deps, 'dataSource'>): Router {
  const router = Router();
  const desk = { params: clubIdParams, query: deskQuery };
  router.get('/clubs/:clubId/desk', requireSignIn, validate(desk), requireClubMember, async (req, res) => {
    const { params, query } = inputOf(res, desk);
    const viewer = viewerOf(req);
    const role = viewer.memberships.find((m) => m.clubId === params.clubId)?.role;
    // The desk is for people who watch other people's tanks; a member's own tanks are on their tank list.
    if (role === 'member') throw errors.forbidden('The mentor desk is for mentors and club admins.');
    res.json(
      await buildDesk(deps.dataSource.manager, {
        clubId: params.clubId,
        viewerId: viewer.user.id,
        ability: viewer.ability,
        filters: query,
      }),
    );
  });
  return router;
}
