import type { DataSource } from 'typeorm';
import { createLivestockSchema, createTankSchema } from '../../../shared/schemas/tank.schema';
import { createTankEventSchema } from '../../../shared/schemas/tank-event.schema';
import { createWaterTestSchema } from '../../../shared/schemas/water-test.schema';
import { processPhoto } from '../../../server/modules/photos/photo-processing';
import { storePhotos } from '../../../server/modules/photos/photo.service';
import { addLivestock } from '../../../server/modules/tanks/livestock.service';
import { createTankEvent } from '../../../server/modules/tanks/tank-event.service';
import { createTank } from '../../../server/modules/tanks/tank.service';
import { createWaterTest } from '../../../server/modules/tanks/water-test.service';
import { png } from '../../helpers/images';

/** A tank with one of everything logged on it, owned by `ownerId`, written through the services. */
export async function tankWithHistory(ds: DataSource, clubId: string, ownerId: string, name: string, uploadsDir: string) {
  const tank = await ds.transaction((tx) =>
    createTank(tx, clubId, ownerId, createTankSchema.parse({ name, systemType: 'reef', volume: { source: 'entered', value: 200 } })),
  );
  const day = new Date(Date.now() - 86_400_000);
  const { test: waterTest } = await ds.transaction((tx) =>
    createWaterTest(tx, tank, createWaterTestSchema.parse({ takenAt: day.toISOString(), entries: { pH: { value: 8.1 }, ammonia: { value: 0, unit: 'mg/L NH3' } } }), ownerId),
  );
  const livestock = await ds.transaction((tx) =>
    addLivestock(tx, tank, createLivestockSchema.parse({ speciesCommonName: 'Invented goby', count: 1, addedOn: day.toISOString().slice(0, 10) }), ownerId),
  );
  const event = await ds.transaction((tx) =>
    createTankEvent(tx, tank, createTankEventSchema.parse({ kind: 'feeding-note', occurredAt: day.toISOString(), details: { food: 'frozen mysis' } }), ownerId),
  );
  const [photo] = await storePhotos(ds, uploadsDir, tank, { caption: '' }, [await processPhoto({ buffer: await png(), originalname: 'tank.png' }, 0)], ownerId);
  return { tank, waterTest, livestock, event, photo: photo! };
}
