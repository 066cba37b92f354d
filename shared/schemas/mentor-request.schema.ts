import { z } from 'zod';
import {
  DECLINE_REASON_MAX,
  MAX_MENTOR_CAPACITY,
  MENTOR_REQUEST_NOTE_MAX,
  MENTOR_REQUEST_STATES,
} from '../constants/mentorship';
import { uuid } from './common';

export const createMentorRequestSchema = z
  .object({
    note: z
      .string()
      .trim()
      .max(MENTOR_REQUEST_NOTE_MAX, `Keep the note under ${MENTOR_REQUEST_NOTE_MAX} characters.`)
      .optional(),
    preferredMentorId: uuid.optional(),
  })
  .strict();
export type CreateMentorRequestInput = z.input<typeof createMentorRequestSchema>;

export const listMentorRequestsQuery = z
  .object({ state: z.enum(MENTOR_REQUEST_STATES).default('open') })
  .strict();

export const mentorRequestParams = z.object({ clubId: uuid, requestId: uuid });

/** The admin picks the mentor; without one, the member's preferred mentor is used. */
export const acceptMentorRequestSchema = z.object({ mentorId: uuid.optional() }).strict();
export type AcceptMentorRequestInput = z.input<typeof acceptMentorRequestSchema>;

export const declineMentorRequestSchema = z
  .object({
    reason: z
      .string({ message: 'Say why, so the member knows what to do next.' })
      .trim()
      .min(1, 'Say why, so the member knows what to do next.')
      .max(DECLINE_REASON_MAX, `Keep it under ${DECLINE_REASON_MAX} characters.`),
  })
  .strict();
export type DeclineMentorRequestInput = z.input<typeof declineMentorRequestSchema>;

export const mentorParams = z.object({ clubId: uuid, userId: uuid });

export const updateMentorCapacitySchema = z
  .object({
    capacity: z
      .number({ message: 'Enter a whole number.' })
      .int('Enter a whole number.')
      .min(0, 'Use 0 to take no new mentees.')
      .max(MAX_MENTOR_CAPACITY, `At most ${MAX_MENTOR_CAPACITY} mentees.`),
  })
  .strict();
export type UpdateMentorCapacityInput = z.input<typeof updateMentorCapacitySchema>;
