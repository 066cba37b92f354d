import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import type {
  AttendanceHistoryView,
  AttendanceListView,
  MeetupDetailView,
  MeetupSummaryView,
} from '../../../shared/schemas/meetup-views';
import type { Club } from '../../../server/modules/clubs/club.entity';
import { resetDatabase } from '../../helpers/db';
import { makeClub, makeMember } from '../../helpers/factories';
import { signedIn, type Client } from '../../helpers/http';
import { insertTank } from '../../helpers/tank-rows';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { mailsTo, settledMailsTo } from '../notifications/mail-helpers';
import { clubTimeIn, londonClub, talk } from './meetup-fixtures';

type Person = Awaited<ReturnType<typeof makeMember>>;

describe('meetups: planning, answering, clinics and check-in', () => {
  let t: TestApp;
  let club: Club;
  let admin: Person;
  let mentor: Person;
  let keeper: Person;
  let other: Person;
  let ada: Client;
  let bo: Client;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    club = await londonClub(t.dataSource);
    admin = await makeMember(t.dataSource, club, 'Ada Admin', 'admin');
    mentor = await makeMember(t.dataSource, club, 'Maya Mentor', 'mentor');
    keeper = await makeMember(t.dataSource, club, 'Bo Beginner');
    other = await makeMember(t.dataSource, club, 'Cy Member');
    ada = await signedIn(t.app, admin.user.email);
    bo = await signedIn(t.app, keeper.user.email);
  });
  const base = () => `/api/clubs/${club.id}/meetups`;
  const create = async (body = talk()) => {
    const res = await ada.post(base(), body);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return res.body.meetup as MeetupDetailView;
  };

  it('when the form is wrong, then the answer is 400 naming each field, never a 500', async () => {
    const cases: [Record<string, unknown>, string, RegExp][] = [
      [talk({ endsAt: clubTimeIn(10, '18:00') }), 'endsAt', /end after it starts/],
      [talk({ startsAt: '2027-02-30T19:00' }), 'startsAt', /does not exist/],
      [talk({ startsAt: '19:00 tomorrow' }), 'startsAt', /YYYY-MM-DD/],
      [talk({ kind: 'online', placeText: '' }), 'onlineUrl', /link people join/],
      [talk({ placeText: '' }), 'placeText', /Say where/],
      [talk({ kind: 'clinic' }), 'hostId', /mentor who runs/],
      [talk({ capacity: 0 }), 'capacity', /At least one/],
      [talk({ mapUrl: 'javascript:alert(1)' }), 'mapUrl', /https/],
      [{ ...talk(), extra: 1 }, '(root)', /./],
      [
        talk({ startsAt: clubTimeIn(-2, '19:00'), endsAt: clubTimeIn(-2, '21:00') }),
        'startsAt',
        /not passed/,
      ],
      [talk({ kind: 'clinic', hostId: other.user.id }), 'hostId', /mentor or admin/],
    ];
    for (const [body, path, message] of cases) {
      const res = await ada.post(base(), body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      const issue = (res.body.issues as { path: string; message: string }[]).find((i) => i.path === path);
      expect(issue?.message, `${path} in ${JSON.stringify(res.body.issues)}`).toMatch(message);
    }
    expect(
      (await bo.put(`${base()}/00000000-0000-4000-8000-000000000000/rsvp`, { response: 'maybe' })).status,
    ).toBe(400);
  });

  it('when an admin edits the time and the place, then everyone expected is e-mailed what changed, with the club’s time', async () => {
    const m = await create();
    expect(m.when).toMatch(/19:00–21:00 \((GMT|BST)\)/);
    await bo.put(`${base()}/${m.id}/rsvp`, { response: 'going' });
    const edited = await ada.patch(`${base()}/${m.id}`, {
      startsAt: m.local.startsAt.replace('19:00', '18:30'),
      placeText: 'The bigger hall',
    });
    expect(edited.status).toBe(200);
    expect(edited.body.meetup.when).toMatch(/18:30–21:00/);
    const [mail] = await settledMailsTo(t.dataSource, keeper.user.email, 1);
    expect(mail!.subject).toBe('Tideline Keepers: Changed: Reading your first nitrite curve');
    expect(mail!.text).toMatch(/New time: .*18:30–21:00/);
    expect(mail!.text).toContain('New place: The bigger hall');
    expect(mail!.attachments[0]!.content).toContain('SEQUENCE:1');
    // Fewer places than people going is refused; an end before the stored start is checked on the merged meetup.
    expect((await ada.patch(`${base()}/${m.id}`, { capacity: 1 })).status).toBe(200);
    await (await signedIn(t.app, other.user.email)).put(`${base()}/${m.id}/rsvp`, { response: 'going' });
    const refused = await ada.patch(`${base()}/${m.id}`, { capacity: 0 });
    expect(refused.status).toBe(400);
    expect((await ada.patch(`${base()}/${m.id}`, { capacity: 2 })).body.meetup).toMatchObject({
      goingCount: 2,
      waitlistCount: 0,
    });
    const tooFew = await ada.patch(`${base()}/${m.id}`, { capacity: 1 });
    expect(tooFew.status).toBe(409);
    expect(tooFew.body.error.message).toBe('2 people are already going: the meetup needs at least 2 places.');
    expect(
      (await ada.patch(`${base()}/${m.id}`, { endsAt: m.local.startsAt.replace('19:00', '17:00') })).body
        .issues[0].path,
    ).toBe('endsAt');
  });

  it('when an admin cancels, then attendees are told why, answers are refused after, and the list still shows it as cancelled', async () => {
    const m = await create();
    await bo.put(`${base()}/${m.id}/rsvp`, { response: 'going' });
    expect((await ada.post(`${base()}/${m.id}/cancel`, {})).status).toBe(400);
    const res = await ada.post(`${base()}/${m.id}/cancel`, { reason: 'The speaker is ill.' });
    expect(res.body.meetup).toMatchObject({ status: 'cancelled', cancelReason: 'The speaker is ill.' });
    const [mail] = await settledMailsTo(t.dataSource, keeper.user.email, 1);
    expect(mail!.subject).toContain('Cancelled: Reading your first nitrite curve');
    expect(mail!.text).toContain('The speaker is ill.');
    expect(mail!.attachments[0]!.content).toContain('STATUS:CANCELLED');
    expect((await bo.put(`${base()}/${m.id}/rsvp`, { response: 'not-going' })).status).toBe(409);
    expect((await ada.patch(`${base()}/${m.id}`, { title: 'Back on' })).status).toBe(409);
    const list = (await bo.get(base())).body.meetups as MeetupSummaryView[];
    expect(list.map((x) => [x.id, x.status])).toEqual([[m.id, 'cancelled']]);
    // Nobody who only said "not going" is e-mailed about it.
    expect(await mailsTo(t.dataSource, other.user.email)).toEqual([]);
  });

  it('when a member says going, not going, then going again, then they keep one answer and rejoin at the back of the line', async () => {
    const m = await create(talk({ capacity: 1 }));
    const cy = await signedIn(t.app, other.user.email);
    expect((await bo.put(`${base()}/${m.id}/rsvp`, { response: 'going' })).body.meetup.mine.status).toBe(
      'going',
    );
    expect((await bo.put(`${base()}/${m.id}/rsvp`, { response: 'going' })).body.meetup.goingCount).toBe(1);
    expect((await cy.put(`${base()}/${m.id}/rsvp`, { response: 'going' })).body.meetup.mine).toMatchObject({
      status: 'waitlisted',
      waitlistPosition: 1,
    });
    const left = (await bo.put(`${base()}/${m.id}/rsvp`, { response: 'not-going' })).body
      .meetup as MeetupDetailView;
    expect(left.mine!.status).toBe('not-going');
    expect(left).toMatchObject({ goingCount: 1, waitlistCount: 0 });
    expect((await bo.put(`${base()}/${m.id}/rsvp`, { response: 'going' })).body.meetup.mine).toMatchObject({
      status: 'waitlisted',
      waitlistPosition: 1,
    });
    // More places: the line is served at once.
    expect((await ada.patch(`${base()}/${m.id}`, { capacity: 2 })).body.meetup).toMatchObject({
      goingCount: 2,
      waitlistCount: 0,
    });
  });

  it('when a member books a clinic slot with their tank, then the mentor running it records results onto that tank through the water-test save', async () => {
    const tankId = await insertTank(t.dataSource, {
      clubId: club.id,
      ownerId: keeper.user.id,
      systemType: 'tropical-freshwater',
      phase: 'cycling',
      volumeL: 60,
      name: 'Guppy starter',
    });
    const otherTank = await insertTank(t.dataSource, {
      clubId: club.id,
      ownerId: other.user.id,
      systemType: 'tropical-freshwater',
      phase: 'cycling',
      volumeL: 60,
      name: 'Not yours',
    });
    const m = await create(
      talk({ kind: 'clinic', title: 'Bring a sample', hostId: mentor.user.id, slotMinutes: 20, capacity: 6 }),
    );
    expect(m.slots.map((s) => s.label)).toEqual(['19:00', '19:20', '19:40', '20:00', '20:20', '20:40']);
    const slot = m.slots[1]!.startsAt;
    expect((await bo.put(`${base()}/${m.id}/booking`, { slotStartsAt: slot, tankId })).status).toBe(409); // not going yet
    await bo.put(`${base()}/${m.id}/rsvp`, { response: 'going' });
    expect(
      (await bo.put(`${base()}/${m.id}/booking`, { slotStartsAt: slot, tankId: otherTank })).status,
    ).toBe(404);
    expect(
      (await bo.put(`${base()}/${m.id}/booking`, { slotStartsAt: '2020-01-01T00:00:00Z', tankId })).body
        .issues[0].path,
    ).toBe('slotStartsAt');
    const booked = (await bo.put(`${base()}/${m.id}/booking`, { slotStartsAt: slot, tankId })).body
      .meetup as MeetupDetailView;
    expect(booked.mine).toMatchObject({ slotStartsAt: slot, tank: { id: tankId, name: 'Guppy starter' } });
    expect(booked.slots[1]).toMatchObject({ taken: true, mine: true });
    const cy = await signedIn(t.app, other.user.email);
    await cy.put(`${base()}/${m.id}/rsvp`, { response: 'going' });
    expect(
      (await cy.put(`${base()}/${m.id}/booking`, { slotStartsAt: slot, tankId: otherTank })).status,
    ).toBe(409);

    const maya = await signedIn(t.app, mentor.user.email);
    const list = (await maya.get(`${base()}/${m.id}/attendance`)).body as AttendanceListView;
    expect(list.rows[0]).toMatchObject({
      userId: keeper.user.id,
      slotStartsAt: slot,
      tank: { id: tankId, name: 'Guppy starter' },
      checkedIn: false,
    });
    const takenAt = new Date(Date.now() - 60_000).toISOString();
    const recorded = await maya.post(`${base()}/${m.id}/bookings/${keeper.user.id}/water-tests`, {
      takenAt,
      entries: { nitrite: { value: 0.5, unit: 'mg/L NO2' }, pH: { value: 7.4 } },
    });
    expect(recorded.status, JSON.stringify(recorded.body)).toBe(201);
    expect(recorded.body.waterTest).toMatchObject({ tankId, createdById: mentor.user.id });
    // The keeper reads it on their own tank, and is told.
    const tests = (await bo.get(`/api/clubs/${club.id}/tanks/${tankId}/water-tests`)).body.items as {
      id: string;
      values: Record<string, number>;
    }[];
    expect(tests.map((x) => x.id)).toEqual([recorded.body.waterTest.id]);
    expect(tests[0]!.values.pH).toBe(7.4);
    const notes = (await bo.get('/api/me/notifications')).body.notifications as {
      title: string;
      link: string;
    }[];
    expect(notes.find((n) => n.title === 'Clinic results are on Guppy starter')?.link).toBe(
      `/tanks/${tankId}`,
    );
    const after = (await maya.get(`${base()}/${m.id}/attendance`)).body as AttendanceListView;
    expect(after.rows.find((r) => r.userId === keeper.user.id)).toMatchObject({
      checkedIn: true,
      waterTestId: recorded.body.waterTest.id,
    });
    // Bad readings are refused by the same save path.
    expect(
      (
        await maya.post(`${base()}/${m.id}/bookings/${keeper.user.id}/water-tests`, {
          takenAt,
          entries: { pH: { value: 19 } },
        })
      ).status,
    ).toBe(400);
    // Someone without a booked tank has nothing to record onto.
    expect(
      (
        await maya.post(`${base()}/${m.id}/bookings/${admin.user.id}/water-tests`, {
          takenAt,
          entries: { pH: { value: 7 } },
        })
      ).status,
    ).toBe(404);
  });

  it('when two members book the same clinic slot at the same moment, then one gets it and the other is told to choose another', async () => {
    const m = await create(
      talk({ kind: 'clinic', title: 'Bring a sample', hostId: mentor.user.id, slotMinutes: 30, capacity: 6 }),
    );
    const cy = await signedIn(t.app, other.user.email);
    const tanks = [
      await insertTank(t.dataSource, {
        clubId: club.id,
        ownerId: keeper.user.id,
        systemType: 'tropical-freshwater',
        name: 'Bo’s tank',
      }),
      await insertTank(t.dataSource, {
        clubId: club.id,
        ownerId: other.user.id,
        systemType: 'tropical-freshwater',
        name: 'Cy’s tank',
      }),
    ];
    for (const c of [bo, cy]) await c.put(`${base()}/${m.id}/rsvp`, { response: 'going' });
    const slot = m.slots[0]!.startsAt;
    const answers = await Promise.all(
      [bo, cy].map((c, i) => c.put(`${base()}/${m.id}/booking`, { slotStartsAt: slot, tankId: tanks[i] })),
    );
    expect(answers.map((a) => a.status).sort()).toEqual([200, 409]);
    expect(answers.find((a) => a.status === 409)!.body.error.message).toBe(
      'Someone has just booked that slot. Choose another.',
    );
    const held: { n: number }[] = await t.dataSource.query(
      `SELECT count(*)::int AS n FROM meetup_rsvp WHERE meetup_id = $1 AND slot_starts_at = $2`,
      [m.id, slot],
    );
    expect(held[0]!.n).toBe(1);
  });

  it('when people are ticked in twice or out again, then the list settles on the last answer and the history counts it', async () => {
    const m = await create(talk({ startsAt: clubTimeIn(1, '19:00'), endsAt: clubTimeIn(1, '21:00') }));
    await bo.put(`${base()}/${m.id}/rsvp`, { response: 'going' });
    const tick = (present: boolean) => ada.put(`${base()}/${m.id}/attendance/${keeper.user.id}`, { present });
    const [a, b] = await Promise.all([tick(true), tick(true)]);
    expect([a.status, b.status]).toEqual([200, 200]);
    expect(a.body.row.checkedInAt).toBe(b.body.row.checkedInAt);
    expect((await tick(false)).body.row.checkedIn).toBe(false);
    expect((await tick(true)).body.row.checkedIn).toBe(true);
    expect((await ada.put(`${base()}/${m.id}/attendance/${other.user.id}`, { present: true })).status).toBe(
      404,
    );
    // Once it is over it counts as attended.
    await t.dataSource.query(
      `UPDATE meetup SET starts_at = now() - interval '3 hours', ends_at = now() - interval '1 hour' WHERE id = $1`,
      [m.id],
    );
    const mine = (await bo.get(`/api/clubs/${club.id}/members/${keeper.user.id}/attendance`))
      .body as AttendanceHistoryView;
    expect(mine).toMatchObject({
      member: { userId: keeper.user.id, displayName: 'Bo Beginner' },
      attended: 1,
      missed: 0,
    });
    expect(mine.rows[0]).toMatchObject({ rsvp: 'going', checkedIn: true, meetup: { id: m.id } });
    expect((await bo.get(`${base()}?when=past`)).body.meetups.map((x: MeetupSummaryView) => x.id)).toEqual([
      m.id,
    ]);
    expect((await bo.get(base())).body.meetups).toEqual([]);
    expect((await bo.get(`/api/clubs/${club.id}/members/${other.user.id}/attendance`)).status).toBe(404);
    expect((await bo.put(`${base()}/${m.id}/rsvp`, { response: 'going' })).status).toBe(409);
  });

  it('when a member of another club asks, then the meetup does not exist for them', async () => {
    const m = await create();
    const elsewhere = await makeClub(t.dataSource, 'Far Club');
    const stranger = await makeMember(t.dataSource, elsewhere, 'Stan Stranger', 'admin');
    const s = await signedIn(t.app, stranger.user.email);
    expect((await s.get(`/api/clubs/${elsewhere.id}/meetups/${m.id}`)).status).toBe(404);
    expect(
      (await s.put(`/api/clubs/${elsewhere.id}/meetups/${m.id}/rsvp`, { response: 'going' })).status,
    ).toBe(404);
  });
});
