import type { EntityManager } from 'typeorm';
import {
  FREE_AMMONIA_INPUTS,
  lastKnownInputs,
  type LastKnown,
  type TestPosition,
  type WaterTestInput,
} from '@shared/care';
import type { TankChemistryContext } from '@shared/readings/free-ammonia';
import { resolveProfile } from '../care';
import type { Tank } from './tank.entity';
import { VALUE_COLUMNS } from './water-test.entity';

/**
 * The tank's last known temperature, pH and salinity before a test (or of all its tests), by `lastKnownInputs`, the
 * shared rule: the query only narrows the candidates to the newest test before the position measuring each.
 */
export async function lastKnownBefore(
  manager: EntityManager,
  tankId: string,
  before?: TestPosition,
): Promise<LastKnown> {
  const candidates: WaterTestInput[] = [];
  for (const parameter of FREE_AMMONIA_INPUTS) {
    const column = VALUE_COLUMNS[parameter].column;
    const params: unknown[] = [tankId];
    let bound = '';
    if (before) {
      params.push(before.takenAt);
      if (before.id !== undefined) {
        params.push(before.id);
        bound = 'AND (taken_at, id) < ($2, $3)';
      } else bound = 'AND taken_at < $2';
    }
    const rows: { id: string; takenAt: Date; value: number }[] = await manager.query(
      `SELECT id, taken_at AS "takenAt", ${column} AS value FROM water_test
        WHERE tank_id = $1 AND ${column} IS NOT NULL ${bound}
        ORDER BY taken_at DESC, id DESC LIMIT 1`,
      params,
    );
    const row = rows[0];
    if (row)
      candidates.push({
        id: row.id,
        takenAt: new Date(row.takenAt).toISOString(),
        values: { [parameter]: row.value },
      });
  }
  return lastKnownInputs(candidates, before);
}

/** What free ammonia depends on besides the readings: the kind of tank and its care profile (a club's copy included). */
export async function chemistryOf(manager: EntityManager, tank: Tank): Promise<TankChemistryContext> {
  const profile = await resolveProfile(manager, tank.clubId, tank.careProfileKey);
  return {
    systemType: tank.systemType,
    careProfileKey: tank.careProfileKey,
    ...(profile ? { profile } : {}),
  };
}
