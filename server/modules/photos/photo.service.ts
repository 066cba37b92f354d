import type { DataSource, EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { photoUploadFieldsSchema } from '../../../shared/schemas/photo.schema';
import { errors } from '../../lib/app-error';
import type { Tank } from '../tanks/tank.entity';
import { TankEvent } from '../tanks/tank-event.entity';
import { WaterTest } from '../tanks/water-test.entity';
import { Photo } from './photo.entity';
import type { ProcessedPhoto } from './photo-processing';
import { discard, newStorageKey, publish, stage, type StagedFile } from './photo-storage';

type Fields = z.output<typeof photoUploadFieldsSchema>;

async function checkParent(tx: EntityManager, tank: Tank, fields: Fields): Promise<void> {
  if (fields.waterTestId && !(await tx.existsBy(WaterTest, { id: fields.waterTestId, tankId: tank.id }))) {
    throw errors.badRequest('Check what the photo belongs to.', [{ path: 'waterTestId', message: 'That water test is not on this tank.' }]);
  }
  if (fields.eventId && !(await tx.existsBy(TankEvent, { id: fields.eventId, tankId: tank.id }))) {
    throw errors.badRequest('Check what the photo belongs to.', [{ path: 'eventId', message: 'That entry is not on this tank.' }]);
  }
}

/**
 * Saves processed photos so that nothing is left half-written: files go to temporary names first, the rows are
 * inserted and the files renamed inside one transaction, and any failure removes every file written.
 */
export async function storePhotos(
  dataSource: DataSource,
  uploadsDir: string,
  tank: Tank,
  fields: Fields,
  photos: readonly ProcessedPhoto[],
  actorId: string,
): Promise<Photo[]> {
  const staged: StagedFile[] = [];
  try {
    const keyed: { key: string; photo: ProcessedPhoto }[] = [];
    for (const photo of photos) {
      const key = newStorageKey();
      staged.push(await stage(uploadsDir, key, 'full', photo.full), await stage(uploadsDir, key, 'thumb', photo.thumb));
      keyed.push({ key, photo });
    }
    return await dataSource.transaction(async (tx) => {
      await checkParent(tx, tank, fields);
      const rows: Photo[] = [];
      for (const { key, photo } of keyed) {
        rows.push(
          await tx.save(
            tx.create(Photo, {
              tankId: tank.id,
              waterTestId: fields.waterTestId ?? null,
              eventId: fields.eventId ?? null,
              storageKey: key,
              caption: fields.caption,
              width: photo.width,
              height: photo.height,
              bytes: photo.full.length,
              originalType: photo.originalType,
              uploadedById: actorId,
            }),
          ),
        );
      }
      await publish(staged);
      return rows;
    });
  } catch (error) {
    await discard(staged);
    throw error;
  }
}
