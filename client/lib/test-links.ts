import { isParameterKey, type ParameterKey } from '@shared/care/parameters';

/** The search parameter that tells the water-test form which readings to put first, e.g. `?first=ammonia,nitrite`. */
export const FIRST_READINGS_PARAM = 'first';

/** The water-test form of a tank, with `first` (the tests due, say) at the top in that order. */
export function logTestPath(tankId: string, first: readonly ParameterKey[] = []): string {
  const base = `/tanks/${tankId}/tests/new`;
  return first.length
    ? `${base}?${new URLSearchParams({ [FIRST_READINGS_PARAM]: first.join(',') }).toString()}`
    : base;
}

/** The readings a link asked to put first; unknown names and repeats are dropped (a hand-edited URL is no error). */
export function firstReadingsFrom(search: URLSearchParams): ParameterKey[] {
  const raw = search.get(FIRST_READINGS_PARAM) ?? '';
  return [
    ...new Set(
      raw
        .split(',')
        .map((s) => s.trim())
        .filter(isParameterKey),
    ),
  ];
}
