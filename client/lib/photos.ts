/** A tank's photos (of the tank itself, a test or an entry): one endpoint group that tanks and readings both save to. */
import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { PHOTO_FIELD } from '@shared/constants/photos';
import type { PhotoView } from '@shared/schemas/tank-views';
import { api } from './api-client';
import { tankKeys } from './tank-keys';

const base = (clubId: string, tankId: string) => `/clubs/${clubId}/tanks/${tankId}/photos`;

export const tankPhotosQuery = (clubId: string, tankId: string) =>
  queryOptions({
    queryKey: tankKeys.photos(clubId, tankId),
    queryFn: ({ signal }) =>
      api.get<{ photos: PhotoView[] }>(base(clubId, tankId), signal).then((r) => r.photos),
  });
/** `enabled` waits for the tank itself: a reader who may not see it is told once, by the tank's own answer. */
export const useTankPhotos = (clubId: string, tankId: string, enabled = true) =>
  useQuery({ ...tankPhotosQuery(clubId, tankId), enabled });

export interface PhotoUpload {
  tankId: string;
  files: File[];
  waterTestId?: string;
  eventId?: string;
  caption?: string;
}

export function useUploadPhotos(clubId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ tankId, files, waterTestId, eventId, caption }: PhotoUpload) => {
      const form = new FormData();
      if (waterTestId) form.set('waterTestId', waterTestId);
      if (eventId) form.set('eventId', eventId);
      if (caption) form.set('caption', caption);
      for (const f of files) form.append(PHOTO_FIELD, f);
      return api.post<{ photos: PhotoView[] }>(base(clubId, tankId), form).then((r) => r.photos);
    },
    onSuccess: (_photos, { tankId }) => qc.invalidateQueries({ queryKey: tankKeys.tank(clubId, tankId) }),
  });
}
