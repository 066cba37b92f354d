import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { AuditEvent } from '@server/modules/audit/audit-event.entity';
import { MentorAssignment } from '@server/modules/mentorship/mentor-assignment.entity';
import { MentorRequest } from '@server/modules/mentorship/mentor-request.entity';
import { Notification } from '@server/modules/notifications/notification.entity';
import type { Club } from '@server/modules/clubs/club.entity';
import { resetDatabase } from '@tests/helpers/db';
import { assignMentor, makeClub, makeMember } from '@tests/helpers/factories';
import { Client, signedIn } from '@tests/helpers/http';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';

type Person = Awaited<ReturnType<typeof makeMember>>;

describe('mentor requests', () => {
  let t: TestApp;
  let club: Club;
  let admin: Person;
  let mentor: Person;
  let beginner: Person;
  let adminClient: Client;
  let beginnerClient: Client;
  const path = () => `/api/clubs/${club.id}/mentor-requests`;

  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    club = await makeClub(t.dataSource, 'Kelp Street Aquarists');
    admin = await makeMember(t.dataSource, club, 'Ada Admin', 'admin');
    mentor = await makeMember(t.dataSource, club, 'Maya Mentor', 'mentor');
    beginner = await makeMember(t.dataSource, club, 'Ben Beginner');
    adminClient = await signedIn(t.app, admin.user.email);
    beginnerClient = await signedIn(t.app, beginner.user.email);
  });

  const ask = (
    body: object = { note: 'My first reef, cycling since Monday.', preferredMentorId: mentor.user.id },
  ) => beginnerClient.post(path(), body);
  const actions = async () =>
    (await t.dataSource.getRepository(AuditEvent).find({ order: { at: 'ASC' } })).map((a) => a.action);

  it('when a member asks and the admin accepts, then the pairing exists, the request says so, and both are told', async () => {
    const asked = await ask();
    expect(asked.status).toBe(201);
    expect(asked.body.request).toMatchObject({
      state: 'open',
      note: 'My first reef, cycling since Monday.',
      requester: { displayName: 'Ben Beginner' },
      preferredMentor: { displayName: 'Maya Mentor' },
    });

    const open = await adminClient.get(path());
    expect(open.status).toBe(200);
    expect(open.body.requests.map((r: { id: string }) => r.id)).toEqual([asked.body.request.id]);
    // The admins hear about the request.
    expect(
      await t.dataSource
        .getRepository(Notification)
        .findBy({ userId: admin.user.id, kind: 'mentor-request' }),
    ).toHaveLength(1);

    const accepted = await adminClient.post(`${path()}/${asked.body.request.id}/accept`, {});
    expect(accepted.status).toBe(200);
    expect(accepted.body.request).toMatchObject({
      state: 'accepted',
      assignmentId: accepted.body.assignment.id,
    });
    expect(accepted.body.assignment).toMatchObject({
      mentorId: mentor.user.id,
      menteeId: beginner.user.id,
      endedAt: null,
    });
    const current = await t.dataSource
      .getRepository(MentorAssignment)
      .findBy({ clubId: club.id, menteeId: beginner.user.id });
    expect(current).toEqual([
      expect.objectContaining({ mentorId: mentor.user.id, endedAt: null, createdById: admin.user.id }),
    ]);

    const mine = await beginnerClient.get(`${path()}/mine`);
    expect(mine.body).toMatchObject({
      request: { state: 'accepted' },
      mentor: { userId: mentor.user.id, displayName: 'Maya Mentor' },
    });
    expect((await adminClient.get(path())).body.requests).toEqual([]);
    const told = await t.dataSource.getRepository(Notification).findBy({ kind: 'assignment' });
    expect(told.map((n) => [n.userId, n.title]).sort()).toEqual(
      [
        [beginner.user.id, 'Maya Mentor is now your mentor'],
        [mentor.user.id, 'You are now mentoring Ben Beginner'],
      ].sort(),
    );
    expect(await actions()).toEqual(
      expect.arrayContaining([
        'mentor-request.created',
        'mentor-assignment.created',
        'mentor-request.accepted',
      ]),
    );
    const acceptedAudit = await t.dataSource
      .getRepository(AuditEvent)
      .findBy({ action: 'mentor-request.accepted' });
    expect(acceptedAudit).toEqual([
      expect.objectContaining({
        actorId: admin.user.id,
        targetType: 'MentorRequest',
        targetId: asked.body.request.id,
      }),
    ]);
  });

  it('when the chosen mentor is full, then accepting answers 409 saying so and nothing changes', async () => {
    const mentorClient = await signedIn(t.app, mentor.user.email);
    expect(
      (await mentorClient.patch(`/api/clubs/${club.id}/mentors/${mentor.user.id}/capacity`, { capacity: 1 }))
        .status,
    ).toBe(200);
    await assignMentor(
      t.dataSource,
      club,
      mentor.user,
      (await makeMember(t.dataSource, club, 'Earlier Mentee')).user,
    );
    const asked = await ask();

    const res = await adminClient.post(`${path()}/${asked.body.request.id}/accept`, {
      mentorId: mentor.user.id,
    });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toBe(
      'Maya Mentor is at capacity (1 of 1 mentees). Choose another mentor, or raise their capacity first.',
    );
    expect(
      await t.dataSource.getRepository(MentorRequest).findOneByOrFail({ id: asked.body.request.id }),
    ).toMatchObject({ state: 'open', assignmentId: null });
    expect(await t.dataSource.getRepository(MentorAssignment).countBy({ menteeId: beginner.user.id })).toBe(
      0,
    );

    // Another mentor with room: the admin re-assigns to them instead.
    const other = await makeMember(t.dataSource, club, 'Otto Other', 'mentor');
    const ok = await adminClient.post(`${path()}/${asked.body.request.id}/accept`, {
      mentorId: other.user.id,
    });
    expect(ok.status).toBe(200);
    expect(ok.body.assignment.mentorId).toBe(other.user.id);
  });

  it('when two admins fill a mentor’s last place at the same moment, then one pairing wins and the other gets 409', async () => {
    await t.dataSource.query(`UPDATE membership SET mentor_capacity = 1 WHERE user_id = $1`, [
      mentor.user.id,
    ]);
    const a = await makeMember(t.dataSource, club, 'Mentee A');
    const b = await makeMember(t.dataSource, club, 'Mentee B');
    const second = await signedIn(
      t.app,
      (await makeMember(t.dataSource, club, 'Second Admin', 'admin')).user.email,
    );
    const results = await Promise.all([
      adminClient.post(`/api/clubs/${club.id}/mentor-assignments`, {
        mentorId: mentor.user.id,
        menteeId: a.user.id,
      }),
      second.post(`/api/clubs/${club.id}/mentor-assignments`, {
        mentorId: mentor.user.id,
        menteeId: b.user.id,
      }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([201, 409]);
    expect(await t.dataSource.getRepository(MentorAssignment).countBy({ mentorId: mentor.user.id })).toBe(1);
  });

  it('when the admin declines with a reason, then the member sees it and the request is closed', async () => {
    const asked = await ask({ note: 'Help!' });
    const noReason = await adminClient.post(`${path()}/${asked.body.request.id}/decline`, { reason: '   ' });
    expect(noReason.status).toBe(400);
    expect(noReason.body.issues).toEqual([expect.objectContaining({ path: 'reason' })]);

    const declined = await adminClient.post(`${path()}/${asked.body.request.id}/decline`, {
      reason: 'All mentors are full until March; ask again then.',
    });
    expect(declined.status).toBe(200);
    expect(declined.body.request).toMatchObject({
      state: 'declined',
      declineReason: 'All mentors are full until March; ask again then.',
    });
    const mine = await beginnerClient.get(`${path()}/mine`);
    expect(mine.body).toMatchObject({
      request: { state: 'declined', declineReason: 'All mentors are full until March; ask again then.' },
      mentor: null,
    });
    const told = await t.dataSource
      .getRepository(Notification)
      .findOneByOrFail({ userId: beginner.user.id, kind: 'mentor-request' });
    expect(told).toMatchObject({
      title: 'Your mentor request was declined',
      body: 'All mentors are full until March; ask again then.',
    });

    const again = await adminClient.post(`${path()}/${asked.body.request.id}/accept`, {
      mentorId: mentor.user.id,
    });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/already declined/);
    expect(await actions()).toContain('mentor-request.declined');
    // Declined is history: the member may ask again.
    expect((await ask({})).status).toBe(201);
  });

  it('when the member tries to accept their own request, then 403 and no pairing', async () => {
    const asked = await ask();
    const res = await beginnerClient.post(`${path()}/${asked.body.request.id}/accept`, {
      mentorId: mentor.user.id,
    });
    expect(res.status).toBe(403);
    expect(await t.dataSource.getRepository(MentorAssignment).countBy({ menteeId: beginner.user.id })).toBe(
      0,
    );
    expect(
      (await beginnerClient.post(`${path()}/${asked.body.request.id}/decline`, { reason: 'never mind' }))
        .status,
    ).toBe(403);
    expect((await beginnerClient.get(path())).status).toBe(403);
  });

  it('when a member asks twice (even with two clicks at once), then there is one open request and a clear 409', async () => {
    const [first, second] = await Promise.all([ask(), ask()]);
    expect([first!.status, second!.status].sort()).toEqual([201, 409]);
    const refused = first!.status === 409 ? first! : second!;
    expect(refused.body.error.message).toBe('You already asked for a mentor. An admin will answer soon.');
    expect(await t.dataSource.getRepository(MentorRequest).countBy({ requesterId: beginner.user.id })).toBe(
      1,
    );
  });

  it('when the member already has a mentor, or names someone who is not a mentor, then the request is refused', async () => {
    const peer = await makeMember(t.dataSource, club, 'Pat Peer');
    const notMentor = await ask({ preferredMentorId: peer.user.id });
    expect(notMentor.status).toBe(400);
    expect(notMentor.body.issues).toEqual([expect.objectContaining({ path: 'preferredMentorId' })]);
    const longNote = await ask({ note: 'x'.repeat(501) });
    expect(longNote.status).toBe(400);
    expect(longNote.body.issues).toEqual([expect.objectContaining({ path: 'note' })]);
    const extra = await ask({ state: 'accepted' });
    expect(extra.status).toBe(400);

    await assignMentor(t.dataSource, club, mentor.user, beginner.user);
    const already = await ask({});
    expect(already.status).toBe(409);
    expect(already.body.error.message).toBe('You already have a mentor in this club.');
  });

  it('when an admin pairs the member directly, then their open request is answered by that pairing', async () => {
    const asked = await ask({});
    const res = await adminClient.post(`/api/clubs/${club.id}/mentor-assignments`, {
      mentorId: mentor.user.id,
      menteeId: beginner.user.id,
    });
    expect(res.status).toBe(201);
    expect(
      await t.dataSource.getRepository(MentorRequest).findOneByOrFail({ id: asked.body.request.id }),
    ).toMatchObject({ state: 'accepted', assignmentId: res.body.assignment.id, decidedById: admin.user.id });
  });

  it('when a mentor re-assigns, then the old pairing ends and the old mentor is told', async () => {
    await assignMentor(t.dataSource, club, mentor.user, beginner.user);
    const other = await makeMember(t.dataSource, club, 'Otto Other', 'mentor');
    const res = await adminClient.post(`/api/clubs/${club.id}/mentor-assignments`, {
      mentorId: other.user.id,
      menteeId: beginner.user.id,
    });
    expect(res.status).toBe(201);
    const rows = await t.dataSource
      .getRepository(MentorAssignment)
      .find({ where: { menteeId: beginner.user.id }, order: { startedAt: 'ASC' } });
    expect(rows.map((r) => [r.mentorId, r.endedAt === null])).toEqual([
      [mentor.user.id, false],
      [other.user.id, true],
    ]);
    expect(
      await t.dataSource.getRepository(Notification).findOneByOrFail({ userId: mentor.user.id }),
    ).toMatchObject({ title: 'Ben Beginner has moved to another mentor' });
    expect(await actions()).toContain('mentor-assignment.reassigned');
  });
});

