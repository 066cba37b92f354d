import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { DeskView } from '@shared/schemas/desk.schema';
import { api } from '@client/lib/api-client';

export interface DeskFilters {
  urgentOnly: boolean;
  cycling: boolean;
  unanswered: boolean;
}

export const deskKeys = {
  all: (clubId: string) => ['desk', clubId] as const,
  list: (clubId: string, f: DeskFilters) => [...deskKeys.all(clubId), f] as const,
};

const qs = (f: DeskFilters) =>
  new URLSearchParams(
    Object.entries(f)
      .filter(([, on]) => on)
      .map(([k]) => [k, '1']),
  ).toString();

export const deskQuery = (clubId: string, f: DeskFilters) =>
  queryOptions({
    queryKey: deskKeys.list(clubId, f),
    queryFn: ({ signal }) => api.get<DeskView>(`/clubs/${clubId}/desk?${qs(f)}`, signal),
    placeholderData: keepPreviousData,
    staleTime: 15_000,
  });

export const useDesk = (clubId: string, f: DeskFilters) => useQuery(deskQuery(clubId, f));
