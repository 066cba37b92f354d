import ICAL from 'ical.js';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { sendDueReminders } from '../../../server/modules/meetups';
import { Membership } from '../../../server/modules/clubs/membership.entity';
import { resetDatabase } from '../../helpers/db';
import { thursdaysAroundSpringChange } from '../../helpers/dst-dates';
import { makeMember } from '../../helpers/factories';
import { signedIn, type Client } from '../../helpers/http';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { mailsTo, settledMailsTo } from '../notifications/mail-helpers';
import { CLUB_ZONE, londonClub, talk } from './meetup-fixtures';

const HOUR = 3_600_000;

/** Events of an iCalendar file as an independent parser (ical.js) reads them. */
function parseEvents(ics: string) {
  const calendar = new ICAL.Component(ICAL.parse(ics));
  return calendar.getAllSubcomponents('vevent').map((v) => {
    const e = new ICAL.Event(v);
    return {
      uid: e.uid,
      summary: e.summary,
      start: e.startDate.toJSDate(),
      end: e.endDate.toJSDate(),
      sequence: e.sequence,
      status: v.getFirstPropertyValue('status') as string | null,
    };
  });
}

const clubClock = (at: Date) =>
  new Intl.DateTimeFormat('en-GB', {
    timeZone: CLUB_ZONE,
    hour: '2-digit',
    minute: '2-digit',
    hourCycle: 'h23',
  }).format(at);

