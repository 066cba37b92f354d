import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CreateWaterTestInput, UpdateWaterTestInput } from '../../../../shared/schemas/water-test.schema';
import type { Page, WaterTestSaved, WaterTestView } from '../../../../shared/schemas/tank-views';
import { api } from '../../../lib/api-client';
import { tankKeys } from './keys';

const base = (clubId: string, tankId: string) => `/clubs/${clubId}/tanks/${tankId}/water-tests`;
/** The largest page the server gives. */
const PAGE = 1000;

/** Every test since `from` (all of them when null), newest first, read page by page. */
export const testsSinceQuery = (clubId: string, tankId: string, from: string | null) =>
  queryOptions({
    queryKey: tankKeys.testsSince(clubId, tankId, from),
    queryFn: async ({ signal }) => {
      const items: WaterTestView[] = [];
      let before: string | null = null;
      do {
        const qs = new URLSearchParams({ limit: String(PAGE) });
        if (from) qs.set('from', from);
        if (before) qs.set('before', before);
        const page: Page<WaterTestView> = await api.get<Page<WaterTestView>>(`${base(clubId, tankId)}?${qs}`, signal);
        items.push(...page.items);
        before = page.nextCursor;
      } while (before);
      return items;
    },
  });

/** The last few tests: enough for a card's latest figure of each parameter. */
export const recentTestsQuery = (clubId: string, tankId: string) =>
  queryOptions({
    queryKey: tankKeys.recentTests(clubId, tankId),
    queryFn: ({ signal }) => api.get<Page<WaterTestView>>(`${base(clubId, tankId)}?limit=20`, signal).then((p) => p.items),
  });

export const waterTestQuery = (clubId: string, tankId: string, testId: string) =>
  queryOptions({
    queryKey: tankKeys.test(clubId, tankId, testId),
    queryFn: ({ signal }) => api.get<{ waterTest: WaterTestView }>(`${base(clubId, tankId)}/${testId}`, signal).then((r) => r.waterTest),
  });

export const useTestsSince = (clubId: string, tankId: string, from: string | null) => useQuery(testsSinceQuery(clubId, tankId, from));
export const useRecentTests = (clubId: string, tankId: string) => useQuery(recentTestsQuery(clubId, tankId));
export const useWaterTest = (clubId: string, tankId: string, testId: string) => useQuery(waterTestQuery(clubId, tankId, testId));

/** A saved test changes charts, the table, the timeline, the tank's last known values and the list cards. */
export function useTankReadingsChanged(clubId: string, tankId: string) {
  const qc = useQueryClient();
  return () => Promise.all([qc.invalidateQueries({ queryKey: tankKeys.tank(clubId, tankId) }), qc.invalidateQueries({ queryKey: tankKeys.lists(clubId) })]);
}

export function useCreateWaterTest(clubId: string, tankId: string) {
  const changed = useTankReadingsChanged(clubId, tankId);
  return useMutation({
    mutationFn: (input: CreateWaterTestInput) => api.post<WaterTestSaved>(base(clubId, tankId), input),
    onSuccess: changed,
  });
}

export function useUpdateWaterTest(clubId: string, tankId: string, testId: string) {
  const changed = useTankReadingsChanged(clubId, tankId);
  return useMutation({
    mutationFn: (input: UpdateWaterTestInput) => api.patch<WaterTestSaved>(`${base(clubId, tankId)}/${testId}`, input),
    onSuccess: changed,
  });
}

export function useDeleteWaterTest(clubId: string, tankId: string) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: (testId: string) => api.delete(`${base(clubId, tankId)}/${testId}`),
    // Everything on the tank refreshes except the deleted test itself, which would only answer 404 now.
    onSuccess: (_done, testId) => {
      const gone = JSON.stringify(tankKeys.test(clubId, tankId, testId));
      void qc.invalidateQueries({ queryKey: tankKeys.tank(clubId, tankId), predicate: (q) => JSON.stringify(q.queryKey) !== gone });
      void qc.invalidateQueries({ queryKey: tankKeys.lists(clubId) });
    },
  });
}
