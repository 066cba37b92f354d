import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CreateTankInput, UpdateTankInput } from '../../../../shared/schemas/tank.schema';
import type { TankDetailView, TankView } from '../../../../shared/schemas/tank-views';
import { api } from '../../../lib/api-client';
import { tankKeys } from './keys';

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
    queryKey: [...tankKeys.tank(clubId, tankId), 'detail'] as const,
    queryFn: ({ signal }) => api.get<{ tank: TankDetailView }>(`${base(clubId)}/${tankId}`, signal).then((r) => r.tank),
  });

export const useTankList = (clubId: string, filters: { mine: boolean; includeArchived: boolean }) => useQuery(tankListQuery(clubId, filters));
export const useTank = (clubId: string, tankId: string) => useQuery(tankQuery(clubId, tankId));

/** After a tank changes: its own data and every list it appears in. */
function useTankChanged(clubId: string) {
  const qc = useQueryClient();
  return async (tank: TankDetailView) => {
    qc.setQueryData(tankQuery(clubId, tank.id).queryKey, tank);
    await Promise.all([qc.invalidateQueries({ queryKey: tankKeys.lists(clubId) }), qc.invalidateQueries({ queryKey: tankKeys.tank(clubId, tank.id) })]);
  };
}

export function useCreateTank(clubId: string) {
  const changed = useTankChanged(clubId);
  return useMutation({
    mutationFn: (input: CreateTankInput) => api.post<{ tank: TankDetailView }>(base(clubId), input).then((r) => r.tank),
    onSuccess: changed,
  });
}

export function useUpdateTank(clubId: string, tankId: string) {
  const changed = useTankChanged(clubId);
  return useMutation({
    mutationFn: (input: UpdateTankInput) => api.patch<{ tank: TankDetailView }>(`${base(clubId)}/${tankId}`, input).then((r) => r.tank),
    onSuccess: changed,
  });
}

export function useSetArchived(clubId: string, tankId: string) {
  const changed = useTankChanged(clubId);
  return useMutation({
    mutationFn: (archived: boolean) => api.post<{ tank: TankDetailView }>(`${base(clubId)}/${tankId}/${archived ? 'archive' : 'restore'}`).then((r) => r.tank),
    onSuccess: changed,
  });
}
