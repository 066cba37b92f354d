import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CycleStageResult, DueTest, ReadinessItem, Severity } from '@shared/care';
import type { ReadinessChecklistInput } from '@shared/schemas/concern.schema';
import { api } from '@client/lib/api-client';
import { careKeys } from '@client/lib/tank-keys';

export interface ConcernView {
  id: string;
  tankId: string;
  waterTestId: string | null;
  rule: string;
  parameter: string;
  severity: Severity;
  reason: string;
  nextSteps: string[];
  value: number | null;
  unit: string | null;
  status: 'open' | 'acknowledged' | 'resolved';
  raisedAt: string;
  lastSeenAt: string;
  acknowledged: { byId: string | null; at: string; note: string | null } | null;
  resolved: { byId: string | null; at: string; note: string | null; byTest: boolean } | null;
}

export interface CareSummary {
  profile: { key: string; name: string; version: number; animals: string };
  cycle: CycleStageResult;
  cycleTypical: {
    typicalMin: number;
    typicalMax: number;
    rangeMin: number;
    rangeMax: number;
    provenance: string;
  };
  due: DueTest[];
  readiness: {
    ready: boolean;
    items: ReadinessItem[];
    checklist: { equipmentRunning: boolean; quarantinePlan: boolean; foodReady: boolean };
    notes: string;
    signOff: { mentorId: string; signedAt: string; note: string } | null;
  };
  concerns: ConcernView[];
}

export const careSummaryQuery = (clubId: string, tankId: string) =>
  queryOptions({
    queryKey: careKeys.summary(tankId),
    queryFn: ({ signal }) => api.get<CareSummary>(`/clubs/${clubId}/tanks/${tankId}/care`, signal),
  });

export const concernHistoryQuery = (clubId: string, tankId: string) =>
  queryOptions({
    queryKey: careKeys.concerns(tankId, 'all'),
    queryFn: ({ signal }) =>
      api.get<{ concerns: ConcernView[] }>(`/clubs/${clubId}/tanks/${tankId}/concerns?status=all`, signal),
  });

export const useCareSummary = (clubId: string, tankId: string) => useQuery(careSummaryQuery(clubId, tankId));
export const useConcernHistory = (clubId: string, tankId: string, enabled: boolean) =>
  useQuery({ ...concernHistoryQuery(clubId, tankId), enabled });

function useTankCareMutation<I>(tankId: string, fn: (input: I) => Promise<unknown>) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: () => qc.invalidateQueries({ queryKey: careKeys.tank(tankId) }),
  });
}

export const useConcernAction = (clubId: string, tankId: string) =>
  useTankCareMutation(tankId, (i: { concernId: string; action: 'acknowledge' | 'resolve'; note: string }) =>
    api.post(`/clubs/${clubId}/concerns/${i.concernId}/${i.action}`, { note: i.note }),
  );
export const useSaveChecklist = (clubId: string, tankId: string) =>
  useTankCareMutation(tankId, (i: ReadinessChecklistInput) =>
    api.put(`/clubs/${clubId}/tanks/${tankId}/readiness`, i),
  );
export const useSignOff = (clubId: string, tankId: string) =>
  useTankCareMutation(tankId, (i: { note: string }) =>
    api.post(`/clubs/${clubId}/tanks/${tankId}/sign-off`, i),
  );
export const useWithdrawSignOff = (clubId: string, tankId: string) =>
  useTankCareMutation(tankId, () => api.delete(`/clubs/${clubId}/tanks/${tankId}/sign-off`));
