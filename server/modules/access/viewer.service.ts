import type { EntityManager } from 'typeorm';
import { defineAbilityFor, type AppAbility, type Viewer } from '@shared/abilities';
import { PAST_MENTEE_READ_DAYS } from '@shared/constants/roles';
import type { User } from '../users';

export interface MembershipView {
  membershipId: string;
  clubId: string;
  clubName: string;
  clubSlug: string;
  role: 'member' | 'mentor' | 'admin';
  status: 'active' | 'suspended';
}

export interface ViewerContext {
  user: User;
  memberships: MembershipView[];
  viewer: Viewer;
  ability: AppAbility;
}

/** Loads everything the permission rules need for one user, fresh from the database. */
export async function loadViewer(
  manager: EntityManager,
  userId: string,
  now = new Date(),
): Promise<ViewerContext | null> {
  const user = await manager.getRepository<User>('User').findOneBy({ id: userId });
  if (!user || user.disabledAt) return null;
  const memberships: MembershipView[] = await manager.query(
    `SELECT m.id AS "membershipId", m.club_id AS "clubId", c.name AS "clubName", c.slug AS "clubSlug",
            m.role, m.status
       FROM membership m JOIN club c ON c.id = m.club_id
      WHERE m.user_id = $1 ORDER BY c.name`,
    [userId],
  );
  const mentorships: { clubId: string; menteeId: string; endedAt: Date | null }[] = await manager.query(
    `SELECT club_id AS "clubId", mentee_id AS "menteeId", ended_at AS "endedAt"
       FROM mentor_assignment
      WHERE mentor_id = $1 AND (ended_at IS NULL OR ended_at > $2::timestamptz - make_interval(days => $3))`,
    [userId, now.toISOString(), PAST_MENTEE_READ_DAYS],
  );
  const viewer: Viewer = {
    userId,
    now: now.toISOString(),
    memberships: memberships.map((m) => ({ clubId: m.clubId, role: m.role, status: m.status })),
    mentorships: mentorships.map((a) => ({
      clubId: a.clubId,
      menteeId: a.menteeId,
      endedAt: a.endedAt ? new Date(a.endedAt).toISOString() : null,
    })),
  };
  return { user, memberships, viewer, ability: defineAbilityFor(viewer) };
}
