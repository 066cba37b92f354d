import { Router } from 'express';
import type { Deps } from '@server/deps';
import { asSubject } from '@shared/abilities';
import { DEFAULT_MENTOR_CAPACITY } from '@shared/constants/mentorship';
import { membershipParams, updateMembershipSchema } from '@shared/schemas/club.schema';
import { clubIdParams } from '@shared/schemas/common';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { whereAllowed } from '../access';
import { audit } from '../audit';
import { Club } from './club.entity';
import { Membership } from './membership.entity';

export function clubRouter(deps: Pick<Deps, 'dataSource'>): Router {
  const { dataSource } = deps;
  const router = Router();
  const inClub = [requireSignIn, validate({ params: clubIdParams }), requireClubMember];

  router.get('/clubs/:clubId', ...inClub, async (req, res) => {
    const clubId = req.params.clubId as string;
    authorize(req, 'read', 'Club', { id: clubId });
    const club = await dataSource.getRepository(Club).findOneByOrFail({ id: clubId });
    res.json({ club: { id: club.id, name: club.name, slug: club.slug, description: club.description, locationText: club.locationText, timeZone: club.timeZone } });
  });

  router.get('/clubs/:clubId/members', ...inClub, async (req, res) => {
    const { ability } = viewerOf(req);
    const clubId = req.params.clubId as string;
    const canSeeEmails = ability.can('update', asSubject('Membership', { clubId, userId: '' }));
    const qb = dataSource
      .getRepository(Membership)
      .createQueryBuilder('m')
      .innerJoinAndSelect('m.user', 'u')
      .where('m.club_id = :clubId', { clubId });
    whereAllowed(qb, ability, 'read', 'Membership', { clubId: 'm.club_id', userId: 'm.user_id' });
    const rows = await qb.orderBy('u.display_name', 'ASC').getMany();
    const loads: { mentorId: string; n: string }[] = await dataSource.query(
      `SELECT mentor_id AS "mentorId", count(*) AS n FROM mentor_assignment WHERE club_id = $1 AND ended_at IS NULL GROUP BY mentor_id`,
      [clubId],
    );
    const loadOf = new Map(loads.map((l) => [l.mentorId, Number(l.n)]));
    res.json({
      members: rows.map((m) => ({
        membershipId: m.id,
        userId: m.userId,
        displayName: m.user!.displayName,
        ...(canSeeEmails ? { email: m.user!.email } : {}),
        role: m.role,
        status: m.status,
        joinedAt: m.joinedAt.toISOString(),
        ...(m.role !== 'member' ? { mentorCapacity: m.mentorCapacity ?? DEFAULT_MENTOR_CAPACITY, menteeCount: loadOf.get(m.userId) ?? 0 } : {}),
      })),
    });
  });

  const update = { params: membershipParams, body: updateMembershipSchema };
  router.patch('/clubs/:clubId/members/:membershipId', requireSignIn, validate(update), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, update);
    authorize(req, 'update', 'Membership', { clubId: params.clubId, userId: '' });
    const result = await dataSource.transaction(async (tx) => {
      const m = await tx.findOneBy(Membership, { id: params.membershipId, clubId: params.clubId });
      if (!m) throw errors.notFound('That membership');
      const losesAdmin = m.role === 'admin' && m.status === 'active' && ((body.role && body.role !== 'admin') || body.status === 'suspended');
      if (losesAdmin) {
        const admins = await tx.countBy(Membership, { clubId: params.clubId, role: 'admin', status: 'active' });
        if (admins <= 1) throw errors.conflict('A club needs at least one active admin. Make someone else admin first.');
      }
      await tx.update(Membership, { id: m.id }, body);
      // A mentor who is no longer one stops mentoring at once.
      if ((body.role === 'member' || body.status === 'suspended') && m.role !== 'member') {
        await tx.query(`UPDATE mentor_assignment SET ended_at = now() WHERE club_id = $1 AND mentor_id = $2 AND ended_at IS NULL`, [params.clubId, m.userId]);
      }
      await audit(tx, { actorId: viewerOf(req).user.id, clubId: params.clubId, action: 'membership.changed', targetType: 'Membership', targetId: m.id, details: { from: { role: m.role, status: m.status }, to: body } });
      return tx.findOneByOrFail(Membership, { id: m.id });
    });
    res.json({ membership: { membershipId: result.id, userId: result.userId, role: result.role, status: result.status } });
  });

  return router;
}
