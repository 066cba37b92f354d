import { In, type EntityManager } from 'typeorm';
import type { PhotoView } from '../../../shared/schemas/tank-views';
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
  const where = [...(testIds.length ? [{ waterTestId: In(testIds) }] : []), ...(eventIds.length ? [{ eventId: In(eventIds) }] : [])];
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
export async function storageKeysOf(manager: EntityManager, parents: { waterTestIds?: string[]; eventIds?: string[]; tankId?: string }): Promise<string[]> {
  const where = [
    ...(parents.waterTestIds?.length ? [{ waterTestId: In(parents.waterTestIds) }] : []),
    ...(parents.eventIds?.length ? [{ eventId: In(parents.eventIds) }] : []),
    ...(parents.tankId ? [{ tankId: parents.tankId }] : []),
  ];
  if (!where.length) return [];
  const rows = await manager.find(Photo, { where, select: { storageKey: true } });
  return rows.map((r) => r.storageKey);
}
