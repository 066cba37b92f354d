/** What kind of evening it is; the labels are what members read. */
export const MEETUP_KINDS = ['talk', 'clinic', 'tour', 'swap', 'online'] as const;
export type MeetupKind = (typeof MEETUP_KINDS)[number];

export const MEETUP_KIND_LABELS: Record<MeetupKind, string> = {
  talk: 'Talk',
  clinic: 'Water-testing clinic',
  tour: 'Tank tour',
  swap: 'Swap and auction',
  online: 'Online',
};

export const MEETUP_STATUSES = ['scheduled', 'cancelled'] as const;
export type MeetupStatus = (typeof MEETUP_STATUSES)[number];

/** A member's answer. "waitlisted" is what "going" becomes while every place is taken. */
export const RSVP_STATUSES = ['going', 'waitlisted', 'not-going'] as const;
export type RsvpStatus = (typeof RSVP_STATUSES)[number];
export const RSVP_RESPONSES = ['going', 'not-going'] as const;
export type RsvpResponse = (typeof RSVP_RESPONSES)[number];

export const MEETUP_TITLE_MAX = 120;
export const MEETUP_DESCRIPTION_MAX = 4000;
export const MEETUP_PLACE_MAX = 200;
export const MEETUP_CAPACITY_MAX = 500;
export const MEETUP_CANCEL_REASON_MAX = 500;
/** A clinic is cut into slots of this many minutes (one sample each). */
export const CLINIC_SLOT_MINUTES = { min: 5, max: 120, default: 15 } as const;
/** A meetup may run at most this long (a swap day, not a week-long event). */
export const MEETUP_LONGEST_HOURS = 14;

/** The reminder e-mail goes out this long before the start. */
export const REMINDER_HOURS_BEFORE = 24;
/** Someone who answers later than this before the start is not sent a reminder: they have just decided. */
export const REMINDER_LATEST_HOURS_BEFORE = 1;
