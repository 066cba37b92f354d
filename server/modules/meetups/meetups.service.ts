import type { EntityManager } from 'typeorm';
import type { z } from 'zod';
import { MEETUP_KIND_LABELS } from '../../../shared/constants/meetups';
import { clubTimeToUtc, describeClubTime, utcToClubTime } from '../../../shared/meetups/club-time';
import {
  meetupRuleIssues,
  type CreateMeetupValues,
  type updateMeetupSchema,
} from '../../../shared/schemas/meetup.schema';
import type { createWaterTestSchema } from '../../../shared/schemas/water-test.schema';
import { errors } from '../../lib/app-error';
import { audit } from '../audit';
import type { Deps } from '../../deps';
import { createWaterTest, loadTank, requireActive, type SavedWaterTest } from '../tanks';
import { Meetup, MeetupRsvp } from './meetup.entity';
import { tellCancelled, tellChanged, tellResultsRecorded, type NoticeDeps } from './meetup-notices';
import { expectedUserIds, isHostable, rsvpOf } from './meetups.queries';
import { promoteFromWaitlist, releaseStaleSlots } from './rsvp.service';

type UpdateValues = z.output<typeof updateMeetupSchema>;

async function requireHostable(tx: EntityManager, clubId: string, hostId: string | null): Promise<void> {
  if (hostId && !(await isHostable(tx, clubId, hostId))) {
    throw errors.badRequest('Some fields need attention.', [
      { path: 'hostId', message: 'Choose an active mentor or admin of the club.' },
    ]);
  }
}

function requireFuture(startsAt: Date, now: Date): void {
  if (startsAt.getTime() <= now.getTime())
    throw errors.badRequest('Some fields need attention.', [
      { path: 'startsAt', message: 'Choose a time that has not passed yet.' },
    ]);
}

export async function createMeetup(
  tx: EntityManager,
  p: { clubId: string; timeZone: string; values: CreateMeetupValues; actorId: string; now?: Date },
): Promise<Meetup> {
  const { values: v, timeZone } = p;
  await requireHostable(tx, p.clubId, v.hostId);
  const startsAt = clubTimeToUtc(v.startsAt, timeZone);
  requireFuture(startsAt, p.now ?? new Date());
  const saved = await tx.save(
    tx.create(Meetup, {
      clubId: p.clubId,
      kind: v.kind,
      title: v.title,
      description: v.description,
      startsAt,
      endsAt: clubTimeToUtc(v.endsAt, timeZone),
      placeText: v.placeText,
      mapUrl: v.kind === 'online' ? null : v.mapUrl,
      onlineUrl: v.kind === 'online' ? v.onlineUrl : null,
      capacity: v.capacity,
      hostId: v.hostId,
      slotMinutes: v.kind === 'clinic' ? v.slotMinutes : null,
      status: 'scheduled',
      cancelReason: null,
      cancelledAt: null,
      sequence: 0,
      createdById: p.actorId,
    }),
  );
  await audit(tx, {
    actorId: p.actorId,
    clubId: p.clubId,
    action: 'meetup.created',
    targetType: 'Meetup',
    targetId: saved.id,
    details: { title: v.title, startsAt: startsAt.toISOString() },
  });
  return saved;
}

/** What attendees are told changed, in their words. */
function describeChanges(before: Meetup, after: Meetup, timeZone: string): string[] {
  const out: string[] = [];
  if (
    before.startsAt.getTime() !== after.startsAt.getTime() ||
    before.endsAt.getTime() !== after.endsAt.getTime()
  )
    out.push(`New time: ${describeClubTime(after.startsAt, after.endsAt, timeZone)}`);
  if (before.placeText !== after.placeText) out.push(`New place: ${after.placeText}`);
  if (before.onlineUrl !== after.onlineUrl && after.onlineUrl) out.push(`New link: ${after.onlineUrl}`);
  if (before.mapUrl !== after.mapUrl && after.mapUrl) out.push(`New map link: ${after.mapUrl}`);
  if (before.kind !== after.kind) out.push(`Now a ${MEETUP_KIND_LABELS[after.kind].toLowerCase()}`);
  if (before.title !== after.title) out.push(`New title: ${after.title}`);
  if (before.description !== after.description) out.push('The description was updated.');
  if (before.hostId !== after.hostId) out.push('Someone else runs it now.');
  return out;
}

