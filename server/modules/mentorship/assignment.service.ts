import { In, IsNull, type EntityManager } from 'typeorm';
import type { Deps } from '@server/deps';
import { DEFAULT_MENTOR_CAPACITY } from '@shared/constants/mentorship';
import { errors } from '../../lib/app-error';
import { audit } from '../audit';
import { Membership } from '../clubs';
import { MentorAssignment } from './mentor-assignment.entity';

export interface AssignMentorInput {
  clubId: string;
  mentorId: string;
  menteeId: string;
  actorId: string;
}

export interface AssignMentorResult {
  assignment: MentorAssignment;
  /** The mentee's assignment this one replaced, now ended. */
  previous: MentorAssignment | null;
  /** Open mentor requests of the mentee that this assignment answered. */
  answeredRequestIds: string[];
}

async function namesOf(tx: EntityManager, ids: string[]): Promise<Map<string, string>> {
  const rows: { id: string; name: string }[] = await tx.query(
    `SELECT id, display_name AS name FROM app_user WHERE id = ANY($1::uuid[])`,
    [ids],
  );
  return new Map(rows.map((r) => [r.id, r.name]));
}

/**
 * The one way a mentor is paired with a mentee (admin pairing or an accepted request): checks both memberships,
 * the mentor's capacity, ends a previous pairing, answers the mentee's open request, audits and notifies.
 */
export async function assignMentor(
  tx: EntityManager,
  { notify }: Pick<Deps, 'notify'>,
  input: AssignMentorInput,
): Promise<AssignMentorResult> {
  const { clubId, mentorId, menteeId, actorId } = input;
  if (mentorId === menteeId)
    throw errors.badRequest('A member cannot mentor themselves.', [
      { path: 'menteeId', message: 'Choose someone other than the mentor.' },
    ]);
  // Lock both memberships (in id order, so two pairings never deadlock): two admins cannot both fill the mentor's
  // last place, nor give the same mentee two mentors.
  const members = await tx.find(Membership, {
    where: { clubId, userId: In([mentorId, menteeId]) },
    order: { id: 'ASC' },
    lock: { mode: 'pessimistic_write' },
  });
  const mentor = members.find((m) => m.userId === mentorId);
  const mentee = members.find((m) => m.userId === menteeId);
  if (!mentor || mentor.status !== 'active' || mentor.role === 'member') {
    throw errors.badRequest('Choose an active mentor of this club.', [
      { path: 'mentorId', message: 'Not an active mentor of this club.' },
    ]);
  }
  if (!mentee || mentee.status !== 'active') {
    throw errors.badRequest('Choose an active member of this club.', [
      { path: 'menteeId', message: 'Not an active member of this club.' },
    ]);
  }
  const names = await namesOf(tx, [mentorId, menteeId]);
  const mentorName = names.get(mentorId) ?? 'That mentor';
  const menteeName = names.get(menteeId) ?? 'the member';
  const load = await tx.countBy(MentorAssignment, { clubId, mentorId, endedAt: IsNull() });
  const capacity = mentor.mentorCapacity ?? DEFAULT_MENTOR_CAPACITY;
  const previous = await tx.findOneBy(MentorAssignment, { clubId, menteeId, endedAt: IsNull() });
  if (previous?.mentorId === mentorId) throw errors.conflict(`${mentorName} already mentors ${menteeName}.`);
  if (load >= capacity) {
    throw errors.conflict(
      `${mentorName} is at capacity (${load} of ${capacity} mentees). Choose another mentor, or raise their capacity first.`,
    );
  }
  const now = new Date();
  if (previous) {
    await tx.update(MentorAssignment, { id: previous.id }, { endedAt: now });
    previous.endedAt = now;
  }
  const assignment = await tx.save(
    tx.create(MentorAssignment, {
      clubId,
      mentorId,
      menteeId,
      startedAt: now,
      endedAt: null,
      createdById: actorId,
    }),
  );
  await audit(tx, {
    actorId,
    clubId,
    action: previous ? 'mentor-assignment.reassigned' : 'mentor-assignment.created',
    targetType: 'MentorAssignment',
    targetId: assignment.id,
    details: { mentorId, menteeId, previous: previous?.id ?? null },
  });

  // TypeORM answers an UPDATE … RETURNING with [rows, affected].
  const [answered]: [{ id: string }[], number] = await tx.query(
    `UPDATE mentor_request SET state = 'accepted', decided_at = $4, decided_by_id = $3, assignment_id = $5
      WHERE club_id = $1 AND requester_id = $2 AND state = 'open' RETURNING id`,
    [clubId, menteeId, actorId, now.toISOString(), assignment.id],
  );
  for (const r of answered) {
    await audit(tx, {
      actorId,
      clubId,
      action: 'mentor-request.accepted',
      targetType: 'MentorRequest',
      targetId: r.id,
      details: { mentorId, assignmentId: assignment.id },
    });
  }

  const subject = { type: 'MentorAssignment', id: assignment.id };
  await notify(tx, {
    userIds: [menteeId],
    clubId,
    kind: 'assignment',
    title: `${mentorName} is now your mentor`,
    body: 'Your mentor can see your tanks and answer your questions.',
    link: '/',
    subject,
  });
  await notify(tx, {
    userIds: [mentorId],
    clubId,
    kind: 'assignment',
    title: `You are now mentoring ${menteeName}`,
    link: '/desk',
    subject,
  });
  if (previous) {
    await notify(tx, {
      userIds: [previous.mentorId],
      clubId,
      kind: 'assignment',
      title: `${menteeName} has moved to another mentor`,
      body: 'You can still read their tanks for a while.',
      link: '/desk',
      subject,
    });
  }
  return { assignment, previous, answeredRequestIds: answered.map((r) => r.id) };
}

/** Ends a pairing now (audited); ending one that already ended changes nothing. */
export async function endAssignment(
  m: EntityManager,
  row: MentorAssignment,
  actorId: string,
): Promise<MentorAssignment> {
  if (row.endedAt) return row;
  const ended = { ...row, endedAt: new Date() };
  await m.update(MentorAssignment, { id: row.id }, { endedAt: ended.endedAt });
  await audit(m, {
    actorId,
    clubId: row.clubId,
    action: 'mentor-assignment.ended',
    targetType: 'MentorAssignment',
    targetId: row.id,
  });
  return ended;
}

/** How many mentees a mentor takes on in the club (audited), with how many they have now. */
export async function setMentorCapacity(
  tx: EntityManager,
  p: { clubId: string; mentorId: string; capacity: number; actorId: string },
) {
  const m = await tx.findOne(Membership, {
    where: { clubId: p.clubId, userId: p.mentorId },
    lock: { mode: 'pessimistic_write' },
  });
  if (!m) throw errors.notFound('That mentor');
  if (m.role === 'member' || m.status !== 'active')
    throw errors.conflict('Only active mentors and admins take on mentees.');
  await tx.update(Membership, { id: m.id }, { mentorCapacity: p.capacity });
  await audit(tx, {
    actorId: p.actorId,
    clubId: p.clubId,
    action: 'mentor.capacity-changed',
    targetType: 'Membership',
    targetId: m.id,
    details: { mentorId: p.mentorId, from: m.mentorCapacity, to: p.capacity },
  });
  const menteeCount = await tx.countBy(MentorAssignment, {
    clubId: p.clubId,
    mentorId: p.mentorId,
    endedAt: IsNull(),
  });
  return { mentorId: p.mentorId, capacity: p.capacity, menteeCount };
}
