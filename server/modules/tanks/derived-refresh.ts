import type { EntityManager } from 'typeorm';
import {
  FREE_AMMONIA_INPUTS,
  lastKnownInputs,
  type LastKnown,
  type ParameterKey,
  type WaterTestInput,
} from '@shared/care';
import { deriveFreeAmmonia } from '@shared/readings/free-ammonia';
import type { DerivedInfo } from '@shared/readings/normalize-water-test';
import type { Tank } from './tank.entity';
import { chemistryOf, lastKnownBefore } from './water-test.context';

interface TimelineRow {
  id: string;
  takenAt: Date;
  temperature: number | null;
  pH: number | null;
  salinity: number | null;
  ammonia: number | null;
  freeAmmonia: number | null;
  derived: DerivedInfo;
}

/** Last known values as the one-reading tests they came from. */
const testsOf = (known: LastKnown): WaterTestInput[] =>
  Object.entries(known).map(([p, k]) => ({ id: k.testId, takenAt: k.takenAt, values: { [p]: k.value } }));

/** JSON with sorted keys: jsonb reorders keys, so plain stringify would see changes that are not there. */
function stable(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(stable).join(',')}]`;
  if (value && typeof value === 'object') {
    return `{${Object.keys(value)
      .sort()
      .map((k) => `${JSON.stringify(k)}:${stable((value as Record<string, unknown>)[k])}`)
      .join(',')}}`;
  }
  return JSON.stringify(value);
}

/**
 * Re-works free ammonia for the tank's tests from `from` on. A test without its own temperature, pH or salinity
 * leans on earlier tests, so adding, editing or deleting one (or changing the kind of tank) can change later ones.
 * Writes only the rows whose derived values actually changed, in one statement.
 */
export async function recomputeDerivedFrom(
  tx: EntityManager,
  tank: Tank,
  from: Date | null,
): Promise<number> {
  let known: LastKnown = from ? await lastKnownBefore(tx, tank.id, { takenAt: from.toISOString() }) : {};
  const rows: TimelineRow[] = await tx.query(
    `SELECT id, taken_at AS "takenAt", temperature_c AS temperature, ph AS "pH", salinity_psu AS salinity,
            ammonia_mg_l AS ammonia, free_ammonia_mg_l AS "freeAmmonia", derived
       FROM water_test WHERE tank_id = $1 ${from ? 'AND taken_at >= $2' : ''} ORDER BY taken_at, id`,
    from ? [tank.id, from] : [tank.id],
  );
  const chemistry = await chemistryOf(tx, tank);
  const changes: { id: string; free: number | null; derived: DerivedInfo }[] = [];
  let previous: WaterTestInput | undefined;
  for (const row of rows) {
    const takenAt = new Date(row.takenAt).toISOString();
    const values: Partial<Record<ParameterKey, number>> = {};
    for (const p of FREE_AMMONIA_INPUTS) if (row[p] !== null) values[p] = row[p];
    // Walking the rows in order, what stood in before the previous row plus that row itself are all the rule needs.
    if (previous) known = lastKnownInputs([...testsOf(known), previous], { takenAt, id: row.id });
    if (row.ammonia !== null) {
      const next = deriveFreeAmmonia(
        { id: row.id, takenAt, values: { ...values, ammonia: row.ammonia } },
        known,
        chemistry,
      );
      if (next && (stable(next) !== stable(row.derived.freeAmmonia) || next.value !== row.freeAmmonia)) {
        changes.push({ id: row.id, free: next.value, derived: { ...row.derived, freeAmmonia: next } });
      }
    }
    previous = { id: row.id, takenAt, values };
  }
  if (changes.length) {
    await tx.query(
      `UPDATE water_test w SET free_ammonia_mg_l = v.free, derived = v.derived
         FROM jsonb_to_recordset($1::jsonb) AS v(id uuid, free double precision, derived jsonb)
        WHERE w.id = v.id`,
      [JSON.stringify(changes)],
    );
  }
  return changes.length;
}