/**
 * An edit, merged onto the stored meetup and checked as a whole. More places go to the waitlist at once; fewer
 * than the people already going is refused. Everyone expected is told what changed, with a new .ics.
 */
export async function updateMeetup(
  tx: EntityManager,
  deps: NoticeDeps,
  p: { meetup: Meetup; timeZone: string; patch: UpdateValues; actorId: string; now?: Date },
): Promise<Meetup> {
  const { meetup: before, timeZone, patch } = p;
  if (before.status === 'cancelled')
    throw errors.conflict('This meetup was cancelled; it can no longer be changed.');
  const merged = {
    kind: patch.kind ?? before.kind,
    title: patch.title ?? before.title,
    description: patch.description ?? before.description,
    startsAt: patch.startsAt ?? utcToClubTime(before.startsAt, timeZone),
    endsAt: patch.endsAt ?? utcToClubTime(before.endsAt, timeZone),
    placeText: patch.placeText ?? before.placeText,
    mapUrl: patch.mapUrl !== undefined ? patch.mapUrl : before.mapUrl,
    onlineUrl: patch.onlineUrl !== undefined ? patch.onlineUrl : before.onlineUrl,
    capacity: patch.capacity ?? before.capacity,
    hostId: patch.hostId !== undefined ? patch.hostId : before.hostId,
    slotMinutes: patch.slotMinutes ?? before.slotMinutes,
  };
  const issues = meetupRuleIssues(merged);
  if (issues.length) throw errors.badRequest('Some fields need attention.', issues);
  if (patch.hostId !== undefined) await requireHostable(tx, before.clubId, merged.hostId);
  const startsAt = clubTimeToUtc(merged.startsAt, timeZone);
  if (patch.startsAt !== undefined) requireFuture(startsAt, p.now ?? new Date());
  const [{ going }] = (await tx.query(
    `SELECT count(*)::int AS going FROM meetup_rsvp WHERE meetup_id = $1 AND status = 'going'`,
    [before.id],
  )) as [{ going: number }];
  if (merged.capacity < going)
    throw errors.conflict(`${going} people are already going: the meetup needs at least ${going} places.`);

  const changes: Partial<Meetup> = {
    ...merged,
    startsAt,
    endsAt: clubTimeToUtc(merged.endsAt, timeZone),
    mapUrl: merged.kind === 'online' ? null : merged.mapUrl,
    onlineUrl: merged.kind === 'online' ? merged.onlineUrl : null,
    slotMinutes: merged.kind === 'clinic' ? (merged.slotMinutes ?? 15) : null,
    sequence: before.sequence + 1,
  };
  await tx.update(Meetup, { id: before.id }, changes);
  const after = await tx.findOneByOrFail(Meetup, { id: before.id });
  const released = await releaseStaleSlots(tx, after);
  if (after.capacity > before.capacity) await promoteFromWaitlist(tx, deps, after);
  const said = describeChanges(before, after, timeZone);
  if (released.length) said.push('Clinic slots changed: if you had booked one, book again.');
  if (said.length) await tellChanged(tx, deps, after, await expectedUserIds(tx, after.id), said);
  await audit(tx, {
    actorId: p.actorId,
    clubId: after.clubId,
    action: 'meetup.updated',
    targetType: 'Meetup',
    targetId: after.id,
    details: { fields: Object.keys(patch) },
  });
  return after;
}

