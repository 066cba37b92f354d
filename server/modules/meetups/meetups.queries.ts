import type { EntityManager, SelectQueryBuilder } from 'typeorm';
import type { AppAbility } from '../../../shared/abilities';
import type { RsvpStatus } from '../../../shared/constants/meetups';
import type { MeetupListWhen } from '../../../shared/schemas/meetup.schema';
import type { AttendanceRowView } from '../../../shared/schemas/meetup-views';
import { errors } from '../../lib/app-error';
import { whereAllowed } from '../access';
import { Meetup, MeetupRsvp } from './meetup.entity';

const LIST_LIMIT = 100;

/** The permission rules' fields for a meetup, as columns of the `m` alias. */
export const MEETUP_FIELDS = { clubId: 'm.club_id', hostId: 'm.host_id' };

/** One row of the summary query, as PostgreSQL hands it back. */
export interface MeetupRow {
  id: string;
  clubId: string;
  kind: Meetup['kind'];
  title: string;
  status: Meetup['status'];
  startsAt: Date;
  endsAt: Date;
  placeText: string;
  mapUrl: string | null;
  onlineUrl: string | null;
  capacity: number;
  hostId: string | null;
  hostName: string | null;
  timeZone: string;
  goingCount: number;
  waitlistCount: number;
  myStatus: RsvpStatus | null;
  myPosition: number | null;
  mySlot: Date | null;
  myTankId: string | null;
  myTankName: string | null;
  myCheckedInAt: Date | null;
}

/** Place in line of a waitlisted answer: how many waitlisted answers arrived before it, plus one. */
const POSITION = (r: string) =>
  `CASE WHEN ${r}.status = 'waitlisted' THEN (SELECT count(*)::int FROM meetup_rsvp w WHERE w.meetup_id = ${r}.meetup_id AND w.status = 'waitlisted' AND w.arrival <= ${r}.arrival) END`;

function summaries(manager: EntityManager, viewerId: string): SelectQueryBuilder<Meetup> {
  return manager
    .createQueryBuilder(Meetup, 'm')
    .innerJoin('club', 'c', 'c.id = m.club_id')
    .leftJoin('app_user', 'h', 'h.id = m.host_id')
    .leftJoin('meetup_rsvp', 'mine', 'mine.meetup_id = m.id AND mine.user_id = :viewerId', { viewerId })
    .leftJoin('tank', 'mt', 'mt.id = mine.tank_id')
    .select('m.id', 'id')
    .addSelect('m.club_id', 'clubId')
    .addSelect('m.kind', 'kind')
    .addSelect('m.title', 'title')
    .addSelect('m.status', 'status')
    .addSelect('m.starts_at', 'startsAt')
    .addSelect('m.ends_at', 'endsAt')
    .addSelect('m.place_text', 'placeText')
    .addSelect('m.map_url', 'mapUrl')
    .addSelect('m.online_url', 'onlineUrl')
    .addSelect('m.capacity', 'capacity')
    .addSelect('m.host_id', 'hostId')
    .addSelect('h.display_name', 'hostName')
    .addSelect('c.time_zone', 'timeZone')
    .addSelect(
      `(SELECT count(*)::int FROM meetup_rsvp g WHERE g.meetup_id = m.id AND g.status = 'going')`,
      'goingCount',
    )
    .addSelect(
      `(SELECT count(*)::int FROM meetup_rsvp g WHERE g.meetup_id = m.id AND g.status = 'waitlisted')`,
      'waitlistCount',
    )
    .addSelect('mine.status', 'myStatus')
    .addSelect(POSITION('mine'), 'myPosition')
    .addSelect('mine.slot_starts_at', 'mySlot')
    .addSelect('mine.tank_id', 'myTankId')
    .addSelect('mt.name', 'myTankName')
    .addSelect('mine.checked_in_at', 'myCheckedInAt');
}

/**
 * The club's meetups the viewer may read (the rules, in SQL): upcoming ones soonest first (cancelled included, so
 * nobody turns up by mistake), past ones latest first.
 */
export async function listMeetups(
  manager: EntityManager,
  ability: AppAbility,
  viewerId: string,
  clubId: string,
  when: MeetupListWhen,
  now = new Date(),
): Promise<MeetupRow[]> {
  const qb = summaries(manager, viewerId).where('m.club_id = :clubId', { clubId });
  if (when === 'upcoming') qb.andWhere('m.ends_at >= :now', { now }).orderBy('m.starts_at', 'ASC');
  else qb.andWhere('m.ends_at < :now', { now }).orderBy('m.starts_at', 'DESC');
  whereAllowed(qb, ability, 'read', 'Meetup', MEETUP_FIELDS);
  return qb.addOrderBy('m.id', 'ASC').limit(LIST_LIMIT).getRawMany<MeetupRow>();
}

