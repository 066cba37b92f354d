import type { DataSource, EntityManager } from 'typeorm';
import type { z } from 'zod';
import type { photoUploadFieldsSchema } from '@shared/schemas/photo.schema';
import { Photo } from './photo.entity';
import type { ProcessedPhoto } from './photo-processing';
import { discard, newStorageKey, publish, stage, type StagedFile } from './photo-storage';

export type PhotoFields = z.output<typeof photoUploadFieldsSchema>;

/**
 * Saves processed photos so that nothing is left half-written: files go to temporary names first, the rows are
 * inserted and the files renamed inside one transaction, and any failure removes every file written. `checkParent`
 * runs first in that transaction: the owner of the tank's records says whether the test or event named is the tank's.
 */
export async function storePhotos(
  dataSource: DataSource,
  uploadsDir: string,
  owner: { tankId: string; checkParent: (tx: EntityManager) => Promise<void> },
  fields: PhotoFields,
  photos: readonly ProcessedPhoto[],
  actorId: string,
): Promise<Photo[]> {
  const staged: StagedFile[] = [];
  try {
    const keyed: { key: string; photo: ProcessedPhoto }[] = [];
    for (const photo of photos) {
      const key = newStorageKey();
      staged.push(
        await stage(uploadsDir, key, 'full', photo.full),
        await stage(uploadsDir, key, 'thumb', photo.thumb),
      );
      keyed.push({ key, photo });
    }
    return await dataSource.transaction(async (tx) => {
      await owner.checkParent(tx);
      const rows: Photo[] = [];
      for (const { key, photo } of keyed) {
        rows.push(
          await tx.save(
            tx.create(Photo, {
              tankId: owner.tankId,
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
