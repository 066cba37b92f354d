/** Helpers for the strings a form holds. */

const DECIMAL = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)$/;

/** "8,2" and "8.2" are both 8.2 (phone keypads in many languages only offer a comma); "" is no value; junk is NaN. */
export function parseDecimal(text: string): number | undefined {
  const t = text.trim();
  if (t === '') return undefined;
  return DECIMAL.test(t) ? Number(t.replace(',', '.')) : Number.NaN;
}

export const trimmedOrUndefined = (text: string): string | undefined =>
  text.trim() === '' ? undefined : text.trim();

const pad = (n: number) => String(n).padStart(2, '0');

/** A time as a datetime-local input shows it, in the device's time zone. */
export function toLocalInput(date: Date): string {
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}T${pad(date.getHours())}:${pad(date.getMinutes())}`;
}

/** A datetime-local value as an ISO instant; anything unreadable is passed through for the schema to name. */
export function localInputToIso(value: string): string {
  const ms = Date.parse(value);
  return Number.isNaN(ms) || value.trim() === '' ? value : new Date(ms).toISOString();
}

/** Today as YYYY-MM-DD in the device's time zone. */
export function todayIsoDate(now = new Date()): string {
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}
