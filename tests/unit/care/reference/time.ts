/**
 * Test-only reference: the straightforward implementation as it was before the engine was made fast,
 * kept unchanged so the oracle tests can prove the fast one gives the same answers. Do not optimise.
 */
export const DAY_MS = 86_400_000;

export function toMs(iso: string): number {
  const ms = Date.parse(iso);
  if (Number.isNaN(ms)) throw new Error(`Not an ISO timestamp: ${iso}`);
  return ms;
}

export function toIso(ms: number): string {
  return new Date(ms).toISOString();
}

export function addDays(iso: string, days: number): string {
  return toIso(toMs(iso) + days * DAY_MS);
}

/** (later − earlier) in days, fractional. */
export function daysBetween(earlier: string, later: string): number {
  return (toMs(later) - toMs(earlier)) / DAY_MS;
}

/** "2024-03-05" — the UTC date, for plain-language reasons. */
export function isoDate(iso: string): string {
  return toIso(toMs(iso)).slice(0, 10);
}
