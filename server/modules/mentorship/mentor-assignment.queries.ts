import { IsNull, type EntityManager } from 'typeorm';
import { MentorAssignment } from './mentor-assignment.entity';

/** The member's current mentors in the club: who a concern on their tank or a question of theirs is for. */
export async function currentMentorsOf(m: EntityManager, clubId: string, menteeId: string): Promise<string[]> {
  const rows = await m.find(MentorAssignment, { where: { clubId, menteeId, endedAt: IsNull() }, select: { mentorId: true } });
  return [...new Set(rows.map((r) => r.mentorId))];
}
