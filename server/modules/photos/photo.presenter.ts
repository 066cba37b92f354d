import type { PhotoView } from '@shared/schemas/tank-views';
import type { Photo } from './photo.entity';

export function presentPhoto(p: Photo, clubId: string): PhotoView {
  const url = `/api/clubs/${clubId}/photos/${p.id}`;
  return {
    id: p.id,
    tankId: p.tankId,
    waterTestId: p.waterTestId,
    eventId: p.eventId,
    caption: p.caption,
    width: p.width,
    height: p.height,
    url,
    thumbUrl: `${url}/thumb`,
    createdAt: p.createdAt.toISOString(),
  };
}
