import { Router } from 'express';
import { In, IsNull, type DataSource } from 'typeorm';
import { assignmentParams, createAssignmentSchema } from '../../../shared/schemas/club.schema';
import { clubIdParams } from '../../../shared/schemas/common';
import { errors } from '../../lib/app-error';
import { inputOf, validate } from '../../middleware/validate';
import { authorize, requireClubMember, requireSignIn, viewerOf } from '../../middleware/viewer';
import { whereAllowed } from '../access/ability-sql';
import { audit } from '../audit/audit';
import { DEFAULT_MENTOR_CAPACITY } from '../clubs/club.router';
import { Membership } from '../clubs/membership.entity';
import { MentorAssignment } from './mentor-assignment.entity';

const present = (a: MentorAssignment) => ({
  id: a.id,
  clubId: a.clubId,
  mentorId: a.mentorId,
  menteeId: a.menteeId,
  startedAt: a.startedAt.toISOString(),
  endedAt: a.endedAt?.toISOString() ?? null,
});

export function assignmentRouter(deps: { dataSource: DataSource }): Router {
  const { dataSource } = deps;
  const router = Router();

  router.get('/clubs/:clubId/mentor-assignments', requireSignIn, validate({ params: clubIdParams }), requireClubMember, async (req, res) => {
    const clubId = req.params.clubId as string;
    const qb = dataSource.getRepository(MentorAssignment).createQueryBuilder('a').where('a.club_id = :clubId', { clubId });
    whereAllowed(qb, viewerOf(req).ability, 'read', 'MentorAssignment', { clubId: 'a.club_id', mentorId: 'a.mentor_id', menteeId: 'a.mentee_id' });
    const rows = await qb.orderBy('a.started_at', 'DESC').getMany();
    res.json({ assignments: rows.map(present) });
  });

  const create = { params: clubIdParams, body: createAssignmentSchema };
  router.post('/clubs/:clubId/mentor-assignments', requireSignIn, validate(create), requireClubMember, async (req, res) => {
    const { params, body } = inputOf(res, create);
    authorize(req, 'create', 'MentorAssignment', { clubId: params.clubId, ...body });
    if (body.mentorId === body.menteeId) throw errors.badRequest('A member cannot mentor themselves.', [{ path: 'menteeId', message: 'Choose someone other than the mentor.' }]);
    const created = await dataSource.transaction(async (tx) => {
      const members = await tx.findBy(Membership, { clubId: params.clubId, userId: In([body.mentorId, body.menteeId]) });
      const mentor = members.find((m) => m.userId === body.mentorId);
      const mentee = members.find((m) => m.userId === body.menteeId);
      if (!mentor || mentor.status !== 'active' || mentor.role === 'member') {
        throw errors.badRequest('Choose an active mentor of this club.', [{ path: 'mentorId', message: 'Not an active mentor of this club.' }]);
      }
      if (!mentee || mentee.status !== 'active') {
        throw errors.badRequest('Choose an active member of this club.', [{ path: 'menteeId', message: 'Not an active member of this club.' }]);
      }
      // Serialise assignments of one mentor so two admins cannot both fill the last place.
      await tx.query(`SELECT id FROM membership WHERE id = $1 FOR UPDATE`, [mentor.id]);
      const load = await tx.countBy(MentorAssignment, { clubId: params.clubId, mentorId: body.mentorId, endedAt: IsNull() });
      const capacity = mentor.mentorCapacity ?? DEFAULT_MENTOR_CAPACITY;
      const current = await tx.findOneBy(MentorAssignment, { clubId: params.clubId, menteeId: body.menteeId, endedAt: IsNull() });
      if (current?.mentorId === body.mentorId) throw errors.conflict('That mentor already mentors this member.');
      if (load >= capacity) throw errors.conflict(`That mentor is at capacity (${load} of ${capacity} mentees).`);
      if (current) await tx.update(MentorAssignment, { id: current.id }, { endedAt: new Date() });
      const row = await tx.save(tx.create(MentorAssignment, { clubId: params.clubId, mentorId: body.mentorId, menteeId: body.menteeId, startedAt: new Date(), endedAt: null, createdById: viewerOf(req).user.id }));
      await audit(tx, { actorId: viewerOf(req).user.id, clubId: params.clubId, action: current ? 'mentor-assignment.reassigned' : 'mentor-assignment.created', targetType: 'MentorAssignment', targetId: row.id, details: { mentorId: body.mentorId, menteeId: body.menteeId, previous: current?.id ?? null } });
      return row;
    });
    res.status(201).json({ assignment: present(created) });
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
    res.json({ assignment: present(row) });
  });

  return router;
}
