import type { DueTest } from './due-tests';
import { DAY_MS, toMs } from './time';

/** A due-test row placed on the member's calendar. */
export interface DueOnDay extends DueTest {
  /** The local date (YYYY-MM-DD) dueAt falls on in the member's time zone. */
  dueDay: string;
  /** Whole calendar days from dueDay to today in that zone; 0 when due today or later. */
  daysLate: number;
}

export interface DueByDay {
  /** Today's local date (YYYY-MM-DD) in the member's time zone. */
  today: string;
  /** Due on an earlier local day and not tested since: most days late first. */
  overdue: DueOnDay[];
  /** Due some time today, local time (including later today): in the profile's order. */
  dueToday: DueOnDay[];
  /** Due on a later day: soonest first. */
  later: DueOnDay[];
}

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    try {
      f = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' });
    } catch {
      // An unknown zone (an old browser, a renamed zone) counts as UTC rather than breaking the page.
      f = formatterFor('UTC');
    }
    formatters.set(timeZone, f);
  }
  return f;
}

/** The calendar date (YYYY-MM-DD) at `iso` in an IANA time zone; unknown zones count as UTC. */
export function localDate(iso: string, timeZone: string): string {
  const parts = formatterFor(timeZone).formatToParts(toMs(iso));
  const part = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? '';
  return `${part('year')}-${part('month')}-${part('day')}`;
}

/** Whole calendar days from one YYYY-MM-DD date to another (negative when `to` is earlier); DST-proof. */
export function calendarDaysBetween(from: string, to: string): number {
  return Math.round((Date.parse(`${to}T00:00:00Z`) - Date.parse(`${from}T00:00:00Z`)) / DAY_MS);
}

/**
 * Groups `dueTests` rows by the member's own calendar: "due today" means dueAt falls on today's date where the
 * member lives, so a test that comes due this afternoon is already on today's list in the morning, and one due
 * yesterday evening is overdue after local midnight, whatever the date is in UTC. (The `status` of each row keeps
 * its 24-hour grace for raising overdue concerns; this grouping is only about what to do today.)
 */
export function groupDueByDay(due: readonly DueTest[], p: { now: string; timeZone: string }): DueByDay {
  const today = localDate(p.now, p.timeZone);
  const out: DueByDay = { today, overdue: [], dueToday: [], later: [] };
  for (const row of due) {
    const dueDay = localDate(row.dueAt, p.timeZone);
    const offset = calendarDaysBetween(dueDay, today);
    const placed: DueOnDay = { ...row, dueDay, daysLate: Math.max(0, offset) };
    if (offset > 0) out.overdue.push(placed);
    else if (offset === 0) out.dueToday.push(placed);
    else out.later.push(placed);
  }
  // Stable sorts: ties keep the profile's order.
  out.overdue.sort((a, b) => b.daysLate - a.daysLate);
  out.later.sort((a, b) => toMs(a.dueAt) - toMs(b.dueAt));
  return out;
}

/** The parameters to test today, most overdue first: what a one-tap "log a test" should put first. */
export function toTestToday(groups: DueByDay): DueOnDay[] {
  return [...groups.overdue, ...groups.dueToday];
}
