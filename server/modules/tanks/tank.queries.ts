import { In, type EntityManager } from 'typeorm';
import type { AppAbility } from '../../../shared/abilities';
import { whereAllowed } from '../access/ability-sql';
import { Livestock } from './livestock.entity';
import { Tank } from './tank.entity';

export interface TankFilters {
  ownerId?: string;
  includeArchived?: boolean;
}

export interface TankListRow {
  tank: Tank;
  ownerName: string;
  hasLivestock: boolean;
}

/** Tank ids (of those given) with animals in them now: a livestock row not yet removed. */
export async function tanksWithLivestock(manager: EntityManager, tankIds: readonly string[]): Promise<Set<string>> {
  if (tankIds.length === 0) return new Set();
  const rows: { tankId: string }[] = await manager
    .createQueryBuilder(Livestock, 'l')
    .select('DISTINCT l.tank_id', 'tankId')
    .where({ tankId: In([...tankIds]) })
    .andWhere('l.removed_on IS NULL')
    .getRawMany();
  return new Set(rows.map((r) => r.tankId));
}

/**
 * The tanks a viewer may read, filtered in SQL by the same rules as the route guards (ASVS 8.2.2): even with no club
 * filter, rows the viewer's rules do not allow never leave the database.
 */
export async function listTanks(manager: EntityManager, ability: AppAbility, clubId: string | undefined, filters: TankFilters = {}): Promise<TankListRow[]> {
  const qb = manager.getRepository(Tank).createQueryBuilder('t').innerJoin('t.owner', 'u').addSelect(['u.id', 'u.displayName']);
  if (clubId !== undefined) qb.andWhere('t.club_id = :clubId', { clubId });
  whereAllowed(qb, ability, 'read', 'Tank', { clubId: 't.club_id', ownerId: 't.owner_id' });
  if (filters.ownerId !== undefined) qb.andWhere('t.owner_id = :ownerId', { ownerId: filters.ownerId });
  if (!filters.includeArchived) qb.andWhere('t.archived_at IS NULL');
  const tanks = await qb.orderBy('t.name', 'ASC').addOrderBy('t.id', 'ASC').getMany();
  const stocked = await tanksWithLivestock(manager, tanks.map((t) => t.id));
  return tanks.map((tank) => ({ tank, ownerName: tank.owner?.displayName ?? '', hasLivestock: stocked.has(tank.id) }));
}
