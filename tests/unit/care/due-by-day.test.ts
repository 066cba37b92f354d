import { describe, expect, it } from 'vitest';
import {
  TROPICAL_FRESHWATER_PROFILE,
  calendarDaysBetween,
  dueTests,
  groupDueByDay,
  localDate,
  toTestToday,
  type DueTest,
} from '@shared/care';

/**
 * Offsets and daylight-saving dates are the IANA Time Zone Database's (Eggert, Olson et al., tzdata 2025b):
 * - Pacific/Auckland is UTC+13 (NZDT) in January: New Zealand keeps daylight time from the last Sunday of September
 *   to the first Sunday of April (New Zealand Department of Internal Affairs, 2007, Daylight Time Order 2007).
 * - America/Los_Angeles is UTC−8 (PST) in winter and UTC−7 (PDT) from the second Sunday of March, 02:00 local
 *   (United States Congress, 2005, Energy Policy Act of 2005, §110): 8 March 2026.
 * - Asia/Kolkata is UTC+05:30 all year, with no daylight time.
 * Test cadences (ammonia and nitrite daily while cycling) are common practice, no source.
 */

const row = (
  parameter: DueTest['parameter'],
  dueAt: string,
  lastTestedAt: string | null = null,
): DueTest => ({
  parameter,
  cadenceDays: 1,
  lastTestedAt,
  dueAt,
  overdueByDays: 0,
  status: 'ok',
});

const params = (rows: { parameter: string }[]) => rows.map((r) => r.parameter);

describe('localDate', () => {
  it('gives the date where the member lives, not the UTC date', () => {
    // 20:00 UTC on 15 January is 09:00 on the 16th in Auckland (UTC+13) and 12:00 on the 15th in Los Angeles (UTC−8).
    expect(localDate('2026-01-15T20:00:00Z', 'Pacific/Auckland')).toBe('2026-01-16');
    expect(localDate('2026-01-15T20:00:00Z', 'America/Los_Angeles')).toBe('2026-01-15');
    expect(localDate('2026-01-15T20:00:00Z', 'UTC')).toBe('2026-01-15');
    // 18:40 UTC is 00:10 the next day in Kolkata (UTC+05:30): the half hour counts.
    expect(localDate('2026-01-15T18:40:00Z', 'Asia/Kolkata')).toBe('2026-01-16');
    expect(localDate('2026-01-15T18:20:00Z', 'Asia/Kolkata')).toBe('2026-01-15');
  });

  it('counts an unknown zone as UTC instead of failing', () => {
    expect(localDate('2026-01-15T23:30:00Z', 'Atlantis/Lost_City')).toBe('2026-01-15');
  });
});

describe('calendarDaysBetween', () => {
  it('counts whole days across months, years and a leap day (Gregorian calendar, ISO 8601-1:2019)', () => {
    expect(calendarDaysBetween('2025-12-31', '2026-01-01')).toBe(1);
    expect(calendarDaysBetween('2024-02-28', '2024-03-01')).toBe(2); // 2024 is a leap year
    expect(calendarDaysBetween('2026-02-28', '2026-03-01')).toBe(1); // 2026 is not
    expect(calendarDaysBetween('2026-01-16', '2026-01-15')).toBe(-1);
  });
});

