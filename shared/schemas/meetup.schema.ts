import { z } from 'zod';
import {
  CLINIC_SLOT_MINUTES,
  MEETUP_CANCEL_REASON_MAX,
  MEETUP_CAPACITY_MAX,
  MEETUP_DESCRIPTION_MAX,
  MEETUP_KINDS,
  MEETUP_LONGEST_HOURS,
  MEETUP_PLACE_MAX,
  MEETUP_TITLE_MAX,
  RSVP_RESPONSES,
  type MeetupKind,
} from '../constants/meetups';
import { isRealLocalDateTime, LOCAL_DATE_TIME } from '../meetups/club-time';
import { clubIdParams, uuid } from './common';
import { isoDateTime } from './tank.schema';

export const meetupParams = clubIdParams.extend({ meetupId: uuid });
export const attendeeParams = meetupParams.extend({ userId: uuid });
export const memberAttendanceParams = clubIdParams.extend({ userId: uuid });

/** A wall-clock time in the club's time zone, as a datetime-local field sends it. */
const clubTime = z
  .string({ message: 'Choose a date and time.' })
  .regex(LOCAL_DATE_TIME, 'Give a date and time as YYYY-MM-DDTHH:MM, in the club’s time zone.')
  .refine(isRealLocalDateTime, 'That date does not exist.');

/** An http(s) link; an empty field means none. */
const link = z
  .union([
    z.literal(''),
    z
      .url({ protocol: /^https?$/, message: 'Give a web address starting with https://.' })
      .max(500, 'That link is too long.'),
  ])
  .nullable()
  .transform((v) => v || null);

const fields = {
  kind: z.enum(MEETUP_KINDS, { message: `Choose the kind: ${MEETUP_KINDS.join(', ')}.` }),
  title: z
    .string({ message: 'Give the meetup a title.' })
    .trim()
    .min(1, 'Give the meetup a title.')
    .max(MEETUP_TITLE_MAX, `Keep the title under ${MEETUP_TITLE_MAX} characters.`),
  description: z
    .string()
    .trim()
    .max(MEETUP_DESCRIPTION_MAX, `Keep it under ${MEETUP_DESCRIPTION_MAX} characters.`),
  startsAt: clubTime,
  endsAt: clubTime,
  placeText: z.string().trim().max(MEETUP_PLACE_MAX, `Keep it under ${MEETUP_PLACE_MAX} characters.`),
  mapUrl: link,
  onlineUrl: link,
  capacity: z
    .number({ message: 'Enter how many people fit.' })
    .int('Enter a whole number.')
    .min(1, 'At least one place.')
    .max(MEETUP_CAPACITY_MAX, `At most ${MEETUP_CAPACITY_MAX} places.`),
  /** Who runs it; a clinic needs one (they record the results). */
  hostId: uuid.nullable(),
  slotMinutes: z
    .number()
    .int()
    .min(CLINIC_SLOT_MINUTES.min, `At least ${CLINIC_SLOT_MINUTES.min} minutes.`)
    .max(CLINIC_SLOT_MINUTES.max, `At most ${CLINIC_SLOT_MINUTES.max} minutes.`),
};

export interface MeetupRuleValues {
  kind: MeetupKind;
  startsAt: string;
  endsAt: string;
  placeText: string;
  onlineUrl: string | null;
  hostId: string | null;
}

const wallMs = (local: string) => {
  const [y, mo, d, h, mi] = (LOCAL_DATE_TIME.exec(local) ?? []).slice(1).map(Number) as [
    number,
    number,
    number,
    number,
    number,
  ];
  return Date.UTC(y, mo - 1, d, h, mi);
};

/** The rules between fields, for a new meetup and for an edit merged onto the stored one. */
export function meetupRuleIssues(v: MeetupRuleValues): { path: string; message: string }[] {
  const issues: { path: string; message: string }[] = [];
  if (isRealLocalDateTime(v.startsAt) && isRealLocalDateTime(v.endsAt)) {
    const length = wallMs(v.endsAt) - wallMs(v.startsAt);
    if (length <= 0) issues.push({ path: 'endsAt', message: 'It has to end after it starts.' });
    else if (length > MEETUP_LONGEST_HOURS * 3_600_000)
      issues.push({ path: 'endsAt', message: `A meetup runs at most ${MEETUP_LONGEST_HOURS} hours.` });
  }
  if (v.kind === 'online' && !v.onlineUrl)
    issues.push({ path: 'onlineUrl', message: 'Give the link people join with.' });
  if (v.kind !== 'online' && !v.placeText) issues.push({ path: 'placeText', message: 'Say where it is.' });
  if (v.kind === 'clinic' && !v.hostId)
    issues.push({ path: 'hostId', message: 'Choose the mentor who runs the clinic.' });
  return issues;
}

export const createMeetupSchema = z
  .object({
    ...fields,
    description: fields.description.default(''),
    placeText: fields.placeText.default(''),
    mapUrl: fields.mapUrl.default(null),
    onlineUrl: fields.onlineUrl.default(null),
    hostId: fields.hostId.default(null),
    slotMinutes: fields.slotMinutes.default(CLINIC_SLOT_MINUTES.default),
  })
  .strict()
  .superRefine((v, ctx) => {
    for (const issue of meetupRuleIssues(v))
      ctx.addIssue({ code: 'custom', path: [issue.path], message: issue.message });
  });
export type CreateMeetupInput = z.input<typeof createMeetupSchema>;
export type CreateMeetupValues = z.output<typeof createMeetupSchema>;

/** Any subset; the server checks the rules between fields on the merged result. */
export const updateMeetupSchema = z
  .object(fields)
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, 'Change at least one thing.');
export type UpdateMeetupInput = z.input<typeof updateMeetupSchema>;

export const cancelMeetupSchema = z
  .object({
    reason: z
      .string({ message: 'Tell people why.' })
      .trim()
      .min(1, 'Tell people why.')
      .max(MEETUP_CANCEL_REASON_MAX, `Keep it under ${MEETUP_CANCEL_REASON_MAX} characters.`),
  })
  .strict();

export const rsvpSchema = z
  .object({ response: z.enum(RSVP_RESPONSES, { message: 'Say going or not-going.' }) })
  .strict();
export type RsvpInput = z.input<typeof rsvpSchema>;

/** A clinic slot and the tank whose water the member brings. */
export const bookingSchema = z.object({ slotStartsAt: isoDateTime, tankId: uuid }).strict();
export type BookingInput = z.input<typeof bookingSchema>;

export const attendanceSchema = z
  .object({ present: z.boolean({ message: 'Say whether they are here.' }) })
  .strict();

export const meetupListQuery = z
  .object({ when: z.enum(['upcoming', 'past'], { message: 'Choose upcoming or past.' }).default('upcoming') })
  .strict();
export type MeetupListWhen = z.output<typeof meetupListQuery>['when'];

export const calendarFeedParams = z.object({
  token: z
    .string()
    .min(10)
    .max(300)
    .regex(/^[A-Za-z0-9_.-]+$/, 'That link is not valid.'),
});
