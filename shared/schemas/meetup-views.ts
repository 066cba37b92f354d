import type { SystemType } from '../care/system-types';
import type { MeetupKind, MeetupStatus, RsvpStatus } from '../constants/meetups';
import type { PersonRef } from './notification-views';

/** The viewer's own answer to one meetup. */
export interface MyRsvpView {
  status: RsvpStatus;
  /** 1 for the first in line; null unless waitlisted. */
  waitlistPosition: number | null;
  /** Clinic only: the booked slot and the tank whose water they bring. */
  slotStartsAt: string | null;
  tank: { id: string; name: string } | null;
  checkedIn: boolean;
}

export interface MeetupSummaryView {
  id: string;
  clubId: string;
  kind: MeetupKind;
  title: string;
  status: MeetupStatus;
  /** Instants (ISO, UTC). */
  startsAt: string;
  endsAt: string;
  /** The same in the club's zone as datetime-local values, for forms. */
  local: { startsAt: string; endsAt: string };
  timeZone: string;
  /** "Thursday, 2 April 2026, 19:00–21:00 (BST)", in the club's zone. */
  when: string;
  placeText: string;
  mapUrl: string | null;
  onlineUrl: string | null;
  capacity: number;
  goingCount: number;
  waitlistCount: number;
  host: PersonRef | null;
  mine: MyRsvpView | null;
}

export interface ClinicSlotView {
  startsAt: string;
  /** "19:15" in the club's zone. */
  label: string;
  taken: boolean;
  mine: boolean;
}

export interface MeetupDetailView extends MeetupSummaryView {
  description: string;
  slotMinutes: number | null;
  cancelReason: string | null;
  cancelledAt: string | null;
  /** Clinic only. */
  slots: ClinicSlotView[];
}

/** One line of the check-in list. */
export interface AttendanceRowView {
  userId: string;
  displayName: string;
  status: Extract<RsvpStatus, 'going' | 'waitlisted'>;
  waitlistPosition: number | null;
  checkedIn: boolean;
  checkedInAt: string | null;
  slotStartsAt: string | null;
  tank: { id: string; name: string; systemType: SystemType } | null;
  /** The clinic test recorded for them, once there is one. */
  waterTestId: string | null;
}

export interface AttendanceListView {
  meetup: MeetupSummaryView;
  rows: AttendanceRowView[];
}

export interface AttendanceHistoryRow {
  meetup: Pick<MeetupSummaryView, 'id' | 'title' | 'kind' | 'status' | 'startsAt' | 'when'>;
  rsvp: RsvpStatus;
  checkedIn: boolean;
}

export interface AttendanceHistoryView {
  member: PersonRef;
  /** Past meetups they were ticked in at. */
  attended: number;
  /** Past meetups they said they were going to but were not ticked in. */
  missed: number;
  rows: AttendanceHistoryRow[];
}

export interface CalendarFeedView {
  /** Read-only, signed, for a calendar app to subscribe to. */
  url: string;
}
