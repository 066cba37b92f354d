import type { MentorAssignment } from './mentor-assignment.entity';

export const presentAssignment = (a: MentorAssignment) => ({
  id: a.id,
  clubId: a.clubId,
  mentorId: a.mentorId,
  menteeId: a.menteeId,
  startedAt: a.startedAt.toISOString(),
  endedAt: a.endedAt?.toISOString() ?? null,
});
