import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CreateTankInput, UpdateTankInput } from '@shared/schemas/tank.schema';
import type { TankDetailView, TankView } from '@shared/schemas/tank-views';
import { api } from '@client/lib/api-client';
import { useUploadPhotos } from '@client/lib/photos';
import { useSaveWithPhotos } from '@client/lib/save-with-photos';
import { tankKeys, useTankRecordsChanged } from '@client/lib/tank-keys';

const base = (clubId: string) => `/clubs/${clubId}/tanks`;

export const tankListQuery = (clubId: string, filters: { mine: boolean; includeArchived: boolean }) =>
  queryOptions({
    queryKey: tankKeys.list(clubId, filters),
    queryFn: ({ signal }) => {
      const qs = new URLSearchParams();
      if (filters.mine) qs.set('mine', '1');
      if (filters.includeArchived) qs.set('includeArchived', '1');
      return api.get<{ tanks: TankView[] }>(`${base(clubId)}?${qs}`, signal);
    },
  });

export const tankQuery = (clubId: string, tankId: string) =>
  queryOptions({
    queryKey: tankKeys.detail(clubId, tankId),
    queryFn: ({ signal }) =>
      api.get<{ tank: TankDetailView }>(`${base(clubId)}/${tankId}`, signal).then((r) => r.tank),
  });

export const useTankList = (clubId: string, filters: { mine: boolean; includeArchived: boolean }) =>
  useQuery(tankListQuery(clubId, filters));
export const useTank = (clubId: string, tankId: string) => useQuery(tankQuery(clubId, tankId));

/** After a tank changes: the answer is its new detail; its records, the lists and its care (a new phase is judged anew) refetch. */
function useTankChanged(clubId: string) {
  const qc = useQueryClient();
  const changed = useTankRecordsChanged(clubId);
  return async (tank: TankDetailView) => {
    qc.setQueryData(tankQuery(clubId, tank.id).queryKey, tank);
    await changed(tank.id);
  };
}

export function useCreateTank(clubId: string) {
  const changed = useTankChanged(clubId);
  return useMutation({
    mutationFn: (input: CreateTankInput) =>
      api.post<{ tank: TankDetailView }>(base(clubId), input).then((r) => r.tank),
    onSuccess: changed,
  });
}

export function useUpdateTank(clubId: string, tankId: string) {
  const changed = useTankChanged(clubId);
  return useMutation({
    mutationFn: (input: UpdateTankInput) =>
      api.patch<{ tank: TankDetailView }>(`${base(clubId)}/${tankId}`, input).then((r) => r.tank),
    onSuccess: changed,
  });
}

export function useSetArchived(clubId: string, tankId: string) {
  const changed = useTankChanged(clubId);
  return useMutation({
    mutationFn: (archived: boolean) =>
      api
        .post<{ tank: TankDetailView }>(`${base(clubId)}/${tankId}/${archived ? 'archive' : 'restore'}`)
        .then((r) => r.tank),
    onSuccess: changed,
  });
}

/** The tank form's save: a new tank (no `tankId`) or changes to one, stored once, then its photo (retried alone). */
export function useSaveTank(clubId: string, tankId?: string) {
  const create = useCreateTank(clubId);
  const update = useUpdateTank(clubId, tankId ?? '');
  const upload = useUploadPhotos(clubId);
  return useSaveWithPhotos(
    (input: CreateTankInput) => (tankId ? update.mutateAsync(input) : create.mutateAsync(input)),
    (tank, files) => upload.mutateAsync({ tankId: tank.id, files }),
  );
}
