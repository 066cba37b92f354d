/**
 * UK summer time starts at 01:00 UTC on the last Sunday of March and ends at 01:00 UTC on the last Sunday of
 * October (The Summer Time Order 2002, UK SI 2002/262; the same dates as Directive 2000/84/EC of the European
 * Parliament and Council, 2001).
 */
export function lastSundayOfMarch(year: number): Date {
  const d = new Date(Date.UTC(year, 2, 31, 1));
  d.setUTCDate(31 - d.getUTCDay());
  return d;
}

/** Thursdays a week apart either side of next year's change to summer time, as club wall-clock dates. */
export function thursdaysAroundSpringChange(now = new Date()): {
  before: string;
  after: string;
  change: Date;
} {
  const change = lastSundayOfMarch(now.getUTCFullYear() + 1);
  const day = (offsetDays: number) =>
    new Date(change.getTime() + offsetDays * 86_400_000).toISOString().slice(0, 10);
  return { before: day(-3), after: day(4), change };
}
