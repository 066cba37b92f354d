import { useMutation } from '@tanstack/react-query';
import type { CreateLivestockInput, UpdateLivestockInput } from '@shared/schemas/tank.schema';
import type { LivestockView } from '@shared/schemas/tank-views';
import { api } from '@client/lib/api-client';
import { useTankRecordsChanged } from '@client/lib/tank-keys';

const base = (clubId: string, tankId: string) => `/clubs/${clubId}/tanks/${tankId}/livestock`;

/** Animals change the tank's detail, its timeline and its readiness for more: all of it refetches. */
export function useAddLivestock(clubId: string, tankId: string) {
  const changed = useTankRecordsChanged(clubId);
  return useMutation({
    mutationFn: (input: CreateLivestockInput) =>
      api.post<{ livestock: LivestockView }>(base(clubId, tankId), input).then((r) => r.livestock),
    onSuccess: () => changed(tankId),
  });
}

export function useUpdateLivestock(clubId: string, tankId: string) {
  const changed = useTankRecordsChanged(clubId);
  return useMutation({
    mutationFn: ({ id, ...input }: UpdateLivestockInput & { id: string }) =>
      api
        .patch<{ livestock: LivestockView }>(`${base(clubId, tankId)}/${id}`, input)
        .then((r) => r.livestock),
    onSuccess: () => changed(tankId),
  });
}
