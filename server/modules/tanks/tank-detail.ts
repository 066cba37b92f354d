import type { EntityManager } from 'typeorm';
import type { TankDetailView } from '../../../shared/schemas/tank-views';
import { User } from '../users';
import { Livestock } from './livestock.entity';
import type { Tank } from './tank.entity';
import { presentTankDetail } from './tank.presenter';
import { lastKnownBefore } from './water-test.context';

/** The tank with its animals (present first, then past) and its last known temperature, pH and salinity. */
export async function loadTankDetail(manager: EntityManager, tank: Tank): Promise<TankDetailView> {
  const owner = await manager.findOne(User, { where: { id: tank.ownerId }, select: { id: true, displayName: true } });
  const livestock = await manager
    .createQueryBuilder(Livestock, 'l')
    .where('l.tank_id = :tankId', { tankId: tank.id })
    .orderBy('l.removed_on IS NULL', 'DESC')
    .addOrderBy('l.added_on', 'ASC')
    .addOrderBy('l.id', 'ASC')
    .getMany();
  const lastKnown = await lastKnownBefore(manager, tank.id);
  return presentTankDetail(tank, { ownerName: owner?.displayName ?? '', livestock, lastKnown });
}
