import { queryOptions, useInfiniteQuery, useMutation, useQuery } from '@tanstack/react-query';
import type { CreateTankEventInput } from '@shared/schemas/tank-event.schema';
import type { Page, TankEventView, TimelineItem } from '@shared/schemas/tank-views';
import { api } from '@client/lib/api-client';
import { useUploadPhotos } from '@client/lib/photos';
import type { SavedNotice } from '@client/lib/saved-notice';
import { useSaveWithPhotos } from '@client/lib/save-with-photos';
import { tankKeys, useTankRecordsChanged } from '@client/lib/tank-keys';
import { eventNotice } from '../lib/saved-notices';

const tankPath = (clubId: string, tankId: string) => `/clubs/${clubId}/tanks/${tankId}`;

/** Water changes, for the reference lines on the charts. */
export const waterChangesQuery = (clubId: string, tankId: string) =>
  queryOptions({
    queryKey: tankKeys.waterChanges(clubId, tankId),
    queryFn: ({ signal }) =>
      api
        .get<Page<TankEventView<'water-change'>>>(
          `${tankPath(clubId, tankId)}/events?kind=water-change&limit=500`,
          signal,
        )
        .then((p) => p.items),
  });
export const useWaterChanges = (clubId: string, tankId: string) =>
  useQuery(waterChangesQuery(clubId, tankId));

const TIMELINE_PAGE = 20;

export function useTimeline(clubId: string, tankId: string) {
  return useInfiniteQuery({
    queryKey: tankKeys.timeline(clubId, tankId),
    initialPageParam: null as string | null,
    queryFn: ({ pageParam, signal }) => {
      const qs = new URLSearchParams({ limit: String(TIMELINE_PAGE) });
      if (pageParam) qs.set('before', pageParam);
      return api.get<Page<TimelineItem>>(`${tankPath(clubId, tankId)}/timeline?${qs}`, signal);
    },
    getNextPageParam: (last) => last.nextCursor,
  });
}

/** An entry changes the timeline, the charts' water-change lines and the tank's care (a water change can clear a concern). */
export function useCreateTankEvent(clubId: string, tankId: string) {
  const changed = useTankRecordsChanged(clubId);
  return useMutation({
    mutationFn: (input: CreateTankEventInput) =>
      api.post<{ event: TankEventView }>(`${tankPath(clubId, tankId)}/events`, input).then((r) => r.event),
    onSuccess: () => changed(tankId),
  });
}

/** The entry form's save: the entry stored once, then its photo (retried alone); resolves to the tank page's notice. */
export function useSaveTankEvent(clubId: string, tankId: string) {
  const create = useCreateTankEvent(clubId, tankId);
  const upload = useUploadPhotos(clubId);
  const save = useSaveWithPhotos(create.mutateAsync, (event: TankEventView, files) =>
    upload.mutateAsync({ tankId, files, eventId: event.id }),
  );
  return async (input: CreateTankEventInput, photos: File[]): Promise<SavedNotice> =>
    eventNotice(await save(input, photos));
}
