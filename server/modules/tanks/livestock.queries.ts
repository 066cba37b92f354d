import type { EntityManager } from 'typeorm';
import { Livestock } from './livestock.entity';

/** The tank's animals in the order they arrived; those that left only when asked. */
export async function livestockOf(
  m: EntityManager,
  tankId: string,
  filter: { includeRemoved?: boolean },
): Promise<Livestock[]> {
  const qb = m.createQueryBuilder(Livestock, 'l').where('l.tank_id = :tankId', { tankId });
  if (!filter.includeRemoved) qb.andWhere('l.removed_on IS NULL');
  return qb.orderBy('l.added_on', 'ASC').addOrderBy('l.id', 'ASC').getMany();
}

/** Every animal of the tank, those present first, then those that left. */
export async function livestockPresentFirst(m: EntityManager, tankId: string): Promise<Livestock[]> {
  return m
    .createQueryBuilder(Livestock, 'l')
    .where('l.tank_id = :tankId', { tankId })
    .orderBy('l.removed_on IS NULL', 'DESC')
    .addOrderBy('l.added_on', 'ASC')
    .addOrderBy('l.id', 'ASC')
    .getMany();
}

export async function findLivestock(
  m: EntityManager,
  tankId: string,
  livestockId: string,
): Promise<Livestock | null> {
  return m.findOneBy(Livestock, { id: livestockId, tankId });
}
