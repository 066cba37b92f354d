import { wallTimeToUtc } from '../readings/csv-dates';

/** A wall-clock time as a form's datetime-local field gives it: "2026-04-02T19:00". */
export const LOCAL_DATE_TIME = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})$/;

/** Whether "2026-02-30T19:00" names a real day and time (the pattern alone lets it through). */
export function isRealLocalDateTime(local: string): boolean {
  const m = LOCAL_DATE_TIME.exec(local);
  if (!m) return false;
  const [y, mo, d, h, mi] = m.slice(1).map(Number) as [number, number, number, number, number];
  const probe = new Date(Date.UTC(y, mo - 1, d, h, mi));
  return (
    probe.getUTCFullYear() === y &&
    probe.getUTCMonth() === mo - 1 &&
    probe.getUTCDate() === d &&
    h < 24 &&
    mi < 60
  );
}

/**
 * The instant at which clocks in the club's zone show `local`. The offset is the one in force on that date, not
 * today's: a meetup set in March for 19:00 in April stays at 19:00 after the clocks go forward.
 */
export function clubTimeToUtc(local: string, timeZone: string): Date {
  const m = LOCAL_DATE_TIME.exec(local);
  if (!m) throw new Error(`not a local date-time: ${local}`);
  const [y, mo, d, h, mi] = m.slice(1).map(Number) as [number, number, number, number, number];
  return new Date(wallTimeToUtc(Date.UTC(y, mo - 1, d, h, mi), timeZone));
}

const parts = new Map<string, Intl.DateTimeFormat>();
function partsIn(timeZone: string): Intl.DateTimeFormat {
  let f = parts.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat('en-CA', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
    });
    parts.set(timeZone, f);
  }
  return f;
}

/** The club's wall-clock time at an instant, in the datetime-local form ("2026-04-02T19:00"). */
export function utcToClubTime(at: Date | string, timeZone: string): string {
  const p = partsIn(timeZone).formatToParts(new Date(at));
  const get = (type: Intl.DateTimeFormatPartTypes) => p.find((x) => x.type === type)?.value ?? '';
  return `${get('year')}-${get('month')}-${get('day')}T${get('hour')}:${get('minute')}`;
}

/**
 * "Thursday, 2 April 2026, 19:00–21:00 (BST)": when a meetup happens, in the club's zone, as e-mails and calendars
 * say it. Days differ when it runs past midnight.
 */
export function describeClubTime(
  startsAt: Date | string,
  endsAt: Date | string,
  timeZone: string,
  locale = 'en-GB',
): string {
  const day = new Intl.DateTimeFormat(locale, {
    timeZone,
    weekday: 'long',
    day: 'numeric',
    month: 'long',
    year: 'numeric',
  });
  const time = new Intl.DateTimeFormat(locale, {
    timeZone,
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  });
  const zone =
    new Intl.DateTimeFormat(locale, { timeZone, timeZoneName: 'short' })
      .formatToParts(new Date(startsAt))
      .find((x) => x.type === 'timeZoneName')?.value ?? timeZone;
  const start = new Date(startsAt);
  const end = new Date(endsAt);
  const sameDay = day.format(start) === day.format(end);
  const until = sameDay ? time.format(end) : `${day.format(end)}, ${time.format(end)}`;
  return `${day.format(start)}, ${time.format(start)}–${until} (${zone})`;
}
