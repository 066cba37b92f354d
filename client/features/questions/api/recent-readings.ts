import { queryOptions, useQuery } from '@tanstack/react-query';
import type { Page, TankEventView, WaterTestView } from '@shared/schemas/tank-views';
import { api } from '@client/lib/api-client';
import { questionKeys } from './questions';

const RECENT = 5;

/** The last few tests and observations of a tank: what a keeper most often asks about. */
export const recentReadingsQuery = (clubId: string, tankId: string) =>
  queryOptions({
    queryKey: [...questionKeys.all(clubId), 'recent-readings', tankId] as const,
    queryFn: async ({ signal }) => {
      const base = `/clubs/${clubId}/tanks/${tankId}`;
      const [tests, observations] = await Promise.all([
        api.get<Page<WaterTestView>>(`${base}/water-tests?limit=${RECENT}`, signal),
        api.get<Page<TankEventView<'observation'>>>(
          `${base}/events?kind=observation&limit=${RECENT}`,
          signal,
        ),
      ]);
      return { tests: tests.items, observations: observations.items };
    },
  });

export const useRecentReadings = (clubId: string, tankId: string) =>
  useQuery(recentReadingsQuery(clubId, tankId));
