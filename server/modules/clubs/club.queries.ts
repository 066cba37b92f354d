import type { EntityManager } from 'typeorm';
import type { AppAbility } from '@shared/abilities';
import { whereAllowed } from '../access';
import { Club } from './club.entity';
import { Membership } from './membership.entity';

export async function findClub(m: EntityManager, clubId: string): Promise<Club | null> {
  return m.findOneBy(Club, { id: clubId });
}

/** The club's memberships the viewer may read, with their people, by name. */
export async function membersOf(
  m: EntityManager,
  ability: AppAbility,
  clubId: string,
): Promise<Membership[]> {
  const qb = m
    .createQueryBuilder(Membership, 'ms')
    .innerJoinAndSelect('ms.user', 'u')
    .where('ms.club_id = :clubId', { clubId });
  whereAllowed(qb, ability, 'read', 'Membership', { clubId: 'ms.club_id', userId: 'ms.user_id' });
  return qb.orderBy('u.display_name', 'ASC').getMany();
}

/** How many mentees each mentor of the club has now. */
export async function mentorLoads(m: EntityManager, clubId: string): Promise<Map<string, number>> {
  const loads: { mentorId: string; n: string }[] = await m.query(
    `SELECT mentor_id AS "mentorId", count(*) AS n FROM mentor_assignment WHERE club_id = $1 AND ended_at IS NULL GROUP BY mentor_id`,
    [clubId],
  );
  return new Map(loads.map((l) => [l.mentorId, Number(l.n)]));
}

export async function findMembership(
  m: EntityManager,
  clubId: string,
  membershipId: string,
): Promise<Membership | null> {
  return m.findOneBy(Membership, { id: membershipId, clubId });
}
