import type { DataSource, EntityManager } from 'typeorm';
import { errors } from '../../lib/app-error';
import {
  deletePhotoRow,
  processPhoto,
  removePhotoFiles,
  storePhotos,
  type Photo,
  type PhotoFields,
} from '../photos';
import type { Tank } from './tank.entity';
import { TankEvent } from './tank-event.entity';
import { WaterTest } from './water-test.entity';

async function requireParentOnTank(tx: EntityManager, tank: Tank, fields: PhotoFields): Promise<void> {
  if (fields.waterTestId && !(await tx.existsBy(WaterTest, { id: fields.waterTestId, tankId: tank.id }))) {
    throw errors.badRequest('Check what the photo belongs to.', [
      { path: 'waterTestId', message: 'That water test is not on this tank.' },
    ]);
  }
  if (fields.eventId && !(await tx.existsBy(TankEvent, { id: fields.eventId, tankId: tank.id }))) {
    throw errors.badRequest('Check what the photo belongs to.', [
      { path: 'eventId', message: 'That entry is not on this tank.' },
    ]);
  }
}

/** Uploaded photos, checked and re-encoded, stored on the tank or on one of its water tests or events (which must be the tank's). */
export async function attachPhotos(
  dataSource: DataSource,
  uploadsDir: string,
  tank: Tank,
  fields: PhotoFields,
  files: readonly { buffer: Buffer; originalname: string }[],
  actorId: string,
): Promise<Photo[]> {
  if (files.length === 0)
    throw errors.badRequest('Attach at least one photo.', [
      { path: 'photos', message: 'Choose a JPEG, PNG or WebP picture.' },
    ]);
  const photos = [];
  for (const [i, file] of files.entries()) photos.push(await processPhoto(file, i));
  return storePhotos(
    dataSource,
    uploadsDir,
    { tankId: tank.id, checkParent: (tx) => requireParentOnTank(tx, tank, fields) },
    fields,
    photos,
    actorId,
  );
}

/** Deletes a photo's row, then its files. */
export async function deletePhoto(m: EntityManager, uploadsDir: string, photo: Photo): Promise<void> {
  await deletePhotoRow(m, photo.id);
  await removePhotoFiles(uploadsDir, [photo.storageKey]);
}