describe('groupDueByDay', () => {
  it('in Auckland, where it is already tomorrow in UTC terms, a test due last evening local time is overdue and one due this evening is due today', () => {
    const now = '2026-01-15T20:00:00Z'; // Auckland: Friday 16 January, 09:00
    const due = [
      row('ammonia', '2026-01-15T09:00:00Z'), // Auckland 15 Jan 22:00: yesterday
      row('nitrite', '2026-01-16T05:00:00Z'), // Auckland 16 Jan 18:00: later today
      row('nitrate', '2026-01-16T12:00:00Z'), // Auckland 17 Jan 01:00: tomorrow
    ];
    const auckland = groupDueByDay(due, { now, timeZone: 'Pacific/Auckland' });
    expect(auckland.today).toBe('2026-01-16');
    expect(params(auckland.overdue)).toEqual(['ammonia']);
    expect(auckland.overdue[0]).toMatchObject({ dueDay: '2026-01-15', daysLate: 1 });
    expect(params(auckland.dueToday)).toEqual(['nitrite']);
    expect(params(auckland.later)).toEqual(['nitrate']);

    // The same rows for a member on UTC: ammonia is due today, nitrite and nitrate tomorrow.
    const utc = groupDueByDay(due, { now, timeZone: 'UTC' });
    expect(utc.today).toBe('2026-01-15');
    expect(params(utc.overdue)).toEqual([]);
    expect(params(utc.dueToday)).toEqual(['ammonia']);
    expect(params(utc.later)).toEqual(['nitrite', 'nitrate']);
  });

  it('in Los Angeles, behind UTC, a test due at noon local time is still today in the evening although UTC has moved on', () => {
    const now = '2026-01-16T06:00:00Z'; // Los Angeles: Thursday 15 January, 22:00 (UTC already says the 16th)
    const due = [row('ammonia', '2026-01-15T20:00:00Z')]; // Los Angeles 15 Jan 12:00
    expect(params(groupDueByDay(due, { now, timeZone: 'America/Los_Angeles' }).dueToday)).toEqual([
      'ammonia',
    ]);
    expect(groupDueByDay(due, { now, timeZone: 'UTC' }).overdue[0]).toMatchObject({
      parameter: 'ammonia',
      daysLate: 1,
    });
  });

  it('counts calendar days, not 24-hour blocks, across the spring daylight-saving change', () => {
    // Due 07:30 UTC on 8 March 2026 = 23:30 PST on the 7th (the clocks go forward at 10:00 UTC that day).
    // 24 hours later it is 00:30 PDT on the 9th: two local dates later, so two days late.
    const grouped = groupDueByDay([row('pH', '2026-03-08T07:30:00Z')], {
      now: '2026-03-09T07:30:00Z',
      timeZone: 'America/Los_Angeles',
    });
    expect(grouped.overdue[0]).toMatchObject({ dueDay: '2026-03-07', daysLate: 2 });
  });

  it('orders overdue by days late and later by date, and keeps the profile order among ties', () => {
    const now = '2026-01-20T12:00:00Z';
    const due = [
      row('ammonia', '2026-01-19T10:00:00Z'),
      row('nitrite', '2026-01-19T11:00:00Z'),
      row('pH', '2026-01-16T10:00:00Z'),
      row('temperature', '2026-01-24T10:00:00Z'),
      row('nitrate', '2026-01-22T10:00:00Z'),
      row('salinity', '2026-01-20T23:00:00Z'),
    ];
    const g = groupDueByDay(due, { now, timeZone: 'UTC' });
    expect(params(g.overdue)).toEqual(['pH', 'ammonia', 'nitrite']);
    expect(g.overdue.map((r) => r.daysLate)).toEqual([4, 1, 1]);
    expect(params(g.dueToday)).toEqual(['salinity']);
    expect(params(g.later)).toEqual(['nitrate', 'temperature']);
    expect(params(toTestToday(g))).toEqual(['pH', 'ammonia', 'nitrite', 'salinity']);
  });

  it('puts a cycling tank’s daily ammonia and nitrite on today’s list a day after the last full test', () => {
    // Tropical freshwater while cycling: ammonia and nitrite daily, nitrate every 2 days, pH and temperature every 3
    // (the profile's cadences: common practice, no source). Tested at 19:00 yesterday in Kolkata.
    const tested = '2026-01-14T13:30:00Z';
    const rows = dueTests(
      {
        phase: 'cycling',
        systemType: 'tropical-freshwater',
        profile: TROPICAL_FRESHWATER_PROFILE,
        createdAt: '2026-01-01T00:00:00Z',
      },
      [
        {
          id: 't1',
          takenAt: tested,
          values: { ammonia: 2, nitrite: 0.5, nitrate: 5, pH: 7.4, temperature: 26 },
        },
      ],
      '2026-01-15T03:30:00Z', // 09:00 in Kolkata: ammonia and nitrite come due at 19:00 tonight
    );
    const g = groupDueByDay(rows, { now: '2026-01-15T03:30:00Z', timeZone: 'Asia/Kolkata' });
    expect(params(toTestToday(g))).toEqual(['ammonia', 'nitrite']);
    expect(params(g.later)).toEqual(['nitrate', 'pH', 'temperature']);
  });
});
