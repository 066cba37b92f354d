import type { EntityManager } from 'typeorm';
import type { RsvpResponse } from '../../../shared/constants/meetups';
import { clinicSlots } from '../../../shared/meetups/clinic-slots';
import { errors } from '../../lib/app-error';
import type { Tank } from '../tanks';
import type { Meetup } from './meetup.entity';
import { MeetupRsvp } from './meetup.entity';
import { tellPromoted, type NoticeDeps } from './meetup-notices';
import { rsvpOf } from './meetups.queries';

/** Answers change nothing once a meetup is cancelled or under way. */
export function requireOpen(meetup: Meetup, now: Date): void {
  if (meetup.status === 'cancelled') throw errors.conflict('This meetup was cancelled.');
  if (meetup.startsAt.getTime() <= now.getTime()) throw errors.conflict('This meetup has already started.');
}

/**
 * Hands freed places to the waitlist, first in line first, and tells each person promoted. The caller holds the
 * meetup's row lock, so two cancellations at once cannot both give the same place away: the second one counts
 * the places after the first has committed its promotions.
 */
export async function promoteFromWaitlist(
  tx: EntityManager,
  deps: NoticeDeps,
  meetup: Meetup,
): Promise<string[]> {
  // TypeORM answers an UPDATE … RETURNING with [rows, affected].
  const [rows]: [{ userId: string }[], number] = await tx.query(
    `WITH free AS (
       SELECT GREATEST(m.capacity - (SELECT count(*) FROM meetup_rsvp g WHERE g.meetup_id = m.id AND g.status = 'going'), 0) AS places
         FROM meetup m WHERE m.id = $1
     ), next AS (
       SELECT w.id FROM meetup_rsvp w WHERE w.meetup_id = $1 AND w.status = 'waitlisted'
        ORDER BY w.arrival LIMIT (SELECT places FROM free)
     )
     UPDATE meetup_rsvp r SET status = 'going', promoted_at = clock_timestamp()
       FROM next WHERE r.id = next.id
     RETURNING r.user_id AS "userId"`,
    [meetup.id],
  );
  const promoted = rows.map((r) => r.userId);
  if (promoted.length) await tellPromoted(tx, deps, meetup, promoted);
  return promoted;
}

/**
 * Going or not going. "Going" takes a place while one is free and nobody is waiting, else the back of the line;
 * the decision is made in SQL under the meetup's row lock (taken by the caller), never from counts read earlier.
 * Saying "going" again keeps your place; saying "going" after "not going" queues you anew.
 */
export async function respond(
  tx: EntityManager,
  deps: NoticeDeps,
  meetup: Meetup,
  userId: string,
  response: RsvpResponse,
  now = new Date(),
): Promise<MeetupRsvp> {
  requireOpen(meetup, now);
  const existing = await rsvpOf(tx, meetup.id, userId);
  if (response === 'going') {
    if (existing && existing.status !== 'not-going') return existing;
    await tx.query(
      `INSERT INTO meetup_rsvp (meetup_id, user_id, status)
       SELECT m.id, $2,
              CASE WHEN (SELECT count(*) FROM meetup_rsvp g WHERE g.meetup_id = m.id AND g.status = 'going') < m.capacity
                    AND NOT EXISTS (SELECT 1 FROM meetup_rsvp w WHERE w.meetup_id = m.id AND w.status = 'waitlisted')
                   THEN 'going' ELSE 'waitlisted' END
         FROM meetup m WHERE m.id = $1
       ON CONFLICT (meetup_id, user_id) DO UPDATE
          SET status = EXCLUDED.status, arrival = nextval('meetup_rsvp_arrival_seq'), responded_at = clock_timestamp(),
              promoted_at = NULL, checked_in_at = NULL, checked_in_by_id = NULL`,
      [meetup.id, userId],
    );
  } else {
    const wasGoing = existing?.status === 'going';
    await tx.query(
      `INSERT INTO meetup_rsvp (meetup_id, user_id, status) VALUES ($1, $2, 'not-going')
       ON CONFLICT (meetup_id, user_id) DO UPDATE
          SET status = 'not-going', responded_at = clock_timestamp(), slot_starts_at = NULL, tank_id = NULL,
              checked_in_at = NULL, checked_in_by_id = NULL`,
      [meetup.id, userId],
    );
    if (wasGoing) await promoteFromWaitlist(tx, deps, meetup);
  }
  return tx.findOneByOrFail(MeetupRsvp, { meetupId: meetup.id, userId });
}

const UNIQUE_VIOLATION = '23505';
const isUniqueViolation = (err: unknown) =>
  (err as { driverError?: { code?: string } }).driverError?.code === UNIQUE_VIOLATION;

/** A clinic slot and the tank whose water the member brings. The unique index settles two bookings of one slot. */
export async function bookSlot(
  tx: EntityManager,
  meetup: Meetup,
  userId: string,
  tank: Tank,
  slotStartsAt: string,
  now = new Date(),
): Promise<void> {
  if (meetup.kind !== 'clinic' || !meetup.slotMinutes)
    throw errors.conflict('Only a water-testing clinic has slots to book.');
  requireOpen(meetup, now);
  const rsvp = await rsvpOf(tx, meetup.id, userId);
  if (rsvp?.status !== 'going')
    throw errors.conflict(
      rsvp?.status === 'waitlisted'
        ? 'You are on the waitlist: you can book a slot once a place is yours.'
        : 'Say you are going first, then book a slot.',
    );
  const slot = clinicSlots(meetup.startsAt, meetup.endsAt, meetup.slotMinutes).find(
    (s) => s === new Date(slotStartsAt).toISOString(),
  );
  if (!slot)
    throw errors.badRequest('That is not one of the clinic’s slots.', [
      { path: 'slotStartsAt', message: 'Choose one of the clinic’s slots.' },
    ]);
  try {
    await tx.update(MeetupRsvp, { id: rsvp.id }, { slotStartsAt: new Date(slot), tankId: tank.id });
  } catch (err) {
    if (isUniqueViolation(err)) throw errors.conflict('Someone has just booked that slot. Choose another.');
    throw err;
  }
}

export async function clearSlot(tx: EntityManager, meetup: Meetup, userId: string): Promise<void> {
  await tx.update(MeetupRsvp, { meetupId: meetup.id, userId }, { slotStartsAt: null, tankId: null });
}

/** After the clinic's times or slot length change: frees bookings that no longer match a slot; returns whose. */
export async function releaseStaleSlots(tx: EntityManager, meetup: Meetup): Promise<string[]> {
  const valid =
    meetup.kind === 'clinic' && meetup.slotMinutes
      ? clinicSlots(meetup.startsAt, meetup.endsAt, meetup.slotMinutes)
      : [];
  const [rows]: [{ userId: string }[], number] = await tx.query(
    `UPDATE meetup_rsvp SET slot_starts_at = NULL, tank_id = NULL
      WHERE meetup_id = $1 AND slot_starts_at IS NOT NULL AND NOT (slot_starts_at = ANY($2::timestamptz[]))
      RETURNING user_id AS "userId"`,
    [meetup.id, valid],
  );
  return rows.map((r) => r.userId);
}
