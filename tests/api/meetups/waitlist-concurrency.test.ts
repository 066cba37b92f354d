import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { MeetupDetailView } from '../../../shared/schemas/meetup-views';
import { resetDatabase } from '../../helpers/db';
import { makeMember } from '../../helpers/factories';
import { signedIn, type Client } from '../../helpers/http';
import { createTestApp, type TestApp } from '../../helpers/test-app';
import { settledMailsTo } from '../notifications/mail-helpers';
import { londonClub, talk } from './meetup-fixtures';

interface Row {
  userId: string;
  status: string;
  arrival: string;
  promotedAt: Date | null;
}

describe('meetup places and the waitlist under concurrency', () => {
  let t: TestApp;
  let members: { client: Client; userId: string; email: string }[];
  let path: string;

  beforeAll(async () => {
    t = await createTestApp();
    await resetDatabase(t.dataSource);
    const club = await londonClub(t.dataSource);
    const admin = await makeMember(t.dataSource, club, 'Ada Admin', 'admin');
    const people = [];
    for (let i = 0; i < 30; i++)
      people.push(await makeMember(t.dataSource, club, `Member ${String(i).padStart(2, '0')}`));
    members = [];
    for (const p of people)
      members.push({ client: await signedIn(t.app, p.user.email), userId: p.user.id, email: p.user.email });
    const created = await (
      await signedIn(t.app, admin.user.email)
    ).post(`/api/clubs/${club.id}/meetups`, talk({ capacity: 20 }));
    expect(created.status).toBe(201);
    path = `/api/clubs/${club.id}/meetups/${created.body.meetup.id}`;
  }, 120_000);
  afterAll(() => t.close());

  const rows = async (): Promise<Row[]> =>
    t.dataSource.query(
      `SELECT user_id AS "userId", status, arrival, promoted_at AS "promotedAt" FROM meetup_rsvp WHERE meetup_id = $1 ORDER BY arrival`,
      [path.split('/').pop()],
    );

  it('when 30 members say "going" at once for 20 places, then exactly 20 go and 10 wait, in the order they arrived', async () => {
    const answers = await Promise.all(
      members.map((m) => m.client.put(`${path}/rsvp`, { response: 'going' })),
    );
    expect(answers.map((a) => a.status)).toEqual(members.map(() => 200));

    const stored = await rows();
    expect(stored).toHaveLength(30);
    // Arrival order is the order the meetup's lock handed out places: the first 20 go, the last 10 wait.
    expect(stored.slice(0, 20).every((r) => r.status === 'going')).toBe(true);
    expect(stored.slice(20).every((r) => r.status === 'waitlisted')).toBe(true);

    // Each person was told what the database holds, and the line is numbered 1–10 in arrival order.
    const told = new Map(
      members.map((m, i) => [m.userId, (answers[i]!.body.meetup as MeetupDetailView).mine!]),
    );
    stored.forEach((r, i) => {
      expect(told.get(r.userId)!.status).toBe(r.status);
      expect(told.get(r.userId)!.waitlistPosition).toBe(i < 20 ? null : i - 19);
    });
    const meetup = answers[0]!.body.meetup as MeetupDetailView;
    const latest = (await members[0]!.client.get(path)).body.meetup as MeetupDetailView;
    expect({ going: latest.goingCount, waiting: latest.waitlistCount }).toEqual({ going: 20, waiting: 10 });
    expect(meetup.capacity).toBe(20);
  });

  it('when 5 going members cancel at once (each tapping twice), then exactly the next 5 in line are promoted, once each, and e-mailed once', async () => {
    const before = await rows();
    const leaving = before
      .filter((r) => r.status === 'going')
      .slice(3, 8)
      .map((r) => r.userId);
    const nextFive = before
      .filter((r) => r.status === 'waitlisted')
      .slice(0, 5)
      .map((r) => r.userId);
    const stillWaiting = before
      .filter((r) => r.status === 'waitlisted')
      .slice(5)
      .map((r) => r.userId);
    const clientOf = (userId: string) => members.find((m) => m.userId === userId)!.client;

    const answers = await Promise.all(
      [...leaving, ...leaving].map((id) => clientOf(id).put(`${path}/rsvp`, { response: 'not-going' })),
    );
    expect(
      answers.map((a) => a.status),
      JSON.stringify(answers.find((a) => a.status !== 200)?.body),
    ).toEqual(answers.map(() => 200));

    const after = await rows();
    const statusOf = new Map(after.map((r) => [r.userId, r]));
    expect(after.filter((r) => r.status === 'going')).toHaveLength(20);
    expect(leaving.map((id) => statusOf.get(id)!.status)).toEqual(leaving.map(() => 'not-going'));
    expect(nextFive.map((id) => statusOf.get(id)!.status)).toEqual(nextFive.map(() => 'going'));
    expect(
      after
        .filter((r) => r.promotedAt !== null)
        .map((r) => r.userId)
        .sort(),
    ).toEqual([...nextFive].sort());
    expect(stillWaiting.map((id) => statusOf.get(id)!.status)).toEqual(stillWaiting.map(() => 'waitlisted'));

    // The rest of the line moved up: positions 1–5, same order as before.
    const positions = await Promise.all(
      stillWaiting.map(
        async (id) => ((await clientOf(id).get(path)).body.meetup as MeetupDetailView).mine!.waitlistPosition,
      ),
    );
    expect(positions).toEqual([1, 2, 3, 4, 5]);

    // No double promotion: one notification and one e-mail per promoted person, none for anyone else.
    const told: { userId: string; n: number }[] = await t.dataSource.query(
      `SELECT user_id AS "userId", count(*)::int AS n FROM notification WHERE kind = 'meetup' GROUP BY user_id`,
    );
    expect(told.map((r) => r.userId).sort()).toEqual([...nextFive].sort());
    expect(told.every((r) => r.n === 1)).toBe(true);
    const first = members.find((m) => m.userId === nextFive[0])!;
    const mails = await settledMailsTo(t.dataSource, first.email, 1);
    expect(mails).toHaveLength(1);
    expect(mails[0]!.subject).toContain(
      'A place freed up: you are going to Reading your first nitrite curve',
    );
    expect(mails[0]!.attachments[0]!.filename).toBe('meetup.ics');
  });
});
