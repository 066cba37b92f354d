import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page, WaterTestView } from '@shared/schemas/tank-views';
import { api } from '@client/lib/api-client';
import { tankKeys } from '@client/lib/tank-keys';

/** The last few tests of a tank: enough for its card's latest figure of each parameter and the time of the last test. */
export const recentTestsQuery = (clubId: string, tankId: string) =>
  queryOptions({
    queryKey: tankKeys.recentTests(clubId, tankId),
    queryFn: ({ signal }) =>
      api
        .get<Page<WaterTestView>>(`/clubs/${clubId}/tanks/${tankId}/water-tests?limit=20`, signal)
        .then((p) => p.items),
  });

export const useRecentTests = (clubId: string, tankId: string) => useQuery(recentTestsQuery(clubId, tankId));
