import type { EntityManager } from 'typeorm';
import type { TankDetailView } from '@shared/schemas/tank-views';
import { User } from '../users';
import { livestockPresentFirst } from './livestock.queries';
import type { Tank } from './tank.entity';
import { presentTankDetail } from './tank.presenter';
import { lastKnownBefore } from './water-test.context';

/** The tank with its animals (present first, then past) and its last known temperature, pH and salinity. */
export async function loadTankDetail(manager: EntityManager, tank: Tank): Promise<TankDetailView> {
  const owner = await manager.findOne(User, {
    where: { id: tank.ownerId },
    select: { id: true, displayName: true },
  });
  const livestock = await livestockPresentFirst(manager, tank.id);
  const lastKnown = await lastKnownBefore(manager, tank.id);
  return presentTankDetail(tank, { ownerName: owner?.displayName ?? '', livestock, lastKnown });
}
