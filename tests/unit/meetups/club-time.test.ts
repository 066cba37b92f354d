import { describe, expect, it } from 'vitest';
import { clinicSlots } from '../../../shared/meetups/clinic-slots';
import {
  clubTimeToUtc,
  describeClubTime,
  isRealLocalDateTime,
  utcToClubTime,
} from '../../../shared/meetups/club-time';
import { lastSundayOfMarch, thursdaysAroundSpringChange } from '../../helpers/dst-dates';

describe('meetup times in the club’s time zone', () => {
  it('when 19:00 in London falls after the clocks go forward, then it is 18:00 UTC; before the change 19:00 UTC', () => {
    // Source: The Summer Time Order 2002 (UK SI 2002/262): BST (UTC+1) from 01:00 UTC, last Sunday of March 2027 = 28 March.
    expect(lastSundayOfMarch(2027).toISOString()).toBe('2027-03-28T01:00:00.000Z');
    expect(clubTimeToUtc('2027-03-25T19:00', 'Europe/London').toISOString()).toBe('2027-03-25T19:00:00.000Z');
    expect(clubTimeToUtc('2027-04-01T19:00', 'Europe/London').toISOString()).toBe('2027-04-01T18:00:00.000Z');
  });

  it('when converted back, then both read 19:00 club time, and the description names the zone in force that day', () => {
    const { before, after } = thursdaysAroundSpringChange(new Date('2026-12-03T12:00:00Z'));
    for (const day of [before, after]) {
      const start = clubTimeToUtc(`${day}T19:00`, 'Europe/London');
      expect(utcToClubTime(start, 'Europe/London')).toBe(`${day}T19:00`);
    }
    const spring = describeClubTime(
      clubTimeToUtc(`${after}T19:00`, 'Europe/London'),
      clubTimeToUtc(`${after}T21:00`, 'Europe/London'),
      'Europe/London',
    );
    expect(spring).toBe('Thursday, 1 April 2027, 19:00–21:00 (BST)');
    const winter = describeClubTime(
      clubTimeToUtc(`${before}T19:00`, 'Europe/London'),
      clubTimeToUtc(`${before}T21:00`, 'Europe/London'),
      'Europe/London',
    );
    expect(winter).toBe('Thursday, 25 March 2027, 19:00–21:00 (GMT)');
  });

  it('when the zone is far from UTC, then the wall time still round-trips (Pacific/Auckland, NZDT UTC+13 in January, from memory)', () => {
    expect(clubTimeToUtc('2027-01-14T19:00', 'Pacific/Auckland').toISOString()).toBe(
      '2027-01-14T06:00:00.000Z',
    );
    expect(utcToClubTime('2027-01-14T06:00:00Z', 'Pacific/Auckland')).toBe('2027-01-14T19:00');
  });

  it('when a date does not exist, then it is refused', () => {
    expect(isRealLocalDateTime('2027-02-29T19:00')).toBe(false);
    expect(isRealLocalDateTime('2028-02-29T19:00')).toBe(true);
    expect(isRealLocalDateTime('2027-04-01T24:00')).toBe(false);
    expect(isRealLocalDateTime('2027-04-01 19:00')).toBe(false);
  });

  it('when a clinic runs 19:00–20:10 in 15-minute slots, then only whole slots are offered', () => {
    const start = '2027-04-01T18:00:00.000Z';
    expect(clinicSlots(start, '2027-04-01T19:10:00.000Z', 15)).toEqual(
      ['18:00', '18:15', '18:30', '18:45'].map((t) => `2027-04-01T${t}:00.000Z`),
    );
  });
});
