import { In, IsNull, type EntityManager } from 'typeorm';
import type { AppAbility } from '@shared/abilities';
import type { SystemType, TankPhase } from '@shared/care';
import { whereAllowed } from '../access';
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
export async function tanksWithLivestock(
  manager: EntityManager,
  tankIds: readonly string[],
): Promise<Set<string>> {
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
export async function listTanks(
  manager: EntityManager,
  ability: AppAbility,
  clubId: string | undefined,
  filters: TankFilters = {},
): Promise<TankListRow[]> {
  const qb = manager
    .getRepository(Tank)
    .createQueryBuilder('t')
    .innerJoin('t.owner', 'u')
    .addSelect(['u.id', 'u.displayName']);
  if (clubId !== undefined) qb.andWhere('t.club_id = :clubId', { clubId });
  whereAllowed(qb, ability, 'read', 'Tank', { clubId: 't.club_id', ownerId: 't.owner_id' });
  if (filters.ownerId !== undefined) qb.andWhere('t.owner_id = :ownerId', { ownerId: filters.ownerId });
  if (!filters.includeArchived) qb.andWhere('t.archived_at IS NULL');
  const tanks = await qb.orderBy('t.name', 'ASC').addOrderBy('t.id', 'ASC').getMany();
  const stocked = await tanksWithLivestock(
    manager,
    tanks.map((t) => t.id),
  );
  return tanks.map((tank) => ({
    tank,
    ownerName: tank.owner?.displayName ?? '',
    hasLivestock: stocked.has(tank.id),
  }));
}

/** The few facts about a tank that announcing a change needs. */
export type TankRef = Pick<Tank, 'id' | 'clubId' | 'ownerId' | 'name'>;

export async function tankRef(manager: EntityManager, tankId: string): Promise<TankRef | null> {
  return manager.findOne(Tank, {
    where: { id: tankId },
    select: { id: true, clubId: true, ownerId: true, name: true },
  });
}

/** Ids of the club's tanks that follow a care profile and are not archived. */
export async function liveTankIdsOnProfile(
  manager: EntityManager,
  clubId: string,
  careProfileKey: string,
): Promise<string[]> {
  const rows = await manager.find(Tank, {
    where: { clubId, careProfileKey, archivedAt: IsNull() },
    select: { id: true },
  });
  return rows.map((r) => r.id);
}

/** A tank as the care engine reads it: its settings and whether animals live in it now. */
export interface TankForCare {
  id: string;
  clubId: string;
  ownerId: string;
  name: string;
  systemType: SystemType;
  volumeL: number;
  phase: TankPhase;
  careProfileKey: string;
  createdAt: string;
  setUpOn: string | null;
  hasLivestock: boolean;
  archived: boolean;
}

export async function tankForCare(manager: EntityManager, tankId: string): Promise<TankForCare | null> {
  const tank = await manager.findOneBy(Tank, { id: tankId });
  if (!tank) return null;
  const stocked = await tanksWithLivestock(manager, [tank.id]);
  return {
    id: tank.id,
    clubId: tank.clubId,
    ownerId: tank.ownerId,
    name: tank.name,
    systemType: tank.systemType,
    volumeL: tank.volumeL,
    phase: tank.phase,
    careProfileKey: tank.careProfileKey,
    createdAt: tank.createdAt.toISOString(),
    setUpOn: tank.setUpOn,
    hasLivestock: stocked.has(tank.id),
    archived: tank.archivedAt !== null,
  };
}
