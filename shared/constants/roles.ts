export const ROLES = ['member', 'mentor', 'admin'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  member: 'Member',
  mentor: 'Mentor',
  admin: 'Club admin',
};

export const MEMBERSHIP_STATUSES = ['active', 'suspended'] as const;
export type MembershipStatus = (typeof MEMBERSHIP_STATUSES)[number];

export const EXPERIENCE_LEVELS = ['beginner', 'some-experience', 'experienced'] as const;
export type ExperienceLevel = (typeof EXPERIENCE_LEVELS)[number];

/** How long a mentor keeps read-only access to a past mentee's tanks. */
export const PAST_MENTEE_READ_DAYS = 30;
