export const DAY_MS = 86_400_000;

const DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

function digits(s: string, from: number, count: number): number {
  let n = 0;
  for (let i = from; i < from + count; i++) {
    const d = s.charCodeAt(i) - 48;
    if (d < 0 || d > 9) return -1;
    n = n * 10 + d;
  }
  return n;
}

/** Days from 1970-01-01 to a proleptic Gregorian date (H. Hinnant, "chrono-Compatible Low-Level Date Algorithms", days_from_civil). */
function daysFromCivil(year: number, month: number, day: number): number {
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yoe = y - era * 400;
  const doy = Math.floor((153 * (month + (month > 2 ? -3 : 9)) + 2) / 5) + day - 1;
  const doe = yoe * 365 + Math.floor(yoe / 4) - Math.floor(yoe / 100) + doy;
  return era * 146097 + doe - 719468;
}

/**
 * Milliseconds for the exact shape `toISOString()` writes (`2025-03-01T09:00:00.000Z`, valid fields), or
 * null for anything else. Reading it by hand is several times faster than Date.parse, and the engine reads
 * every test's time; other shapes go to Date.parse, so the answer is always Date.parse's.
 */
function canonicalMs(iso: string): number | null {
  if (iso.length !== 24 || iso.charCodeAt(4) !== 45 || iso.charCodeAt(7) !== 45 || iso.charCodeAt(10) !== 84)
    return null;
  if (
    iso.charCodeAt(13) !== 58 ||
    iso.charCodeAt(16) !== 58 ||
    iso.charCodeAt(19) !== 46 ||
    iso.charCodeAt(23) !== 90
  )
    return null;
  const year = digits(iso, 0, 4);
  const month = digits(iso, 5, 2);
  const day = digits(iso, 8, 2);
  const hour = digits(iso, 11, 2);
  const minute = digits(iso, 14, 2);
  const second = digits(iso, 17, 2);
  const milli = digits(iso, 20, 3);
  if (year < 0 || month < 1 || month > 12 || day < 1 || hour < 0 || hour > 23) return null;
  if (minute < 0 || minute > 59 || second < 0 || second > 59 || milli < 0) return null;
  const leap = month === 2 && year % 4 === 0 && (year % 100 !== 0 || year % 400 === 0);
  if (day > (DAYS_IN_MONTH[month - 1] as number) + (leap ? 1 : 0)) return null;
  return (
    daysFromCivil(year, month, day) * DAY_MS + hour * 3_600_000 + minute * 60_000 + second * 1000 + milli
  );
}

export function toMs(iso: string): number {
  const fast = canonicalMs(iso);
  if (fast !== null) return fast;
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
  // A canonical UTC timestamp already starts with its date: toISOString would write the same string back.
  return canonicalMs(iso) === null ? toIso(toMs(iso)).slice(0, 10) : iso.slice(0, 10);
}
