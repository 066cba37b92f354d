import { useMutation } from '@tanstack/react-query';
import type { CreateLivestockInput, UpdateLivestockInput } from '../../../../shared/schemas/tank.schema';
import type { LivestockView } from '../../../../shared/schemas/tank-views';
import { api } from '../../../lib/api-client';
import { useTankReadingsChanged } from './water-tests';

const base = (clubId: string, tankId: string) => `/clubs/${clubId}/tanks/${tankId}/livestock`;

export function useAddLivestock(clubId: string, tankId: string) {
  const changed = useTankReadingsChanged(clubId, tankId);
  return useMutation({
    mutationFn: (input: CreateLivestockInput) => api.post<{ livestock: LivestockView }>(base(clubId, tankId), input).then((r) => r.livestock),
    onSuccess: changed,
  });
}

export function useUpdateLivestock(clubId: string, tankId: string) {
  const changed = useTankReadingsChanged(clubId, tankId);
  return useMutation({
    mutationFn: ({ id, ...input }: UpdateLivestockInput & { id: string }) =>
      api.patch<{ livestock: LivestockView }>(`${base(clubId, tankId)}/${id}`, input).then((r) => r.livestock),
    onSuccess: changed,
  });
}
