import { Router } from 'express';
import type { Deps } from '@server/deps';
import { acceptInviteSchema } from '@shared/schemas/auth.schema';
import { createInviteSchema, inviteParams } from '@shared/schemas/club.schema';
import { clubIdParams } from '@shared/schemas/common';
import { errors } from '../../lib/app-error';
import { hashPassword } from '../../lib/passwords';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { startSignedInSession } from '../auth';
import { presentUser } from '../users';
import { findInvite, pendingInvites } from './invite.queries';
import {
  acceptInvite,
  invitePreview,
  presentInvite,
  revokeInvite,
  sendInvite,
  sendInviteAgain,
} from './invite.service';

export function inviteRouter(deps: Pick<Deps, 'dataSource' | 'mailer' | 'config' | 'rateLimits'>): Router {
  const { dataSource } = deps;
  const router = Router();
  const club = [requireSignIn, validate({ params: clubIdParams }), requireClubMember];

  router.get('/clubs/:clubId/invites', ...club, async (req, res) => {
    const { clubId } = inputOf(res, { params: clubIdParams }).params;
    authorize(req, 'read', 'Invite', { clubId });
    const rows = await pendingInvites(dataSource.manager, viewerOf(req).ability, clubId);
    res.json({ invites: rows.map(presentInvite) });
  });

  const create = { params: clubIdParams, body: createInviteSchema };
  router.post(
    '/clubs/:clubId/invites',
    requireSignIn,
    validate(create),
    requireClubMember,
    async (req, res) => {
      const { params, body } = inputOf(res, create);
      authorize(req, 'create', 'Invite', { clubId: params.clubId });
      const invite = await sendInvite(deps, {
        clubId: params.clubId,
        email: body.email,
        role: body.role,
        inviter: viewerOf(req).user,
      });
      res.status(201).json({ invite: presentInvite(invite) });
    },
  );

  const one = { params: inviteParams };
  const loadInvite = async (clubId: string, inviteId: string) => {
    const invite = await findInvite(dataSource.manager, clubId, inviteId);
    if (!invite) throw errors.notFound('That invitation');
    return invite;
  };

  router.post(
    '/clubs/:clubId/invites/:inviteId/resend',
    requireSignIn,
    validate(one),
    requireClubMember,
    async (req, res) => {
      const { params } = inputOf(res, one);
      authorize(req, 'update', 'Invite', { clubId: params.clubId });
      const invite = await sendInviteAgain(deps, {
        invite: await loadInvite(params.clubId, params.inviteId),
        inviter: viewerOf(req).user,
      });
      res.json({ invite: presentInvite(invite) });
    },
  );

  router.delete(
    '/clubs/:clubId/invites/:inviteId',
    requireSignIn,
    validate(one),
    requireClubMember,
    async (req, res) => {
      const { params } = inputOf(res, one);
      authorize(req, 'delete', 'Invite', { clubId: params.clubId });
      await revokeInvite(
        dataSource.manager,
        await loadInvite(params.clubId, params.inviteId),
        viewerOf(req).user.id,
      );
      res.status(204).end();
    },
  );

  // Public: what the accept page shows before the invitee commits to anything.
  router.get('/invites/:token', deps.rateLimits.token('invite-preview', 60), async (req, res) => {
    res.json(await invitePreview(dataSource.manager, String(req.params.token)));
  });

  const accept = { body: acceptInviteSchema };
  router.post(
    '/invites/accept',
    deps.rateLimits.token('invite-accept'),
    validate(accept),
    async (req, res) => {
      const { token, displayName, password } = inputOf(res, accept).body;
      const passwordHash = password ? await hashPassword(password) : undefined;
      const signedInId = req.viewer?.user.id ?? req.session?.userId;
      const result = await dataSource.transaction((tx) =>
        acceptInvite(tx, { token, displayName, passwordHash, signedInId }),
      );
      const csrfToken = await startSignedInSession(req, result.user.id, result.clubId);
      res.json({ user: presentUser(result.user), clubId: result.clubId, csrfToken });
    },
  );

  return router;
}