export async function summaryOf(
  manager: EntityManager,
  viewerId: string,
  meetupId: string,
): Promise<MeetupRow> {
  const row = await summaries(manager, viewerId)
    .where('m.id = :meetupId', { meetupId })
    .getRawOne<MeetupRow>();
  if (!row) throw errors.notFound('That meetup');
  return row;
}

/**
 * The meetup in this club, or 404 (an id from another club does not exist here). `lock` takes its row for the
 * transaction: every change to its places goes through that lock, one at a time, in arrival order.
 */
export async function loadMeetup(
  manager: EntityManager,
  clubId: string,
  meetupId: string,
  lock = false,
): Promise<Meetup> {
  const qb = manager
    .createQueryBuilder(Meetup, 'm')
    .where('m.id = :meetupId AND m.club_id = :clubId', { meetupId, clubId });
  if (lock) qb.setLock('pessimistic_write');
  const meetup = await qb.getOne();
  if (!meetup) throw errors.notFound('That meetup');
  return meetup;
}

export async function rsvpOf(
  manager: EntityManager,
  meetupId: string,
  userId: string,
): Promise<MeetupRsvp | null> {
  return manager.findOneBy(MeetupRsvp, { meetupId, userId });
}

export async function clubTimeZone(manager: EntityManager, clubId: string): Promise<string> {
  const [row] = (await manager.query(`SELECT time_zone AS "timeZone" FROM club WHERE id = $1`, [clubId])) as {
    timeZone: string;
  }[];
  if (!row) throw errors.notFound('That club');
  return row.timeZone;
}

/** Clinic slots already booked, with who holds each. */
export async function bookedSlots(
  manager: EntityManager,
  meetupId: string,
): Promise<{ startsAt: Date; userId: string }[]> {
  return manager.query(
    `SELECT slot_starts_at AS "startsAt", user_id AS "userId" FROM meetup_rsvp WHERE meetup_id = $1 AND slot_starts_at IS NOT NULL`,
    [meetupId],
  );
}

/** People still expected (going, then the waitlist in order): the check-in list. */
export async function attendanceRows(manager: EntityManager, meetupId: string): Promise<AttendanceRowView[]> {
  const rows: (Omit<AttendanceRowView, 'tank' | 'checkedIn' | 'checkedInAt' | 'slotStartsAt'> & {
    checkedInAt: Date | null;
    slotStartsAt: Date | null;
    tankId: string | null;
    tankName: string | null;
    systemType: NonNullable<AttendanceRowView['tank']>['systemType'] | null;
  })[] = await manager.query(
    `SELECT r.user_id AS "userId", u.display_name AS "displayName", r.status, ${POSITION('r')} AS "waitlistPosition",
            r.checked_in_at AS "checkedInAt", r.slot_starts_at AS "slotStartsAt", r.tank_id AS "tankId", t.name AS "tankName",
            t.system_type AS "systemType", r.water_test_id AS "waterTestId"
       FROM meetup_rsvp r JOIN app_user u ON u.id = r.user_id LEFT JOIN tank t ON t.id = r.tank_id
      WHERE r.meetup_id = $1 AND r.status IN ('going', 'waitlisted')
      ORDER BY (r.status = 'waitlisted'), r.slot_starts_at NULLS LAST, lower(u.display_name), r.user_id`,
    [meetupId],
  );
  return rows.map((r) => ({
    userId: r.userId,
    displayName: r.displayName,
    status: r.status,
    waitlistPosition: r.waitlistPosition,
    checkedIn: r.checkedInAt !== null,
    checkedInAt: r.checkedInAt ? new Date(r.checkedInAt).toISOString() : null,
    slotStartsAt: r.slotStartsAt ? new Date(r.slotStartsAt).toISOString() : null,
    tank:
      r.tankId && r.tankName && r.systemType
        ? { id: r.tankId, name: r.tankName, systemType: r.systemType }
        : null,
    waterTestId: r.waterTestId,
  }));
}

export interface HistoryRow {
  meetupId: string;
  title: string;
  kind: Meetup['kind'];
  status: Meetup['status'];
  startsAt: Date;
  endsAt: Date;
  timeZone: string;
  rsvp: RsvpStatus;
  checkedInAt: Date | null;
}

