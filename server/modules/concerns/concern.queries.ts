import type { EntityManager } from 'typeorm';
import type { AppAbility } from '@shared/abilities';
import { errors } from '../../lib/app-error';
import { whereAllowed } from '../access';
import { ConcernRow } from './concern.entity';

/** A tank's concerns the viewer may read, newest first; only the live ones (not resolved) when asked. */
export async function concernsOfTank(
  m: EntityManager,
  ability: AppAbility,
  tankId: string,
  status: 'live' | 'all',
): Promise<ConcernRow[]> {
  const qb = m.createQueryBuilder(ConcernRow, 'c').where('c.tank_id = :tankId', { tankId });
  whereAllowed(qb, ability, 'read', 'Concern', { clubId: 'c.club_id', ownerId: 'c.owner_id' });
  if (status === 'live') qb.andWhere("c.status <> 'resolved'");
  return qb.orderBy('c.raised_at', 'DESC').limit(500).getMany();
}

/** The concern in this club, locked until the transaction ends, or 404. */
export async function lockConcern(tx: EntityManager, clubId: string, concernId: string): Promise<ConcernRow> {
  const c = await tx
    .createQueryBuilder(ConcernRow, 'c')
    .setLock('pessimistic_write')
    .where('c.id = :id AND c.club_id = :clubId', { id: concernId, clubId })
    .getOne();
  if (!c) throw errors.notFound('That concern');
  return c;
}
