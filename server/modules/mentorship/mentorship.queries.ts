import { IsNull, type EntityManager } from 'typeorm';
import type { AppAbility } from '@shared/abilities';
import type { MentorRequestState } from '@shared/constants/mentorship';
import { whereAllowed } from '../access';
import { MentorAssignment } from './mentor-assignment.entity';
import { MentorRequest } from './mentor-request.entity';

/** The member's current mentors in the club: who a concern on their tank or a question of theirs is for. */
export async function currentMentorsOf(
  m: EntityManager,
  clubId: string,
  menteeId: string,
): Promise<string[]> {
  const rows = await m.find(MentorAssignment, {
    where: { clubId, menteeId, endedAt: IsNull() },
    select: { mentorId: true },
  });
  return [...new Set(rows.map((r) => r.mentorId))];
}

/** The club's pairings the viewer may read, newest first. */
export async function assignmentsOf(
  m: EntityManager,
  ability: AppAbility,
  clubId: string,
): Promise<MentorAssignment[]> {
  const qb = m.createQueryBuilder(MentorAssignment, 'a').where('a.club_id = :clubId', { clubId });
  whereAllowed(qb, ability, 'read', 'MentorAssignment', {
    clubId: 'a.club_id',
    mentorId: 'a.mentor_id',
    menteeId: 'a.mentee_id',
  });
  return qb.orderBy('a.started_at', 'DESC').getMany();
}

export async function findAssignment(
  m: EntityManager,
  clubId: string,
  assignmentId: string,
): Promise<MentorAssignment | null> {
  return m.findOneBy(MentorAssignment, { id: assignmentId, clubId });
}

/** Open requests (oldest first) or answered ones (newest first) of the club, as far as the viewer may read them. */
export async function mentorRequestsOf(
  m: EntityManager,
  ability: AppAbility,
  clubId: string,
  state: MentorRequestState,
): Promise<MentorRequest[]> {
  const qb = m
    .createQueryBuilder(MentorRequest, 'r')
    .where('r.club_id = :clubId AND r.state = :state', { clubId, state });
  whereAllowed(qb, ability, 'read', 'MentorRequest', { clubId: 'r.club_id', requesterId: 'r.requester_id' });
  return qb
    .orderBy('r.created_at', state === 'open' ? 'ASC' : 'DESC')
    .limit(200)
    .getMany();
}
