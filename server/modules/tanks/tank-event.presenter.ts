import type { TankEventDetails } from '@shared/schemas/tank-event.schema';
import type { TankEventView } from '@shared/schemas/tank-views';
import type { PhotosByOwner } from '../photos';
import type { TankEvent } from './tank-event.entity';

export function presentTankEvent(e: TankEvent, photos: PhotosByOwner): TankEventView {
  return {
    id: e.id,
    tankId: e.tankId,
    kind: e.kind,
    occurredAt: e.occurredAt.toISOString(),
    note: e.note,
    details: e.details as TankEventDetails,
    computed: e.computed,
    livestockId: e.livestockId,
    createdById: e.createdById,
    createdAt: e.createdAt.toISOString(),
    updatedAt: e.updatedAt.toISOString(),
    photos: photos(e.id),
  };
}
