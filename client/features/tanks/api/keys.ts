/** Every cache key of the tanks feature. Invalidating `tank(...)` refreshes everything logged on that tank. */
export const tankKeys = {
  all: (clubId: string) => ['tanks', clubId] as const,
  lists: (clubId: string) => [...tankKeys.all(clubId), 'list'] as const,
  list: (clubId: string, filters: { mine: boolean; includeArchived: boolean }) => [...tankKeys.lists(clubId), filters] as const,
  tank: (clubId: string, tankId: string) => [...tankKeys.all(clubId), 'tank', tankId] as const,
  tests: (clubId: string, tankId: string) => [...tankKeys.tank(clubId, tankId), 'tests'] as const,
  testsSince: (clubId: string, tankId: string, from: string | null) => [...tankKeys.tests(clubId, tankId), 'since', from] as const,
  recentTests: (clubId: string, tankId: string) => [...tankKeys.tests(clubId, tankId), 'recent'] as const,
  test: (clubId: string, tankId: string, testId: string) => [...tankKeys.tests(clubId, tankId), 'one', testId] as const,
  waterChanges: (clubId: string, tankId: string) => [...tankKeys.tank(clubId, tankId), 'events', 'water-change'] as const,
  timeline: (clubId: string, tankId: string) => [...tankKeys.tank(clubId, tankId), 'timeline'] as const,
  photos: (clubId: string, tankId: string) => [...tankKeys.tank(clubId, tankId), 'photos'] as const,
};
