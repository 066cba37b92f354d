import { createLivestockSchema, createTankSchema } from '@shared/schemas/tank.schema';
import { createTankEventSchema } from '@shared/schemas/tank-event.schema';
import { createWaterTestSchema } from '@shared/schemas/water-test.schema';
import type { Deps } from '@server/deps';
import {
  addLivestock,
  attachPhotos,
  createTank,
  createTankEvent,
  createWaterTest,
} from '@server/modules/tanks';
import { png } from '@tests/helpers/images';
import { DAY_MS } from '@shared/care/time';

/** A tank with one of everything logged on it, owned by `ownerId`, written through the services. */
export async function tankWithHistory(deps: Deps, clubId: string, ownerId: string, name: string) {
  const ds = deps.dataSource;
  const tank = await ds.transaction((tx) =>
    createTank(
      tx,
      clubId,
      ownerId,
      createTankSchema.parse({ name, systemType: 'reef', volume: { source: 'entered', value: 200 } }),
    ),
  );
  const day = new Date(Date.now() - DAY_MS);
  const { test: waterTest } = await ds.transaction((tx) =>
    createWaterTest(
      tx,
      deps,
      tank,
      createWaterTestSchema.parse({
        takenAt: day.toISOString(),
        entries: { pH: { value: 8.1 }, ammonia: { value: 0, unit: 'mg/L NH3' } },
      }),
      ownerId,
    ),
  );
  const livestock = await ds.transaction((tx) =>
    addLivestock(
      tx,
      deps,
      tank,
      createLivestockSchema.parse({
        speciesCommonName: 'Invented goby',
        count: 1,
        addedOn: day.toISOString().slice(0, 10),
      }),
      ownerId,
    ),
  );
  const event = await ds.transaction((tx) =>
    createTankEvent(
      tx,
      tank,
      createTankEventSchema.parse({
        kind: 'feeding-note',
        occurredAt: day.toISOString(),
        details: { food: 'frozen mysis' },
      }),
      ownerId,
    ),
  );
  const [photo] = await attachPhotos(
    ds,
    deps.config.uploadsDir,
    tank,
    { caption: '' },
    [{ buffer: await png(), originalname: 'tank.png' }],
    ownerId,
  );
  return { tank, waterTest, livestock, event, photo: photo! };
}
