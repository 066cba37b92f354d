import { createEvents, isValidURL, type EventAttributes } from 'ics';
import { MEETUP_KIND_LABELS } from '../../../shared/constants/meetups';
import { describeClubTime } from '../../../shared/meetups/club-time';
import type { MailAttachment } from '../../mail/mailer';
import type { Meetup } from './meetup.entity';

export interface CalendarEntry {
  meetup: Pick<
    Meetup,
    | 'id'
    | 'kind'
    | 'title'
    | 'description'
    | 'startsAt'
    | 'endsAt'
    | 'placeText'
    | 'onlineUrl'
    | 'status'
    | 'sequence'
    | 'cancelReason'
  >;
  timeZone: string;
  clubName: string;
  /** The meetup's page in the app. */
  url: string;
  waitlisted?: boolean;
}

/**
 * One meetup as an iCalendar event. Times go out in UTC (DTSTART…Z), worked out from the club's wall-clock time on
 * the meetup's own date, so every calendar shows the same instant whatever the zone it runs in. The UID stays the
 * same and SEQUENCE grows with each change, so a calendar replaces its copy (and drops it when cancelled).
 */
export function meetupEvent(e: CalendarEntry): EventAttributes {
  const m = e.meetup;
  const place = m.kind === 'online' ? (m.onlineUrl ?? 'Online') : m.placeText;
  const lines = [
    m.status === 'cancelled' ? `Cancelled: ${m.cancelReason ?? ''}`.trim() : null,
    e.waitlisted ? 'You are on the waitlist: we will e-mail you if a place frees up.' : null,
    `${MEETUP_KIND_LABELS[m.kind]} · ${e.clubName}`,
    describeClubTime(m.startsAt, m.endsAt, e.timeZone),
    m.description || null,
    e.url,
  ].filter((l): l is string => Boolean(l));
  return {
    uid: `meetup-${m.id}@shoalwise`,
    sequence: m.sequence,
    start: m.startsAt.getTime(),
    startInputType: 'utc',
    startOutputType: 'utc',
    end: m.endsAt.getTime(),
    endInputType: 'utc',
    endOutputType: 'utc',
    title: e.waitlisted ? `${m.title} (waitlist)` : m.title,
    description: lines.join('\n\n'),
    location: place || undefined,
    // The package refuses some addresses it cannot parse (a bare port 0 in tests); the link is in the text anyway.
    url: isValidURL(e.url) ? e.url : undefined,
    status: m.status === 'cancelled' ? 'CANCELLED' : e.waitlisted ? 'TENTATIVE' : 'CONFIRMED',
    busyStatus: e.waitlisted ? 'FREE' : 'BUSY',
    productId: 'shoalwise/meetups',
  };
}

/** An iCalendar file of these events. An empty feed is still a valid calendar. */
export function calendarFile(entries: CalendarEntry[], calName: string): string {
  const { error, value } = createEvents(entries.map(meetupEvent), {
    productId: 'shoalwise/meetups',
    calName,
  });
  if (error || value === null) throw error ?? new Error('the calendar could not be built');
  return value;
}

/** The .ics attached to a meetup's e-mails. */
export function icsAttachment(entry: CalendarEntry): MailAttachment {
  return {
    filename: 'meetup.ics',
    contentType: 'text/calendar; charset=utf-8; method=PUBLISH',
    content: calendarFile([entry], entry.clubName),
  };
}