/** Cancelled for everyone: answers are kept (for the record), everyone expected is told why. */
export async function cancelMeetup(
  tx: EntityManager,
  deps: NoticeDeps,
  p: { meetup: Meetup; reason: string; actorId: string; now?: Date },
): Promise<Meetup> {
  if (p.meetup.status === 'cancelled') return p.meetup;
  await tx.update(
    Meetup,
    { id: p.meetup.id },
    {
      status: 'cancelled',
      cancelReason: p.reason,
      cancelledAt: p.now ?? new Date(),
      sequence: p.meetup.sequence + 1,
    },
  );
  const after = await tx.findOneByOrFail(Meetup, { id: p.meetup.id });
  await tellCancelled(tx, deps, after, await expectedUserIds(tx, after.id));
  await audit(tx, {
    actorId: p.actorId,
    clubId: after.clubId,
    action: 'meetup.cancelled',
    targetType: 'Meetup',
    targetId: after.id,
    details: { reason: p.reason },
  });
  return after;
}

async function expectedRsvp(tx: EntityManager, meetup: Meetup, userId: string): Promise<MeetupRsvp> {
  const rsvp = await rsvpOf(tx, meetup.id, userId);
  if (!rsvp || rsvp.status === 'not-going') throw errors.notFound('That person on the list');
  return rsvp;
}

/** Ticks someone in (or out again). Setting the same state twice changes nothing, so a retried tap is harmless. */
export async function setAttendance(
  tx: EntityManager,
  p: { meetup: Meetup; userId: string; present: boolean; actorId: string; now?: Date },
): Promise<MeetupRsvp> {
  if (p.meetup.status === 'cancelled') throw errors.conflict('This meetup was cancelled.');
  const rsvp = await expectedRsvp(tx, p.meetup, p.userId);
  // In one statement, so two taps at once keep the first time rather than each writing its own.
  if (p.present) {
    await tx.query(
      `UPDATE meetup_rsvp SET checked_in_at = COALESCE(checked_in_at, $2), checked_in_by_id = COALESCE(checked_in_by_id, $3) WHERE id = $1`,
      [rsvp.id, p.now ?? new Date(), p.actorId],
    );
  } else await tx.update(MeetupRsvp, { id: rsvp.id }, { checkedInAt: null, checkedInById: null });
  return tx.findOneByOrFail(MeetupRsvp, { id: rsvp.id });
}

/**
 * The clinic's mentor saves what they measured onto the tank the member brought water from, through the tanks
 * module's own water-test save (units, derived values, concerns, live updates), as a test they logged.
 */
export async function recordClinicResult(
  tx: EntityManager,
  deps: NoticeDeps & Pick<Deps, 'tankChanges'>,
  p: {
    meetup: Meetup;
    userId: string;
    input: z.output<typeof createWaterTestSchema>;
    host: { id: string; displayName: string };
    now?: Date;
  },
): Promise<SavedWaterTest> {
  if (p.meetup.kind !== 'clinic')
    throw errors.conflict('Results are recorded at a water-testing clinic only.');
  if (p.meetup.status === 'cancelled') throw errors.conflict('This meetup was cancelled.');
  const rsvp = await expectedRsvp(tx, p.meetup, p.userId);
  if (!rsvp.tankId)
    throw errors.conflict(
      'They have not said which tank the water comes from: book a slot with a tank first.',
    );
  const tank = await loadTank(tx, p.meetup.clubId, rsvp.tankId);
  if (tank.ownerId !== p.userId) throw errors.conflict('That tank is no longer theirs.');
  requireActive(tank);
  const saved = await createWaterTest(tx, deps, tank, p.input, p.host.id, p.now);
  await tx.update(
    MeetupRsvp,
    { id: rsvp.id },
    {
      waterTestId: saved.test.id,
      ...(rsvp.checkedInAt ? {} : { checkedInAt: p.now ?? new Date(), checkedInById: p.host.id }),
    },
  );
  await tellResultsRecorded(tx, deps, p.meetup, {
    keeperId: p.userId,
    tankId: tank.id,
    tankName: tank.name,
    hostName: p.host.displayName,
  });
  await audit(tx, {
    actorId: p.host.id,
    clubId: p.meetup.clubId,
    action: 'meetup.clinic-result',
    targetType: 'WaterTest',
    targetId: saved.test.id,
    details: { meetupId: p.meetup.id, tankId: tank.id },
  });
  return saved;
}