describe('mentor capacity', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(() => resetDatabase(t.dataSource));

  it('when a mentor sets their own capacity, then the members list shows it, bad values name the field, others may not', async () => {
    const club = await makeClub(t.dataSource, 'Capacity Club');
    const mentor = await makeMember(t.dataSource, club, 'Maya Mentor', 'mentor');
    const other = await makeMember(t.dataSource, club, 'Otto Other', 'mentor');
    const member = await makeMember(t.dataSource, club, 'Ben Beginner');
    await assignMentor(t.dataSource, club, mentor.user, member.user);
    const c = await signedIn(t.app, mentor.user.email);
    const url = (userId: string) => `/api/clubs/${club.id}/mentors/${userId}/capacity`;

    const ok = await c.patch(url(mentor.user.id), { capacity: 8 });
    expect(ok.status).toBe(200);
    expect(ok.body).toEqual({ mentorId: mentor.user.id, capacity: 8, menteeCount: 1 });
    const listed = (await c.get(`/api/clubs/${club.id}/members`)).body.members.find(
      (m: { userId: string }) => m.userId === mentor.user.id,
    );
    expect(listed).toMatchObject({ mentorCapacity: 8, menteeCount: 1 });

    for (const [body, field] of [
      [{ capacity: 21 }, 'capacity'],
      [{ capacity: -1 }, 'capacity'],
      [{ capacity: 2.5 }, 'capacity'],
      [{}, 'capacity'],
    ] as const) {
      const bad = await c.patch(url(mentor.user.id), body);
      expect(bad.status).toBe(400);
      expect(bad.body.issues).toEqual([expect.objectContaining({ path: field })]);
    }
    expect((await c.patch(url(other.user.id), { capacity: 1 })).status).toBe(403);
    const admin = await signedIn(
      t.app,
      (await makeMember(t.dataSource, club, 'Ada Admin', 'admin')).user.email,
    );
    const notAMentor = await admin.patch(url(member.user.id), { capacity: 3 });
    expect(notAMentor.status).toBe(409);
    expect(notAMentor.body.error.message).toBe('Only active mentors and admins take on mentees.');
    expect((await admin.patch(url(other.user.id), { capacity: 0 })).status).toBe(200);
    const audits = await t.dataSource.getRepository(AuditEvent).findBy({ action: 'mentor.capacity-changed' });
    expect(audits.map((a) => a.details)).toEqual(
      expect.arrayContaining([expect.objectContaining({ mentorId: mentor.user.id, from: null, to: 8 })]),
    );
  });
});
