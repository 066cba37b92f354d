import { DEFAULT_MENTOR_CAPACITY } from '@shared/constants/mentorship';
import type { Club } from './club.entity';
import type { Membership } from './membership.entity';

export const presentClub = (club: Club) => ({
  id: club.id,
  name: club.name,
  slug: club.slug,
  description: club.description,
  locationText: club.locationText,
  timeZone: club.timeZone,
});

/** A member as the roster shows them: e-mails only for those who manage memberships, mentor loads for mentors. */
export const presentMember = (m: Membership, p: { withEmail: boolean; loads: Map<string, number> }) => ({
  membershipId: m.id,
  userId: m.userId,
  displayName: m.user!.displayName,
  ...(p.withEmail ? { email: m.user!.email } : {}),
  role: m.role,
  status: m.status,
  joinedAt: m.joinedAt.toISOString(),
  ...(m.role !== 'member'
    ? { mentorCapacity: m.mentorCapacity ?? DEFAULT_MENTOR_CAPACITY, menteeCount: p.loads.get(m.userId) ?? 0 }
    : {}),
});

export const presentMembership = (m: Membership) => ({
  membershipId: m.id,
  userId: m.userId,
  role: m.role,
  status: m.status,
});
