import type { EntityManager } from 'typeorm';
import { describeClubTime } from '../../../shared/meetups/club-time';
import type { Deps } from '../../deps';
import { icsAttachment, type CalendarEntry } from './meetup-calendar';
import type { Meetup } from './meetup.entity';

/** What telling people needs: notify() and the links' base. */
export type NoticeDeps = Pick<Deps, 'notify' | 'config'>;

const linkOf = (meetup: Pick<Meetup, 'id'>) => `/meetups/${meetup.id}`;

async function clubOf(tx: EntityManager, clubId: string): Promise<{ name: string; timeZone: string }> {
  const [club] = (await tx.query(`SELECT name, time_zone AS "timeZone" FROM club WHERE id = $1`, [
    clubId,
  ])) as { name: string; timeZone: string }[];
  return club ?? { name: '', timeZone: 'UTC' };
}

/** The meetup as calendars and e-mails describe it, with its link in the app. */
export async function calendarEntryOf(
  tx: EntityManager,
  meetup: Meetup,
  baseUrl: string,
): Promise<CalendarEntry> {
  const club = await clubOf(tx, meetup.clubId);
  return { meetup, timeZone: club.timeZone, clubName: club.name, url: `${baseUrl}${linkOf(meetup)}` };
}

const placeLine = (m: Meetup) =>
  m.kind === 'online' ? `Online: ${m.onlineUrl ?? ''}` : `Where: ${m.placeText}`;

async function tell(
  tx: EntityManager,
  deps: NoticeDeps,
  meetup: Meetup,
  userIds: string[],
  title: string,
  lines: string[],
): Promise<void> {
  if (!userIds.length) return;
  const entry = await calendarEntryOf(tx, meetup, deps.config.baseUrl);
  await deps.notify(tx, {
    userIds,
    clubId: meetup.clubId,
    kind: 'meetup',
    title,
    body: [
      describeClubTime(meetup.startsAt, meetup.endsAt, entry.timeZone),
      placeLine(meetup),
      ...lines,
    ].join('\n'),
    link: linkOf(meetup),
    subject: { type: 'Meetup', id: meetup.id },
    attachments: [icsAttachment(entry)],
  });
}

export const tellPromoted = (tx: EntityManager, deps: NoticeDeps, meetup: Meetup, userIds: string[]) =>
  tell(tx, deps, meetup, userIds, `A place freed up: you are going to ${meetup.title}`, [
    'You were on the waitlist and a place is now yours. Can’t make it after all? Say so in the app so the next person gets it.',
  ]);

export const tellChanged = (
  tx: EntityManager,
  deps: NoticeDeps,
  meetup: Meetup,
  userIds: string[],
  changes: string[],
) =>
  tell(tx, deps, meetup, userIds, `Changed: ${meetup.title}`, [
    'What changed:',
    ...changes.map((c) => `- ${c}`),
  ]);

export const tellCancelled = (tx: EntityManager, deps: NoticeDeps, meetup: Meetup, userIds: string[]) =>
  tell(tx, deps, meetup, userIds, `Cancelled: ${meetup.title}`, [`Why: ${meetup.cancelReason ?? ''}`]);

export const tellReminder = (tx: EntityManager, deps: NoticeDeps, meetup: Meetup, userIds: string[]) =>
  tell(tx, deps, meetup, userIds, `Reminder: ${meetup.title}`, [
    'You said you are going. Can’t make it now? Say so in the app so someone on the waitlist gets your place.',
  ]);

/** The keeper hears that the clinic's results are on their tank. */
export async function tellResultsRecorded(
  tx: EntityManager,
  deps: NoticeDeps,
  meetup: Meetup,
  p: { keeperId: string; tankId: string; tankName: string; hostName: string },
): Promise<void> {
  await deps.notify(tx, {
    userIds: [p.keeperId],
    clubId: meetup.clubId,
    kind: 'meetup',
    title: `Clinic results are on ${p.tankName}`,
    body: `${p.hostName} tested the water you brought to ${meetup.title} and saved the results on your tank.`,
    link: `/tanks/${p.tankId}`,
    subject: { type: 'Meetup', id: meetup.id },
  });
}
