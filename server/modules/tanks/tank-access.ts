import type { EntityManager } from 'typeorm';
import type { OwnedInClub } from '@shared/abilities';
import { errors } from '../../lib/app-error';
import { Tank } from './tank.entity';

/** The tank in this club, or null: an id from another club is "not found" here. */
export async function findTank(manager: EntityManager, clubId: string, tankId: string): Promise<Tank | null> {
  return manager.findOneBy(Tank, { id: tankId, clubId });
}

/** The tank in this club, or 404. */
export async function loadTank(manager: EntityManager, clubId: string, tankId: string): Promise<Tank> {
  const tank = await findTank(manager, clubId, tankId);
  if (!tank) throw errors.notFound('That tank');
  return tank;
}

/** Everything logged on a tank is owned like the tank itself (the permission rules' subject). */
export function ownedBy(tank: Pick<Tank, 'clubId' | 'ownerId'>): OwnedInClub {
  return { clubId: tank.clubId, ownerId: tank.ownerId };
}

/** History stays readable on an archived tank, but nothing new is written to it. */
export function requireActive(tank: Tank): void {
  if (tank.archivedAt) throw errors.conflict('This tank is archived. Restore it to make changes.');
}

/** Holds the tank's row until the transaction ends: two imports of one file cannot both pass the duplicate check. */
export async function lockTank(tx: EntityManager, tankId: string): Promise<void> {
  await tx.findOne(Tank, {
    where: { id: tankId },
    select: { id: true },
    lock: { mode: 'pessimistic_write' },
  });
}
