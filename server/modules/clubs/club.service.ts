import type { EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { updateMembershipSchema } from '@shared/schemas/club.schema';
import { errors } from '../../lib/app-error';
import { audit } from '../audit';
import { Membership } from './membership.entity';

/** Changes a member's role or status. A club keeps at least one active admin; a mentor who is no longer one stops mentoring at once. */
export async function changeMembership(
  tx: EntityManager,
  m: Membership,
  change: z.output<typeof updateMembershipSchema>,
  actorId: string,
): Promise<Membership> {
  const losesAdmin =
    m.role === 'admin' &&
    m.status === 'active' &&
    ((change.role && change.role !== 'admin') || change.status === 'suspended');
  if (losesAdmin) {
    const admins = await tx.countBy(Membership, { clubId: m.clubId, role: 'admin', status: 'active' });
    if (admins <= 1)
      throw errors.conflict('A club needs at least one active admin. Make someone else admin first.');
  }
  await tx.update(Membership, { id: m.id }, change);
  if ((change.role === 'member' || change.status === 'suspended') && m.role !== 'member') {
    await tx.query(
      `UPDATE mentor_assignment SET ended_at = now() WHERE club_id = $1 AND mentor_id = $2 AND ended_at IS NULL`,
      [m.clubId, m.userId],
    );
  }
  await audit(tx, {
    actorId,
    clubId: m.clubId,
    action: 'membership.changed',
    targetType: 'Membership',
    targetId: m.id,
    details: { from: { role: m.role, status: m.status }, to: change },
  });
  return tx.findOneByOrFail(Membership, { id: m.id });
}
