import { PARAMETER_KEYS } from '@shared/care/parameters';
import type { CanonicalValues } from '@shared/readings/normalize-water-test';
import type { WaterTestView } from '@shared/schemas/tank-views';
import type { PhotosByOwner } from '../photos';
import { VALUE_COLUMNS, type WaterTest } from './water-test.entity';

export function valuesOf(t: WaterTest): CanonicalValues {
  const values: CanonicalValues = {};
  for (const key of PARAMETER_KEYS) {
    const v = t[VALUE_COLUMNS[key].property];
    if (v !== null) values[key] = v;
  }
  return values;
}

export function presentWaterTest(t: WaterTest, photos: PhotosByOwner): WaterTestView {
  return {
    id: t.id,
    tankId: t.tankId,
    takenAt: t.takenAt.toISOString(),
    values: valuesOf(t),
    freeAmmonia: t.freeAmmoniaMgL,
    entries: t.entries,
    derived: t.derived,
    note: t.note,
    origin: t.origin,
    createdById: t.createdById,
    createdAt: t.createdAt.toISOString(),
    updatedAt: t.updatedAt.toISOString(),
    photos: photos(t.id),
  };
}