/** Every meetup of the club the member answered, latest first. */
export async function attendanceHistory(
  manager: EntityManager,
  clubId: string,
  userId: string,
): Promise<HistoryRow[]> {
  return manager.query(
    `SELECT m.id AS "meetupId", m.title, m.kind, m.status, m.starts_at AS "startsAt", m.ends_at AS "endsAt", c.time_zone AS "timeZone",
            r.status AS rsvp, r.checked_in_at AS "checkedInAt"
       FROM meetup_rsvp r JOIN meetup m ON m.id = r.meetup_id JOIN club c ON c.id = m.club_id
      WHERE m.club_id = $1 AND r.user_id = $2
      ORDER BY m.starts_at DESC, m.id
      LIMIT 500`,
    [clubId, userId],
  );
}

/** The member's display name if they belong to the club (any status), else null. */
export async function memberName(
  manager: EntityManager,
  clubId: string,
  userId: string,
): Promise<string | null> {
  const [row] = (await manager.query(
    `SELECT u.display_name AS "displayName" FROM membership m JOIN app_user u ON u.id = m.user_id WHERE m.club_id = $1 AND m.user_id = $2`,
    [clubId, userId],
  )) as { displayName: string }[];
  return row?.displayName ?? null;
}

/** Who to tell about a change: everyone still expected (going or waitlisted). */
export async function expectedUserIds(manager: EntityManager, meetupId: string): Promise<string[]> {
  const rows: { userId: string }[] = await manager.query(
    `SELECT user_id AS "userId" FROM meetup_rsvp WHERE meetup_id = $1 AND status IN ('going', 'waitlisted') ORDER BY arrival`,
    [meetupId],
  );
  return rows.map((r) => r.userId);
}

/** An active mentor or admin of the club, who may run a meetup. */
export async function isHostable(manager: EntityManager, clubId: string, userId: string): Promise<boolean> {
  const rows: unknown[] = await manager.query(
    `SELECT 1 FROM membership WHERE club_id = $1 AND user_id = $2 AND status = 'active' AND role IN ('mentor', 'admin')`,
    [clubId, userId],
  );
  return rows.length > 0;
}

export interface FeedRow {
  meetup: Meetup;
  waitlisted: boolean;
  clubName: string;
  timeZone: string;
}

/** What a person's calendar feed holds: meetups they are going to or waiting for, in clubs they are active in. */
export async function feedMeetups(manager: EntityManager, userId: string, since: Date): Promise<FeedRow[]> {
  const rows: { id: string; waitlisted: boolean; clubName: string; timeZone: string }[] = await manager.query(
    `SELECT m.id, r.status = 'waitlisted' AS waitlisted, c.name AS "clubName", c.time_zone AS "timeZone"
       FROM meetup_rsvp r
       JOIN meetup m ON m.id = r.meetup_id
       JOIN club c ON c.id = m.club_id
       JOIN membership ms ON ms.club_id = m.club_id AND ms.user_id = r.user_id AND ms.status = 'active'
      WHERE r.user_id = $1 AND r.status IN ('going', 'waitlisted') AND m.ends_at >= $2
      ORDER BY m.starts_at, m.id
      LIMIT 500`,
    [userId, since],
  );
  if (!rows.length) return [];
  const meetups = new Map(
    (
      await manager
        .createQueryBuilder(Meetup, 'm')
        .where('m.id = ANY(:ids)', { ids: rows.map((r) => r.id) })
        .getMany()
    ).map((m) => [m.id, m]),
  );
  return rows.map((r) => ({
    meetup: meetups.get(r.id)!,
    waitlisted: r.waitlisted,
    clubName: r.clubName,
    timeZone: r.timeZone,
  }));
}

/** (meetup, person) pairs whose reminder is due at `now` and not yet sent for the meetup's current start. */
export async function dueReminders(
  manager: EntityManager,
  now: Date,
  hoursBefore: number,
  latestHoursBefore: number,
): Promise<{ meetupId: string; userId: string }[]> {
  return manager.query(
    `SELECT r.meetup_id AS "meetupId", r.user_id AS "userId"
       FROM meetup m JOIN meetup_rsvp r ON r.meetup_id = m.id AND r.status = 'going'
      WHERE m.status = 'scheduled'
        AND m.starts_at <= $1::timestamptz + make_interval(hours => $2)
        AND m.starts_at > $1::timestamptz + make_interval(hours => $3)
        AND NOT EXISTS (SELECT 1 FROM meetup_reminder x WHERE x.meetup_id = m.id AND x.user_id = r.user_id AND x.starts_at = m.starts_at)
      ORDER BY m.starts_at, m.id, r.arrival`,
    [now.toISOString(), hoursBefore, latestHoursBefore],
  );
}
