import type { DataSource } from 'typeorm';
import { MentorRequest } from '@server/modules/mentorship/mentor-request.entity';
import { Notification } from '@server/modules/notifications/notification.entity';
import type { Club } from '@server/modules/clubs/club.entity';
import type { User } from '@server/modules/users/user.entity';
import { makeMember } from '@tests/helpers/factories';

/** `seeker` (no mentor yet) has an open request preferring `mentor`; `member` has one unread notification. */
export async function mentorshipWorld(ds: DataSource, club: Club, p: { member: User; mentor: User }) {
  const seeker = await makeMember(ds, club, 'Sam Seeker');
  const mentorRequest = await ds.getRepository(MentorRequest).save({
    clubId: club.id,
    requesterId: seeker.user.id,
    preferredMentorId: p.mentor.id,
    note: 'New to reef tanks',
    state: 'open',
    declineReason: null,
    decidedById: null,
    decidedAt: null,
    assignmentId: null,
  });
  const notification = await ds.getRepository(Notification).save({
    userId: p.member.id,
    clubId: club.id,
    kind: 'assignment',
    title: 'Milo Mentor is now your mentor',
    body: '',
    link: '/',
    subjectType: null,
    subjectId: null,
    readAt: null,
    emailedAt: null,
    digestId: null,
  });
  return { seeker, mentorRequest, notification };
}
