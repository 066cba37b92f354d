import { Router } from 'express';
import type { Deps } from '@server/deps';
import { acceptInviteSchema } from '../../../shared/schemas/auth.schema';
import { createInviteSchema, inviteParams } from '../../../shared/schemas/club.schema';
import { clubIdParams } from '../../../shared/schemas/common';
import { errors } from '../../lib/app-error';
import { hashPassword } from '../../lib/passwords';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { whereAllowed } from '../access';
import { audit } from '../audit';
import { startSignedInSession } from '../auth';
import { Club, Membership } from '../clubs';
import { presentUser, User } from '../users';
import { Invite } from './invite.entity';
import { findUsableInvite, issueInvite, presentInvite, resendInvite } from './invite.service';

export function inviteRouter(deps: Pick<Deps, 'dataSource' | 'mailer' | 'config' | 'rateLimits'>): Router {
  const { dataSource, mailer, config } = deps;
  const router = Router();
  const club = [requireSignIn, validate({ params: clubIdParams }), requireClubMember];

  router.get('/clubs/:clubId/invites', ...club, async (req, res) => {
    const { ability } = viewerOf(req);
    authorize(req, 'read', 'Invite', { clubId: req.params.clubId as string });
    const qb = dataSource.getRepository(Invite).createQueryBuilder('i').where('i.club_id = :clubId', { clubId: req.params.clubId });
    whereAllowed(qb, ability, 'read', 'Invite', { clubId: 'i.club_id' });
    const rows = await qb.andWhere('i.accepted_at IS NULL AND i.revoked_at IS NULL').orderBy('i.created_at', 'DESC').getMany();
    res.json({ invites: rows.map(presentInvite) });
  });

  const create = { params: clubIdParams, body: createInviteSchema };
  router.post('/clubs/:clubId/invites', requireSignIn, validate(create), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, create);
    authorize(req, 'create', 'Invite', { clubId: params.clubId });
    const { user } = viewerOf(req);
    const issued = await dataSource.transaction((tx) =>
      issueInvite(tx, { clubId: params.clubId, email: body.email, role: body.role, inviter: user, baseUrl: config.baseUrl }),
    );
    await mailer.enqueue(issued.mail);
    res.status(201).json({ invite: presentInvite(issued.invite) });
  });

  const one = { params: inviteParams };
  const loadInvite = async (clubId: string, inviteId: string) => {
    const invite = await dataSource.getRepository(Invite).findOneBy({ id: inviteId, clubId });
    if (!invite) throw errors.notFound('That invitation');
    return invite;
  };

  router.post('/clubs/:clubId/invites/:inviteId/resend', requireSignIn, validate(one), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, one);
    authorize(req, 'update', 'Invite', { clubId: params.clubId });
    const invite = await loadInvite(params.clubId, params.inviteId);
    const issued = await dataSource.transaction((tx) => resendInvite(tx, { invite, inviter: viewerOf(req).user, baseUrl: config.baseUrl }));
    await mailer.enqueue(issued.mail);
    res.json({ invite: presentInvite(issued.invite) });
  });

  router.delete('/clubs/:clubId/invites/:inviteId', requireSignIn, validate(one), requireClubMember, async (req, res) => {
    const { params } = inputOf(res, one);
    authorize(req, 'delete', 'Invite', { clubId: params.clubId });
    const invite = await loadInvite(params.clubId, params.inviteId);
    if (invite.acceptedAt) throw errors.conflict('That invitation was already accepted.');
    if (!invite.revokedAt) {
      await dataSource.getRepository(Invite).update({ id: invite.id }, { revokedAt: new Date() });
      await audit(dataSource.manager, { actorId: viewerOf(req).user.id, clubId: invite.clubId, action: 'invite.revoked', targetType: 'Invite', targetId: invite.id });
    }
    res.status(204).end();
  });

  // Public: what the accept page shows before the invitee commits to anything.
  router.get('/invites/:token', deps.rateLimits.token('invite-preview', 60), async (req, res) => {
    const invite = await findUsableInvite(dataSource.manager, String(req.params.token));
    const clubRow = await dataSource.getRepository(Club).findOneByOrFail({ id: invite.clubId });
    const account = await dataSource.getRepository(User).createQueryBuilder('u').where('lower(u.email) = :e', { e: invite.email }).getExists();
    res.json({ clubName: clubRow.name, email: invite.email, role: invite.role, accountExists: account, expiresAt: invite.expiresAt.toISOString() });
  });

  const accept = { body: acceptInviteSchema };
  router.post('/invites/accept', deps.rateLimits.token('invite-accept'), validate(accept), async (req, res) => {
    const { token, displayName, password } = inputOf(res, accept).body;
    const passwordHash = password ? await hashPassword(password) : undefined;
    const signedInId = req.viewer?.user.id ?? req.session?.userId;
    const result = await dataSource.transaction(async (tx) => {
      const invite = await findUsableInvite(tx, token, true);
      let user = await tx.createQueryBuilder(User, 'u').where('lower(u.email) = :e', { e: invite.email }).getOne();
      if (user) {
        if (signedInId !== user.id) throw errors.unauthenticated(`Sign in as ${invite.email} first, then open the link again.`);
      } else {
        const issues = [
          ...(!displayName ? [{ path: 'displayName', message: 'Enter your name.' }] : []),
          ...(!passwordHash ? [{ path: 'password', message: 'Choose a password.' }] : []),
        ];
        if (issues.length) throw errors.badRequest('Some fields need attention.', issues);
        user = await tx.save(tx.create(User, { email: invite.email, displayName: displayName!, passwordHash: passwordHash!, disabledAt: null }));
      }
      const existing = await tx.findOneBy(Membership, { clubId: invite.clubId, userId: user.id });
      if (!existing) await tx.insert(Membership, { clubId: invite.clubId, userId: user.id, role: invite.role, status: 'active', mentorCapacity: null });
      await tx.update(Invite, { id: invite.id }, { acceptedAt: new Date() });
      await audit(tx, { actorId: user.id, clubId: invite.clubId, action: 'invite.accepted', targetType: 'Invite', targetId: invite.id });
      return { user, clubId: invite.clubId };
    });
    const csrfToken = await startSignedInSession(req, result.user.id, result.clubId);
    res.json({ user: presentUser(result.user), clubId: result.clubId, csrfToken });
  });

  return router;
}
