import { In, type EntityManager } from 'typeorm';
import type { PhotoView } from '@shared/schemas/tank-views';
import { Photo } from './photo.entity';
import { presentPhoto } from './photo.presenter';

export type PhotosByOwner = (id: string) => PhotoView[];

/** Photos of the given water tests and events, looked up by their parent's id (oldest first). */
export async function photosOf(
  manager: EntityManager,
  clubId: string,
  parents: { waterTestIds?: readonly string[]; eventIds?: readonly string[] },
): Promise<PhotosByOwner> {
  const testIds = [...(parents.waterTestIds ?? [])];
  const eventIds = [...(parents.eventIds ?? [])];
  const where = [
    ...(testIds.length ? [{ waterTestId: In(testIds) }] : []),
    ...(eventIds.length ? [{ eventId: In(eventIds) }] : []),
  ];
  const byParent = new Map<string, PhotoView[]>();
  if (where.length) {
    const rows = await manager.find(Photo, { where, order: { createdAt: 'ASC', id: 'ASC' } });
    for (const p of rows) {
      const key = p.waterTestId ?? p.eventId;
      if (key) byParent.set(key, [...(byParent.get(key) ?? []), presentPhoto(p, clubId)]);
    }
  }
  return (id) => byParent.get(id) ?? [];
}

/** Storage keys of every photo hanging off these rows, so their files can go when the rows do. */
export async function storageKeysOf(
  manager: EntityManager,
  parents: { waterTestIds?: string[]; eventIds?: string[]; tankId?: string },
): Promise<string[]> {
  const where = [
    ...(parents.waterTestIds?.length ? [{ waterTestId: In(parents.waterTestIds) }] : []),
    ...(parents.eventIds?.length ? [{ eventId: In(parents.eventIds) }] : []),
    ...(parents.tankId ? [{ tankId: parents.tankId }] : []),
  ];
  if (!where.length) return [];
  const rows = await manager.find(Photo, { where, select: { storageKey: true } });
  return rows.map((r) => r.storageKey);
}

/** A tank's photos, newest first; only those of one test or event when asked. */
export async function photosOfTank(
  manager: EntityManager,
  tankId: string,
  filter: { waterTestId?: string; eventId?: string },
): Promise<Photo[]> {
  return manager.find(Photo, {
    where: {
      tankId,
      ...(filter.waterTestId ? { waterTestId: filter.waterTestId } : {}),
      ...(filter.eventId ? { eventId: filter.eventId } : {}),
    },
    order: { createdAt: 'DESC', id: 'DESC' },
  });
}

export async function findPhoto(manager: EntityManager, photoId: string): Promise<Photo | null> {
  return manager.findOneBy(Photo, { id: photoId });
}

export async function deletePhotoRow(manager: EntityManager, photoId: string): Promise<void> {
  await manager.delete(Photo, { id: photoId });
}
