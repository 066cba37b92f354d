import type { EntityManager } from 'typeorm';
import type { AppAbility } from '@shared/abilities';
import { whereAllowed } from '../access';
import { Invite } from './invite.entity';

/** The club's invitations that are neither accepted nor withdrawn, newest first, as far as the viewer may read them. */
export async function pendingInvites(
  m: EntityManager,
  ability: AppAbility,
  clubId: string,
): Promise<Invite[]> {
  const qb = m.createQueryBuilder(Invite, 'i').where('i.club_id = :clubId', { clubId });
  whereAllowed(qb, ability, 'read', 'Invite', { clubId: 'i.club_id' });
  return qb
    .andWhere('i.accepted_at IS NULL AND i.revoked_at IS NULL')
    .orderBy('i.created_at', 'DESC')
    .getMany();
}

export async function findInvite(m: EntityManager, clubId: string, inviteId: string): Promise<Invite | null> {
  return m.findOneBy(Invite, { id: inviteId, clubId });
}
