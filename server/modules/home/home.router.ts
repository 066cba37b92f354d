import { Router } from 'express';
import type { Deps } from '@server/deps';
import { clubIdParams } from '@shared/schemas/common';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { presentHome } from './home.presenter';
import { loadHome } from './home.queries';

/** The viewer's home in one club: their own tanks with what to test today, their questions, their mentor's good news. */
export function homeRouter(deps: Pick<Deps, 'dataSource'>): Router {
  const router = Router();
  const home = { params: clubIdParams };
  router.get('/clubs/:clubId/home', requireSignIn, validate(home), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, home);
    const viewer = viewerOf(req);
    authorize(req, 'read', 'Club', { id: params.clubId });
    const now = new Date();
    const data = await loadHome(deps.dataSource.manager, {
      ability: viewer.ability,
      clubId: params.clubId,
      viewerId: viewer.user.id,
      now,
    });
    res.json(presentHome(data, now));
  });
  return router;
}
