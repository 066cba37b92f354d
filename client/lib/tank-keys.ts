import { useQueryClient } from '@tanstack/react-query';

/**
 * The cache keys of a tank and what is logged on it, shared by the features that read or change them (tanks,
 * readings, import, care). Invalidating `tankKeys.tank(...)` refreshes everything logged on that tank; its care
 * summary and concerns sit under `careKeys.tank(...)`.
 */
export const tankKeys = {
  all: (clubId: string) => ['tanks', clubId] as const,
  lists: (clubId: string) => [...tankKeys.all(clubId), 'list'] as const,
  list: (clubId: string, filters: { mine: boolean; includeArchived: boolean }) =>
    [...tankKeys.lists(clubId), filters] as const,
  tank: (clubId: string, tankId: string) => [...tankKeys.all(clubId), 'tank', tankId] as const,
  detail: (clubId: string, tankId: string) => [...tankKeys.tank(clubId, tankId), 'detail'] as const,
  tests: (clubId: string, tankId: string) => [...tankKeys.tank(clubId, tankId), 'tests'] as const,
  testsSince: (clubId: string, tankId: string, from: string | null) =>
    [...tankKeys.tests(clubId, tankId), 'since', from] as const,
  recentTests: (clubId: string, tankId: string) => [...tankKeys.tests(clubId, tankId), 'recent'] as const,
  test: (clubId: string, tankId: string, testId: string) =>
    [...tankKeys.tests(clubId, tankId), 'one', testId] as const,
  waterChanges: (clubId: string, tankId: string) =>
    [...tankKeys.tank(clubId, tankId), 'events', 'water-change'] as const,
  timeline: (clubId: string, tankId: string) => [...tankKeys.tank(clubId, tankId), 'timeline'] as const,
  photos: (clubId: string, tankId: string) => [...tankKeys.tank(clubId, tankId), 'photos'] as const,
};

/** The server's judgement of a tank: care summary (cycle, tests due, readiness) and concerns. */
export const careKeys = {
  tank: (tankId: string) => ['care', 'tank', tankId] as const,
  summary: (tankId: string) => [...careKeys.tank(tankId), 'summary'] as const,
  concerns: (tankId: string, status: 'live' | 'all') =>
    [...careKeys.tank(tankId), 'concerns', status] as const,
};

/**
 * After a change to what is logged on a tank (a test, an entry, animals, an import): its records, the list cards
 * that show its latest figures, and its care summary and concerns, which the server re-judged in the same request.
 * `keep` names one key to leave alone, e.g. a test just deleted, which would only answer 404 now.
 */
export function useTankRecordsChanged(clubId: string) {
  const qc = useQueryClient();
  return (tankId: string, keep?: readonly unknown[]) => {
    const kept = keep ? JSON.stringify(keep) : undefined;
    return Promise.all([
      qc.invalidateQueries({
        queryKey: tankKeys.tank(clubId, tankId),
        predicate: (q) => JSON.stringify(q.queryKey) !== kept,
      }),
      qc.invalidateQueries({ queryKey: tankKeys.lists(clubId) }),
      qc.invalidateQueries({ queryKey: careKeys.tank(tankId) }),
    ]);
  };
}
