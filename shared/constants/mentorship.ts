/** How many mentees a mentor takes on in a club until they or an admin set their own number. */
export const DEFAULT_MENTOR_CAPACITY = 5;
/** The most mentees a mentor may take on at once in one club. */
export const MAX_MENTOR_CAPACITY = 20;
export const MENTOR_REQUEST_NOTE_MAX = 500;
export const DECLINE_REASON_MAX = 500;

export const MENTOR_REQUEST_STATES = ['open', 'accepted', 'declined'] as const;
export type MentorRequestState = (typeof MENTOR_REQUEST_STATES)[number];
