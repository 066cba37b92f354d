import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { Notification } from '@server/modules/notifications/notification.entity';
import { QuestionReply } from '@server/modules/questions/question.entity';
import { MentorAssignment } from '@server/modules/mentorship/mentor-assignment.entity';
import { resetDatabase } from '@tests/helpers/db';
import { createTestApp, type TestApp } from '@tests/helpers/test-app';
import { addTest, questionPeople } from './people';
import { DAY_MS } from '@shared/care/time';

type People = Awaited<ReturnType<typeof questionPeople>>;

describe('questions on a reading', () => {
  let t: TestApp;
  let p: People;
  let testId: string;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());
  beforeEach(async () => {
    await resetDatabase(t.dataSource);
    p = await questionPeople(t);
    testId = await addTest(p.asSky, p.club.id, p.tankId, {
      nitrate: { value: 40, unit: 'mg/L NO3' },
      pH: { value: 8.1 },
    });
  });

  const questions = () => `/api/clubs/${p.club.id}/questions`;
  const ask = (body: Record<string, unknown> = {}) =>
    p.asSky.post(`/api/clubs/${p.club.id}/tanks/${p.tankId}/questions`, {
      title: 'Is this nitrate OK for my seahorses?',
      body: 'It was 40 this morning.',
      waterTestId: testId,
      ...body,
    });
  /** Question notifications only: the 40 mg/L test also raises a concern, which tells the mentor on its own. */
  const notificationsOf = async (userId: string) =>
    (
      await t.dataSource.getRepository(Notification).find({ where: { userId }, order: { createdAt: 'ASC' } })
    ).filter((n) => !n.kind.startsWith('concern.'));

  it('when the keeper asks, then the question keeps a copy of the figures, the open concerns and the profile, even after the test is edited', async () => {
    const asked = await ask();
    expect(asked.status).toBe(201);
    const id = asked.body.question.id as string;
    expect(asked.body.question).toMatchObject({
      status: 'open',
      awaitingAnswer: true,
      tankName: 'Seahorse corner',
      about: { kind: 'water-test' },
      replyCount: 0,
    });

    const before = (await p.asSky.get(`${questions()}/${id}`)).body;
    expect(before.snapshot.subject).toMatchObject({
      kind: 'water-test',
      waterTestId: testId,
      values: { nitrate: 40, pH: 8.1 },
    });
    expect(before.snapshot.profile).toMatchObject({ key: 'seahorse-large', version: expect.any(Number) });
    expect(before.snapshot.profile.ranges.nitrate.ideal).toHaveLength(2);
    const nitrateConcern = before.snapshot.concerns.find(
      (c: { parameter: string }) => c.parameter === 'nitrate',
    );
    expect(nitrateConcern).toMatchObject({ status: 'open', value: 40 });

    const edit = await p.asSky.patch(`/api/clubs/${p.club.id}/tanks/${p.tankId}/water-tests/${testId}`, {
      entries: { nitrate: { value: 5, unit: 'mg/L NO3' } },
    });
    expect(edit.status).toBe(200);
    const open: { parameter: string }[] = await t.dataSource.query(
      `SELECT parameter FROM concern WHERE tank_id = $1 AND status <> 'resolved'`,
      [p.tankId],
    );
    expect(open.map((c) => c.parameter)).not.toContain('nitrate');

    const after = (await p.asMilo.get(`${questions()}/${id}`)).body;
    expect(after.snapshot).toEqual(before.snapshot);
    // The chart around the date shows the tank as it is now.
    expect(after.readings).toEqual([
      expect.objectContaining({ id: testId, values: expect.objectContaining({ nitrate: 5 }) }),
    ]);
  });

  it('when the keeper asks, then her current mentor is told; when the mentor answers, the keeper is told and it is no longer waiting', async () => {
    const id = (await ask()).body.question.id as string;
    expect((await notificationsOf(p.milo.user.id)).map((n) => [n.kind, n.link, n.subjectId])).toEqual([
      ['question.asked', `/questions/${id}`, id],
    ]);
    expect(await notificationsOf(p.otto.user.id)).toEqual([]);

    const reply = await p.asMilo.post(`${questions()}/${id}/replies`, {
      body: 'Aim for under 10: do a **30 %** water change.',
    });
    expect(reply.status).toBe(201);
    expect(reply.body.reply).toMatchObject({
      author: { userId: p.milo.user.id, displayName: 'Milo Mentor' },
    });
    expect(reply.body.question).toMatchObject({ awaitingAnswer: false, replyCount: 1, status: 'open' });
    const told = await notificationsOf(p.sky.user.id);
    expect(told.map((n) => n.kind)).toEqual(['question.answered']);
    expect(told[0]!.title).toContain('Milo Mentor answered');
    expect(told[0]!.link).toBe(`/questions/${id}`);

    // Her follow-up makes it wait for an answer again and tells the mentor.
    const follow = await p.asSky.post(`${questions()}/${id}/replies`, { body: 'Done. Test again tomorrow?' });
    expect(follow.body.question.awaitingAnswer).toBe(true);
    expect((await notificationsOf(p.milo.user.id)).map((n) => n.kind)).toEqual([
      'question.asked',
      'question.asked',
    ]);

    const thread = (await p.asSky.get(`${questions()}/${id}`)).body;
    expect(thread.replies.map((r: { author: { displayName: string } }) => r.author.displayName)).toEqual([
      'Milo Mentor',
      'Sky Keeper',
    ]);
  });

  it('when the keeper marks it answered, then it leaves the open list; reopening brings it back; nobody else may mark it', async () => {
    const id = (await ask()).body.question.id as string;
    expect((await p.asMilo.post(`${questions()}/${id}/answered`, { answered: true })).status).toBe(403);
    expect((await p.asAda.post(`${questions()}/${id}/answered`, { answered: true })).status).toBe(403);
    const done = await p.asSky.post(`${questions()}/${id}/answered`, { answered: true });
    expect(done.status).toBe(200);
    expect(done.body.question).toMatchObject({
      status: 'answered',
      awaitingAnswer: false,
      answeredAt: expect.any(String),
    });
    expect((await p.asMilo.get(questions())).body.questions).toEqual([]);
    expect(
      (await p.asMilo.get(`${questions()}?status=all`)).body.questions.map((q: { id: string }) => q.id),
    ).toEqual([id]);
    const reopened = await p.asSky.post(`${questions()}/${id}/answered`, { answered: false });
    expect(reopened.body.question).toMatchObject({ status: 'open', answeredAt: null });
    expect((await p.asMilo.get(questions())).body.questions.map((q: { id: string }) => q.id)).toEqual([id]);
  });

  it('when a mentor of the club does not mentor the keeper, then reading and replying are refused (403) and the list leaves it out', async () => {
    const id = (await ask()).body.question.id as string;
    expect((await p.asOtto.get(`${questions()}/${id}`)).status).toBe(403);
    const reply = await p.asOtto.post(`${questions()}/${id}/replies`, { body: 'Let me chip in.' });
    expect(reply.status).toBe(403);
    expect(reply.body.error.code).toBe('forbidden');
    expect((await p.asOtto.get(`${questions()}?status=all`)).body.questions).toEqual([]);
    expect(await t.dataSource.getRepository(QuestionReply).count()).toBe(0);
    // The admin reads and answers any question of the club.
    expect((await p.asAda.get(`${questions()}/${id}`)).status).toBe(200);
    expect((await p.asAda.post(`${questions()}/${id}/replies`, { body: 'Agree with Milo.' })).status).toBe(
      201,
    );
  });

  it('when a past mentor looks, then they still read the question but may no longer reply', async () => {
    const id = (await ask()).body.question.id as string;
    await t.dataSource
      .getRepository(MentorAssignment)
      .update(
        { mentorId: p.milo.user.id, menteeId: p.sky.user.id },
        { endedAt: new Date(Date.now() - DAY_MS) },
      );
    expect((await p.asMilo.get(`${questions()}/${id}`)).status).toBe(200);
    expect((await p.asMilo.post(`${questions()}/${id}/replies`, { body: 'Still here.' })).status).toBe(403);
  });

  it('when a member of another club tries, then the club and the question do not exist for her (404)', async () => {
    const id = (await ask()).body.question.id as string;
    for (const res of [
      await p.asOlga.get(`${questions()}/${id}`),
      await p.asOlga.get(questions()),
      await p.asOlga.post(`${questions()}/${id}/replies`, { body: 'Hello?' }),
      await p.asOlga.post(`${questions()}/${id}/answered`, { answered: true }),
    ]) {
      expect(res.status).toBe(404);
    }
    // Nor is the question found under her own club's id.
    expect((await p.asOlga.get(`/api/clubs/${p.other.id}/questions/${id}`)).status).toBe(404);
  });

  it('when someone is mentioned, then a mentor or admin who may read the question is told, and nobody else', async () => {
    const id = (await ask()).body.question.id as string;
    const detail = (await p.asMilo.get(`${questions()}/${id}`)).body;
    expect(detail.mentionable.map((m: { displayName: string }) => m.displayName)).toEqual(['Ada Admin']);

    const reply = await p.asMilo.post(`${questions()}/${id}/replies`, {
      body: '@Ada Admin, could you check the tank volume? @Otto Othermentor too.',
    });
    expect(reply.status).toBe(201);
    expect(reply.body.mentioned).toEqual([{ userId: p.ada.user.id, displayName: 'Ada Admin' }]);
    const ada = await notificationsOf(p.ada.user.id);
    expect(ada.map((n) => [n.kind, n.link])).toEqual([['mention', `/questions/${id}`]]);
    expect(ada[0]!.title).toContain('Milo Mentor mentioned you');
    // Otto may not read it, so he hears nothing about it.
    expect(await notificationsOf(p.otto.user.id)).toEqual([]);

    // A picked id counts too; the keeper's mentor, already told of the question, is not told twice.
    const picked = await p.asSky.post(`${questions()}/${id}/replies`, {
      body: 'Thanks both!',
      mentionIds: [p.ada.user.id, p.milo.user.id, p.otto.user.id],
    });
    expect(picked.body.mentioned.map((m: { displayName: string }) => m.displayName).sort()).toEqual([
      'Ada Admin',
      'Milo Mentor',
    ]);
    expect((await notificationsOf(p.ada.user.id)).map((n) => n.kind)).toEqual(['mention', 'mention']);
    expect((await notificationsOf(p.milo.user.id)).map((n) => n.kind)).toEqual([
      'question.asked',
      'question.asked',
    ]);
    expect(await notificationsOf(p.otto.user.id)).toEqual([]);
  });

  it('when a message holds HTML or a javascript: link, then it is stored and returned as the exact text, never as markup', async () => {
    const nasty = 'Look <script>alert(1)</script> [here](javascript:alert(1)) <img src=x onerror=alert(1)>';
    const id = (await ask({ body: nasty })).body.question.id as string;
    await p.asMilo.post(`${questions()}/${id}/replies`, { body: nasty });
    const res = await p.asSky.get(`${questions()}/${id}`);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body.question.body).toBe(nasty);
    expect(res.body.replies[0].body).toBe(nasty);
  });

  it('when the keeper asks about an observation, then the snapshot holds what she saw', async () => {
    const ev = await p.asSky.post(`/api/clubs/${p.club.id}/tanks/${p.tankId}/events`, {
      kind: 'observation',
      occurredAt: new Date(Date.now() - 7_200_000).toISOString(),
      details: { breathing: 'fast', text: 'Snick breathes fast' },
    });
    expect(ev.status).toBe(201);
    const asked = await ask({ waterTestId: undefined, eventId: ev.body.event.id, title: 'Fast breathing?' });
    expect(asked.status).toBe(201);
    const detail = (await p.asMilo.get(`${questions()}/${asked.body.question.id}`)).body;
    expect(detail.snapshot.subject).toMatchObject({
      kind: 'observation',
      details: { breathing: 'fast', text: 'Snick breathes fast' },
    });
    expect(detail.readings.map((r: { id: string }) => r.id)).toEqual([testId]);
  });

  it('when the request is wrong, then the answer is 400 naming the field, or 403 for someone else’s tank', async () => {
    const both = await ask({ eventId: testId });
    expect(both.status).toBe(400);
    expect(both.body.issues).toEqual([
      { path: 'waterTestId', message: 'Ask about one water test or one observation.' },
    ]);
    const neither = await ask({ waterTestId: undefined });
    expect(neither.status).toBe(400);
    const feeding = await p.asSky.post(`/api/clubs/${p.club.id}/tanks/${p.tankId}/events`, {
      kind: 'feeding-note',
      occurredAt: new Date().toISOString(),
      details: { food: 'mysis' },
    });
    const notObservation = await ask({ waterTestId: undefined, eventId: feeding.body.event.id });
    expect(notObservation.status).toBe(400);
    expect(notObservation.body.issues[0].path).toBe('eventId');
    const elsewhere = await ask({ waterTestId: '00000000-0000-4000-8000-000000000000' });
    expect(elsewhere.status).toBe(400);
    expect(elsewhere.body.issues[0].path).toBe('waterTestId');
    expect((await ask({ title: '' })).body.issues[0].path).toBe('title');
    expect((await ask({ body: 'x'.repeat(5001) })).status).toBe(400);
    expect((await ask({ extra: 1 })).status).toBe(400);
    expect((await p.asSky.get(`${questions()}?status=maybe`)).status).toBe(400);
    expect((await p.asSky.get(`${questions()}/not-an-id`)).status).toBe(400);
    const id = (await ask()).body.question.id as string;
    expect((await p.asSky.post(`${questions()}/${id}/replies`, { body: '   ' })).status).toBe(400);
    expect((await p.asSky.post(`${questions()}/${id}/answered`, { answered: 'yes' })).status).toBe(400);

    const byMentor = await p.asMilo.post(`/api/clubs/${p.club.id}/tanks/${p.tankId}/questions`, {
      title: 'For her',
      body: 'Asking on her behalf',
      waterTestId: testId,
    });
    expect(byMentor.status).toBe(403);
  });

  it('when listing, then members see their own and can narrow to one tank; mentors see their mentees’ open ones', async () => {
    const first = (await ask()).body.question.id as string;
    const second = (await ask({ title: 'And the pH?' })).body.question.id as string;
    const mine = (await p.asSky.get(`${questions()}?status=all&tankId=${p.tankId}`)).body.questions.map(
      (q: { id: string }) => q.id,
    );
    expect(mine.sort()).toEqual([first, second].sort());
    expect(
      (await p.asSky.get(`${questions()}?tankId=00000000-0000-4000-8000-000000000000`)).body.questions,
    ).toEqual([]);
    expect((await p.asMilo.get(questions())).body.questions).toHaveLength(2);
    expect((await p.asAda.get(questions())).body.questions).toHaveLength(2);
  });
});