describe('meetup calendars and reminders across a change of the clocks', () => {
  let t: TestApp;
  let member: Client;
  let memberEmail: string;
  let memberMembershipId: string;
  let clubId: string;
  const { before, after } = thursdaysAroundSpringChange();
  const ids: Record<'before' | 'after', string> = { before: '', after: '' };
  const starts: Record<'before' | 'after', Date> = { before: new Date(0), after: new Date(0) };

  beforeAll(async () => {
    t = await createTestApp();
    await resetDatabase(t.dataSource);
    const club = await londonClub(t.dataSource);
    clubId = club.id;
    const admin = await makeMember(t.dataSource, club, 'Ada Admin', 'admin');
    const m = await makeMember(t.dataSource, club, 'Mina Member');
    memberEmail = m.user.email;
    memberMembershipId = m.membership.id;
    const ada = await signedIn(t.app, admin.user.email);
    member = await signedIn(t.app, m.user.email);
    // Planned in winter (GMT) for 19:00 both before and after the clocks go forward.
    for (const [key, day] of [
      ['before', before],
      ['after', after],
    ] as const) {
      const res = await ada.post(
        `/api/clubs/${club.id}/meetups`,
        talk({ title: `Spring talk ${key}`, startsAt: `${day}T19:00`, endsAt: `${day}T21:00` }),
      );
      expect(res.status).toBe(201);
      ids[key] = res.body.meetup.id;
      starts[key] = new Date(res.body.meetup.startsAt);
      expect(res.body.meetup.local.startsAt).toBe(`${day}T19:00`);
      expect(
        (await member.put(`/api/clubs/${club.id}/meetups/${ids[key]}/rsvp`, { response: 'going' })).body
          .meetup.mine.status,
      ).toBe('going');
    }
  });
  afterAll(() => t.close());

  it('when stored, then 19:00 before the change is 19:00 UTC and after it 18:00 UTC (BST, UK SI 2002/262)', () => {
    expect(starts.before.toISOString()).toBe(`${before}T19:00:00.000Z`);
    expect(starts.after.toISOString()).toBe(`${after}T18:00:00.000Z`);
  });

  it('when a meetup’s .ics is downloaded, then ical.js reads the same instants: 19:00 club time on both sides of the change', async () => {
    for (const key of ['before', 'after'] as const) {
      const res = await member.get(`/api/clubs/${clubId}/meetups/${ids[key]}/calendar.ics`);
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toMatch(/^text\/calendar/);
      const [event, ...rest] = parseEvents(res.text);
      expect(rest).toEqual([]);
      expect(event!.summary).toBe(`Spring talk ${key}`);
      expect(event!.start.toISOString()).toBe(starts[key].toISOString());
      expect(event!.end.getTime() - event!.start.getTime()).toBe(2 * HOUR);
      expect(clubClock(event!.start)).toBe('19:00');
      expect(event!.status).toBe('CONFIRMED');
    }
  });

  it('when the reminder job runs 23 h before, then one e-mail says 19:00 (BST) and carries an .ics at 19:00 club time; running again sends nothing', async () => {
    const now = new Date(starts.after.getTime() - 23 * HOUR);
    expect(await sendDueReminders(t.deps, now)).toEqual({ sent: 1 });
    expect(await sendDueReminders(t.deps, now)).toEqual({ sent: 0 });
    expect(await sendDueReminders(t.deps, new Date(now.getTime() + 15 * 60_000))).toEqual({ sent: 0 });
    const [mail, ...others] = await settledMailsTo(t.dataSource, memberEmail, 1);
    expect(others).toEqual([]);
    expect(mail!.subject).toBe('Tideline Keepers: Reminder: Spring talk after');
    expect(mail!.text).toContain('19:00–21:00 (BST)');
    const [ics] = mail!.attachments;
    expect(ics!.filename).toBe('meetup.ics');
    expect(ics!.contentType).toMatch(/^text\/calendar/);
    const [event] = parseEvents(ics!.content);
    expect(event!.start.toISOString()).toBe(`${after}T18:00:00.000Z`);
    expect(clubClock(event!.start)).toBe('19:00');
  });

  it('when the earlier meetup’s reminder is due, then it says 19:00 (GMT); a reminder is not due 25 h before or after the start', async () => {
    expect(await sendDueReminders(t.deps, new Date(starts.before.getTime() - 25 * HOUR))).toEqual({
      sent: 0,
    });
    expect(await sendDueReminders(t.deps, new Date(starts.before.getTime() - 20 * HOUR))).toEqual({
      sent: 1,
    });
    expect(await sendDueReminders(t.deps, new Date(starts.before.getTime() + HOUR))).toEqual({ sent: 0 });
    const mails = await settledMailsTo(t.dataSource, memberEmail, 2);
    const earlier = mails.find((m) => m.subject.endsWith('Spring talk before'))!;
    expect(earlier.text).toContain('19:00–21:00 (GMT)');
    expect(clubClock(parseEvents(earlier.attachments[0]!.content)[0]!.start)).toBe('19:00');
  });

  it('when a meetup is moved, then its new start is reminded of again and the .ics sequence goes up', async () => {
    const admin = await signedIn(
      t.app,
      (await t.dataSource.query(`SELECT u.email FROM app_user u WHERE u.display_name = 'Ada Admin'`))[0]
        .email,
    );
    const moved = await admin.patch(`/api/clubs/${clubId}/meetups/${ids.after}`, {
      startsAt: `${after}T19:30`,
      endsAt: `${after}T21:30`,
    });
    expect(moved.status).toBe(200);
    expect(moved.body.meetup.when).toContain('19:30–21:30 (BST)');
    expect(await sendDueReminders(t.deps, new Date(starts.after.getTime() - 23 * HOUR))).toEqual({ sent: 1 });
    const ics = (await member.get(`/api/clubs/${clubId}/meetups/${ids.after}/calendar.ics`)).text;
    expect(parseEvents(ics)[0]!.sequence).toBe(1);
    // The change e-mail and the new reminder, on top of the two reminders before.
    expect(
      (await settledMailsTo(t.dataSource, memberEmail, 4)).map((m) =>
        m.subject.replace('Tideline Keepers: ', ''),
      ),
    ).toEqual([
      'Reminder: Spring talk after',
      'Reminder: Spring talk before',
      'Changed: Spring talk after',
      'Reminder: Spring talk after',
    ]);
  });

  it('when a calendar app reads the personal feed without a cookie, then it gets the member’s meetups; a reset link kills the old one', async () => {
    const { url } = (await member.get('/api/me/calendar-feed')).body as { url: string };
    const path = new URL(url).pathname;
    expect(url.startsWith(`${t.config.baseUrl}/api/calendar-feeds/`)).toBe(true);
    const feed = await request(t.app).get(path);
    expect(feed.status).toBe(200);
    expect(feed.headers['content-type']).toMatch(/^text\/calendar/);
    const events = parseEvents(feed.text);
    expect(events.map((e) => e.summary).sort()).toEqual(['Spring talk after', 'Spring talk before']);
    expect(events.map((e) => clubClock(e.start)).sort()).toEqual(['19:00', '19:30']);

    const tampered = path.replace(/\.([A-Za-z0-9_-])/, (_m, c: string) => `.${c === 'A' ? 'B' : 'A'}`);
    expect((await request(t.app).get(tampered)).status).toBe(404);
    expect((await request(t.app).post(path)).status).toBeGreaterThanOrEqual(400);

    const reset = (await member.post('/api/me/calendar-feed/reset')).body as { url: string };
    expect(reset.url).not.toBe(url);
    expect((await request(t.app).get(path)).status).toBe(404);
    expect((await request(t.app).get(new URL(reset.url).pathname)).status).toBe(200);

    // A suspended member's feed goes empty at once: membership is checked on every read.
    await t.dataSource.getRepository(Membership).update({ id: memberMembershipId }, { status: 'suspended' });
    expect(parseEvents((await request(t.app).get(new URL(reset.url).pathname)).text)).toEqual([]);
    await t.dataSource.getRepository(Membership).update({ id: memberMembershipId }, { status: 'active' });
  });

  it('when the meetup is cancelled, then the feed keeps it as CANCELLED so calendars drop it, and no reminder goes out', async () => {
    const admin = await signedIn(
      t.app,
      (await t.dataSource.query(`SELECT u.email FROM app_user u WHERE u.display_name = 'Ada Admin'`))[0]
        .email,
    );
    expect(
      (await admin.post(`/api/clubs/${clubId}/meetups/${ids.before}/cancel`, { reason: 'The hall flooded.' }))
        .status,
    ).toBe(200);
    const { url } = (await member.get('/api/me/calendar-feed')).body as { url: string };
    const cancelled = parseEvents((await request(t.app).get(new URL(url).pathname)).text).find(
      (e) => e.summary === 'Spring talk before',
    )!;
    expect(cancelled.status).toBe('CANCELLED');
    expect(cancelled.sequence).toBe(1);
    const sentBefore = (await mailsTo(t.dataSource, memberEmail)).length;
    await t.dataSource.query(`DELETE FROM meetup_reminder`);
    expect(await sendDueReminders(t.deps, new Date(starts.before.getTime() - 20 * HOUR))).toEqual({
      sent: 0,
    });
    const mails = await settledMailsTo(t.dataSource, memberEmail, sentBefore + 1);
    expect(mails.at(-1)!.subject).toBe('Tideline Keepers: Cancelled: Spring talk before');
    expect(mails.at(-1)!.text).toContain('The hall flooded.');
  });
});
